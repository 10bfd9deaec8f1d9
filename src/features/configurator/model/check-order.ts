/** One check result as the evaluate API reports it. */
export interface CheckResultView {
  id: string;
  severity: "error" | "warning" | "note";
  passed: boolean;
  message: string;
  parameters: string[];
}

const severityRank: Record<CheckResultView["severity"], number> = { error: 0, warning: 1, note: 2 };

/**
 * Checks in the order a machinist needs them: everything that fails first (errors, then warnings, then
 * notes), then what passes in the same order. Within a rank the template's own order is kept.
 */
export function orderChecks<T extends CheckResultView>(checks: readonly T[]): T[] {
  return checks
    .map((check, index) => ({ check, index }))
    .sort(
      (a, b) =>
        Number(a.check.passed) - Number(b.check.passed) ||
        severityRank[a.check.severity] - severityRank[b.check.severity] ||
        a.index - b.index,
    )
    .map((x) => x.check);
}

/** How many checks fail at each severity. */
export function countFailures(
  checks: readonly CheckResultView[],
): Record<CheckResultView["severity"], number> {
  const out = { error: 0, warning: 0, note: 0 };
  for (const c of checks) if (!c.passed) out[c.severity] += 1;
  return out;
}
