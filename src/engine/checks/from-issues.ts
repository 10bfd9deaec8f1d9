/** Geometry issues (guard and general checks) as check results, with stable ids. */
import type { GeometryIssue } from "../parts/issues";
import type { CheckResult } from "./types";

export function issuesToChecks(issues: readonly GeometryIssue[], parametersOfPart: (partId: string) => string[]): CheckResult[] {
  const counts = new Map<string, number>();
  return issues.map((issue) => {
    const base = `engine.${issue.code}.${issue.partId}${issue.featureRef ? `.${issue.featureRef}` : ""}`;
    const n = (counts.get(base) ?? 0) + 1;
    counts.set(base, n);
    return {
      id: n === 1 ? base : `${base}.${n}`,
      severity: issue.severity,
      passed: false,
      message: issue.message,
      parameters: parametersOfPart(issue.partId),
    };
  });
}
