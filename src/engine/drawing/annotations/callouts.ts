/**
 * Callout wording for holes and threads, in plain shop English with the ISO symbols the lettering has:
 *   "2× Ø6.6 through", "Ø5 H7 (+0.012/0) reamed × 10 deep", "counterbore Ø11 × 6.4 deep",
 *   "countersink Ø10 × 90°", "chamfer 0.5 × 45°", "M6 × 10 deep", "tap drill Ø5 × 14 deep".
 * The size comes first and its fit right after it (ISO 286-1 / ISO 14405-1 style "Ø5 H7"); thread
 * designations follow ISO 965-1 ("M6", fine pitch "M6×0.75").
 */
import type { Formatter } from "../format";
import { formatAngle } from "../format";
import type { AnnotateContext } from "./types";

/** "M6x0.75" → "M6×0.75" (the multiplication sign ISO 965-1 prints). */
export function threadLabel(designation: string): string {
  return designation.trim().replace(/\s*[xX*×]\s*/, "×");
}

/** "Ø5 H7" with "(+0.012/0)" limits when asked and known. */
export function sizeWithFit(ctx: AnnotateContext, diameterMm: number, fit: string | undefined, kind: "hole" | "shaft" = "hole"): string {
  const size = ctx.fmt.diameter(diameterMm);
  if (!fit) return size;
  const cls = fit.trim();
  if (!ctx.showFitLimits) return `${size} ${cls}`;
  const limits = ctx.fits(diameterMm, cls, kind);
  return limits ? `${size} ${cls} (${ctx.fmt.deviation(limits.upper)}/${ctx.fmt.deviation(limits.lower)})` : `${size} ${cls}`;
}

export function depthWords(fmt: Formatter, through: boolean | undefined, depthMm: number | undefined): string {
  if (through || depthMm === undefined) return "through";
  return `× ${fmt.length(depthMm)} deep`;
}

export function countPrefix(count: number | undefined): string {
  return count && count > 1 ? `${count}× ` : "";
}

export function counterboreLine(fmt: Formatter, cb: { diameter: number; depth: number }): string {
  return `counterbore ${fmt.diameter(cb.diameter)} × ${fmt.length(cb.depth)} deep`;
}

export function countersinkLine(fmt: Formatter, cs: { diameter: number; angleDeg?: number }): string {
  return `countersink ${fmt.diameter(cs.diameter)} × ${formatAngle(cs.angleDeg ?? 90)}`;
}

export function chamferLine(fmt: Formatter, legMm: number): string {
  return `chamfer ${fmt.length(legMm)} × 45°`;
}
