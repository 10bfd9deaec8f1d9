/**
 * The check results of a design on two template versions, side by side: what fails on the new version
 * that passed on the saved one and the other way round. Each side is evaluated with the values it would
 * really get (the saved values on the old version, the carried ones on the new), in the person's units,
 * so the messages read as the configurator shows them.
 */
import {
  evaluateTemplate,
  ParameterResolutionError,
  type CheckResult,
  type CompiledTemplate,
  type UnitSystem,
} from "@/engine";
import { convertLength } from "@/engine/units";
import type { CheckChange } from "@/shared/design-upgrade";
import type { DesignParameters } from "@/shared/designs";

/** The checks of `compiled` for values in its own units; null when a value is outside its limits. */
export function checksFor(
  compiled: CompiledTemplate,
  values: DesignParameters,
  units: UnitSystem,
): CheckResult[] | null {
  const inUserUnits: Record<string, unknown> = {};
  const lengths = new Set(compiled.parameters.filter((p) => p.kind === "length").map((p) => p.key));
  for (const [key, value] of Object.entries(values)) {
    inUserUnits[key] =
      lengths.has(key) && typeof value === "number"
        ? convertLength(value, compiled.template.units, units)
        : value;
  }
  try {
    return evaluateTemplate(compiled, { parameters: inUserUnits, units }).checks;
  } catch (err) {
    if (err instanceof ParameterResolutionError) return null;
    throw err;
  }
}

const severityOrder = { error: 0, warning: 1, note: 2 } as const;

/**
 * The checks whose outcome differs, a check missing on one side counting as passed there (a new check
 * that fails is a change; one that is gone no longer fails). Without `before`, every failing check of
 * `after` is listed. Order: what now fails first (errors, then warnings, then notes), then what now passes.
 */
export function compareChecks(before: CheckResult[] | null, after: CheckResult[]): CheckChange[] {
  const beforeById = new Map((before ?? []).map((c) => [c.id, c]));
  const afterById = new Map(after.map((c) => [c.id, c]));
  const ids = [...new Set([...after.map((c) => c.id), ...(before ?? []).map((c) => c.id)])];
  const changes: CheckChange[] = [];
  for (const id of ids) {
    const b = beforeById.get(id);
    const a = afterById.get(id);
    const failsAfter = a ? !a.passed : false;
    const failsBefore = b ? !b.passed : false;
    if (before ? failsAfter === failsBefore : !failsAfter) continue;
    changes.push({
      id,
      severity: (a ?? b)!.severity,
      before: b ? { passed: b.passed, message: b.message } : null,
      after: a ? { passed: a.passed, message: a.message } : null,
    });
  }
  const nowFails = (c: CheckChange) => (c.after && !c.after.passed ? 0 : 1);
  return changes.sort(
    (x, y) => nowFails(x) - nowFails(y) || severityOrder[x.severity] - severityOrder[y.severity],
  );
}
