/**
 * "What changes if this design moves to the current template version": the parameter differences
 * (upgrade-values.ts) and the check results on both versions (upgrade-checks.ts). Reading it changes
 * nothing; the design stays pinned until its owner saves it on the new version.
 *
 * Honesty about the old version: the built-in catalogue holds only the current YAML of each template, so
 * a design pinned to an earlier built-in version cannot have its old limits, defaults or checks
 * recomputed. Then `from.available` is false, the values are compared with the new version only, its
 * failing checks are listed without a "before", and `checks.note` says why.
 */
import type { DesignUpgrade, DesignUpgradeQuery } from "@/shared/design-upgrade";
import { conflict, notFound } from "@server/lib/errors";
import type { TemplateStore } from "@server/templates";
import type { DesignRepository } from "./repository";
import { isNewerVersion } from "./semver";
import { parametersOf } from "./serialize";
import { checksFor, compareChecks } from "./upgrade-checks";
import { compareValues } from "./upgrade-values";

export interface DesignUpgradeDeps {
  designs: DesignRepository;
  templates: TemplateStore;
}

export function designUpgradeService(deps: DesignUpgradeDeps) {
  return {
    async report(ownerId: number, id: number, query: DesignUpgradeQuery): Promise<DesignUpgrade> {
      const d = await deps.designs.findLive(ownerId, id);
      if (!d) throw notFound(`You have no saved design with id ${id}.`);
      const current = deps.templates.get(d.templateId);
      if (!current) {
        throw conflict(
          `The catalogue no longer lists the template "${d.templateId}", so there is no version to move this design to.`,
          [{ path: "templateId", message: "Not in the catalogue." }],
        );
      }
      const units = query.units ?? d.units;
      const pinned = d.templateVersion;
      const from =
        deps.templates.getVersion?.(d.templateId, pinned) ??
        (current.template.version === pinned ? current : undefined);
      const base = {
        designId: d.id,
        templateId: d.templateId,
        templateName: current.template.name,
        from: { version: pinned, available: from !== undefined },
        units,
      };
      const saved = parametersOf(d);
      const newer = current.template.version;
      if (!isNewerVersion(newer, pinned)) {
        return {
          ...base,
          to: null,
          parameters: [],
          checks: { compared: false, evaluatedOnNew: false, note: null, changes: [], failingErrorsOnNew: 0 },
          carried: saved,
        };
      }

      const values = compareValues(saved, current, from, units);
      const before = from ? checksFor(from, saved, units) : null;
      const after = values.outOfRange ? null : checksFor(current, values.carried, units);
      const notes: string[] = [];
      if (!from) {
        notes.push(
          `Version ${pinned} is no longer held on this server, so its limits, defaults and check results cannot be set beside version ${newer}'s: your saved values are compared with version ${newer}, and the checks listed are the ones that fail on it.`,
        );
      } else if (!before) {
        notes.push(
          `Your saved values are outside version ${pinned}'s own limits, so its checks could not be run for comparison.`,
        );
      }
      if (!after) {
        notes.push(
          `Version ${newer} checks the design once every value is inside its limits: open it, change the marked values, and its checks follow.`,
        );
      }
      return {
        ...base,
        to: { version: newer },
        parameters: values.changes,
        checks: {
          compared: before !== null && after !== null,
          evaluatedOnNew: after !== null,
          note: notes.length > 0 ? notes.join(" ") : null,
          changes: after ? compareChecks(before, after) : [],
          failingErrorsOnNew: (after ?? []).filter((c) => c.severity === "error" && !c.passed).length,
        },
        carried: values.carried,
      };
    },
  };
}

export type DesignUpgradeService = ReturnType<typeof designUpgradeService>;
