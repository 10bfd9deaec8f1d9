import type { LengthUnit } from "@/engine/units";
import type { ParameterSpecView } from "./parameter-spec";

export interface FieldUnit {
  /** Shown beside the input. */
  symbol: string;
  /** Read by screen readers after the label ("in millimetres"). */
  spoken: string;
}

/** The unit shown on a numeric field: lengths follow the user's system; angles, forces, ratios and counts do not change. */
export function fieldUnit(spec: Pick<ParameterSpecView, "kind">, units: LengthUnit): FieldUnit | null {
  switch (spec.kind) {
    case "length":
      return units === "mm" ? { symbol: "mm", spoken: "millimetres" } : { symbol: "in", spoken: "inches" };
    case "angle":
      return { symbol: "°", spoken: "degrees" };
    case "force":
      return { symbol: "N", spoken: "newtons" };
    case "ratio":
      return { symbol: "ratio", spoken: "a plain ratio, no unit" };
    case "count":
      return { symbol: "count", spoken: "a whole number" };
    default:
      return null;
  }
}

/**
 * Decimals used when the configurator writes a number into a field (after a unit switch, a vise fill or a
 * step): 3 for millimetres, 5 for inches — finer than any shop reading (0.001 mm, 0.00001 in) so the text
 * never hides a real difference; the exact value is kept beside it (see form-values.ts).
 */
export function inputDecimals(spec: Pick<ParameterSpecView, "kind" | "step">, units: LengthUnit): number {
  if (spec.kind === "length") return units === "mm" ? 3 : 5;
  if (spec.kind === "count") return 0;
  const stepDecimals = spec.step ? (String(spec.step).split(".")[1] ?? "").length : 0;
  return Math.max(3, stepDecimals);
}

/** Fixed decimals with trailing zeros trimmed and no "-0": 25.400 → "25.4", 1.00000 → "1". */
export function trimNumber(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  const trimmed = text.includes(".") ? text.replace(/\.?0+$/, "") : text;
  return trimmed === "-0" ? "0" : trimmed;
}
