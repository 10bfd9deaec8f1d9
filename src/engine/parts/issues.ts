/** Problems found in resolved parts, before any solid is built. */
import type { ResolvedFeature, ResolvedPart } from "./features";

export interface GeometryIssue {
  partId: string;
  /** Index into the part's feature list (0 = the base); absent for part-level problems. */
  featureIndex?: number;
  /** The feature's id, or `<kind>-<index>` when it has none. */
  featureRef?: string;
  /** Stable code: degenerate-size, larger-than-part, outside-part, unsupported, breakout, thin-wall, … */
  code: string;
  severity: "error" | "warning" | "note";
  /** True when the part must not reach the solid kernel (it could hang or build nothing). */
  blocking: boolean;
  /** Plain shop language with the numbers, in the user's units. */
  message: string;
}

/** Formats a length given in mm for the person reading the message ("12.5 mm" / "0.492 in"). */
export type LengthFormatter = (valueMm: number) => string;

export function featureRef(f: ResolvedFeature, index: number): string {
  return f.id ?? `${f.kind}-${index}`;
}

/** "Body, hole rod-hole-1" — how messages name a feature. */
export function featureName(part: ResolvedPart, f: ResolvedFeature, index: number): string {
  const what = f.label ?? (f.id ? `${f.kind.replace(/-/g, " ")} "${f.id}"` : `${f.kind.replace(/-/g, " ")} #${index}`);
  return `${part.name}: ${what}`;
}
