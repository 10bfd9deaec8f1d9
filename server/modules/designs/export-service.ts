/**
 * Downloads of a saved design: the pinned template version is evaluated with the stored values (in the
 * template's own units) and drawn with the pack service (server/exporters/build-export.ts) in the units
 * the person works in. Only the catalogue's current version can be drawn, so a design pinned to an older
 * version is refused (409) with what to do, rather than drawn on a template it was not saved against.
 */
import type { CompiledTemplate, Evaluation } from "@/engine";
import type { DesignExportQuery } from "@/shared/designs";
import { buildExport, ExportInputError, type ExportFile } from "@server/exporters/build-export";
import type { KernelPool } from "@server/kernel";
import { badRequest, conflict, HttpError, notFound } from "@server/lib/errors";
import { guardPartsForKernel, kernelErrorToHttp } from "@server/modules/model";
import type { OwnedRepository } from "@server/modules/profiles/repository";
import type { MachineRecord } from "@server/db/models/machine";
import type { MachineFields } from "@/shared/profiles";
import { evaluateForRequest, requireBuildable, type TemplateStore } from "@server/templates";
import type { DesignRepository } from "./repository";
import { parametersOf } from "./serialize";

export interface DesignExportDeps {
  designs: DesignRepository;
  machines: OwnedRepository<MachineRecord, MachineFields>;
  templates: TemplateStore;
  /** Without a kernel the downloads answer 503. */
  kernel?: KernelPool;
}

export interface DesignExportRequest extends DesignExportQuery {
  drawnBy: string;
  /** Date of issue printed in the title block, e.g. "2026-12-01". */
  date: string;
  signal?: AbortSignal;
}

function evaluate(
  compiled: CompiledTemplate,
  parameters: Record<string, number | string | boolean>,
): Evaluation {
  // No `units`: the stored values are in the template's own units.
  const evaluation = evaluateForRequest(compiled, { parameters }, {
    always: "The saved values no longer suit this template; open the design in the configurator and fix them.",
  });
  requireBuildable(evaluation, "These values give parts that cannot be made; see the details.");
  guardPartsForKernel(evaluation.parts);
  return evaluation;
}

export function designExportService(deps: DesignExportDeps) {
  return {
    /** The file for one of the owner's designs; HttpErrors for everything the caller can act on. */
    async export(ownerId: number, id: number, req: DesignExportRequest): Promise<ExportFile> {
      const d = await deps.designs.findLive(ownerId, id);
      if (!d) throw notFound(`You have no saved design with id ${id}.`);
      const compiled = deps.templates.get(d.templateId);
      if (!compiled) {
        throw conflict(
          `The catalogue no longer lists the template "${d.templateId}", so this design cannot be drawn.`,
          [{ path: "templateId", message: "Not in the catalogue." }],
        );
      }
      const current = compiled.template.version;
      if (current !== d.templateVersion) {
        throw conflict(
          `This design is pinned to version ${d.templateVersion} of ${compiled.template.name}, and only the current version ${current} can be drawn. ` +
            `Open it in the configurator, check the results on ${current}, then move the design to ${current} to download it.`,
          [
            {
              path: "templateVersion",
              message: `Pinned to ${d.templateVersion}; the catalogue has ${current}.`,
            },
          ],
        );
      }
      let machineMaxRpm: number | undefined;
      if (req.machine !== undefined) {
        const machine = await deps.machines.find(ownerId, req.machine);
        if (!machine)
          throw badRequest("Some export options are not acceptable.", [
            { path: "query.machine", message: `You have no machine with id ${req.machine}.` },
          ]);
        machineMaxRpm = machine.maxSpindleRpm;
      }
      const evaluation = evaluate(compiled, parametersOf(d));
      if (!deps.kernel)
        throw new HttpError("service_unavailable", "The solid modeller is not running on this server.");
      const units = req.units ?? d.units;
      try {
        return await buildExport(
          {
            template: compiled.template,
            evaluation,
            format: req.format,
            units,
            projection: req.projection ?? (units === "in" ? "third" : "first"),
            ...(req.part ? { part: req.part } : {}),
            drawnBy: req.drawnBy,
            date: req.date,
            ...(machineMaxRpm !== undefined ? { machineMaxRpm } : {}),
          },
          { kernel: deps.kernel, ...(req.signal ? { signal: req.signal } : {}) },
        );
      } catch (err) {
        if (err instanceof ExportInputError) {
          const path = err.field === "part" ? "query.part" : err.field;
          throw badRequest(err.message, [{ path, message: err.message }]);
        }
        throw kernelErrorToHttp(err);
      }
    },
  };
}

export type DesignExportService = ReturnType<typeof designExportService>;
