/**
 * Does a fit give the clearance its function needs? For each `fit` analysis that names a `purpose`:
 *  - running (a part turns in it): clearance at the tightest must be positive;
 *  - sliding (slides by hand, locates): no interference at the tightest (clearance ≥ 0);
 *  - location (accurate location, assembled by hand or light press): between 0.02 mm interference and
 *    0.04 mm clearance at the extremes;
 *  - press (stays put without a fastening): interference at the loosest (clearance < 0).
 * These bands are common practice for the small sizes of workshop accessories (compare the preferred fits
 * of ISO 286-1 Annex / the usual fit charts: H7/g6 running, H7/h6 sliding, H7/k6 location, H7/p6 press).
 */
import type { AnalysisSpec } from "../template/schema";
import { formatNumber, lengthDecimals, mmToInch, type LengthUnit } from "../units";
import type { CheckResult } from "./types";

const RULES: Record<NonNullable<AnalysisSpec["purpose"]>, { ok: (min: number, max: number) => boolean; want: string; hint: string }> = {
  running: { ok: (min) => min > 0, want: "a part that turns needs clearance even at the tightest", hint: "choose a looser shaft (g6, f7)" },
  sliding: { ok: (min) => min >= 0, want: "a sliding part must never be tight", hint: "choose h6 or g6 on the shaft" },
  location: { ok: (min, max) => min >= -0.02 && max <= 0.04, want: "an accurate location wants between 0.02 mm tight and 0.04 mm loose", hint: "a transition fit such as H7/k6 locates" },
  press: { ok: (_min, max) => max < 0, want: "a pressed part needs interference even at the loosest", hint: "choose p6 or s6 on the shaft" },
};

function mm(value: number, units: LengthUnit): string {
  return units === "mm" ? `${formatNumber(value, 3)} mm` : `${formatNumber(mmToInch(value), lengthDecimals(units) + 1)} in`;
}

export function fitPurposeChecks(specs: readonly AnalysisSpec[], results: Readonly<Record<string, unknown>>, units: LengthUnit): CheckResult[] {
  const out: CheckResult[] = [];
  for (const spec of specs) {
    if (spec.calculator !== "fit" || !spec.purpose) continue;
    const r = results[spec.id] as { clearanceMin?: unknown; clearanceMax?: unknown; hole?: { class?: unknown } } | undefined;
    const id = `engine.fit.${spec.id}`;
    const parameters = [...(spec.parameters ?? [])];
    const label = spec.label ?? spec.id;
    if (!r || typeof r.clearanceMin !== "number" || typeof r.clearanceMax !== "number") {
      out.push({ id, severity: "error", passed: false, message: `${label}: the fit could not be worked out, so its clearance cannot be checked.`, parameters });
      continue;
    }
    const rule = RULES[spec.purpose];
    const passed = rule.ok(r.clearanceMin, r.clearanceMax);
    const range = `${mm(r.clearanceMin, units)} to ${mm(r.clearanceMax, units)} (negative = interference)`;
    out.push({
      id,
      severity: "error",
      passed,
      message: passed ? `${label}: clearance ${range} suits a ${spec.purpose} fit.` : `${label}: clearance ${range}, but ${rule.want}; ${rule.hint}.`,
      parameters,
    });
  }
  return out;
}
