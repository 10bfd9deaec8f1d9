/**
 * `general-tolerance` calculator: ISO 2768-1 general tolerances (the title-block tolerance) for one size.
 *
 * Output: `plusMinus` is the permissible deviation ± — in mm for `linear` and `chamfer` (broken edges:
 * external radii and chamfer heights), in DEGREES for `angle` (then `size` is the length of the shorter
 * leg in mm, and `plusMinusDeg`, `plusMinusArcMin`, `plusMinusText` give the same value in other forms).
 * Where ISO 2768-1 leaves the cell empty, `applicable` is false, `plusMinus` is null and the note says why.
 */
import { z } from "zod";
import type { Calculator, CalculatorResultMeta, Source } from "../types";
import { ANGULAR, BROKEN_EDGES, bandFor, formatArcMinutes, LINEAR, TOLERANCE_CLASSES, type Band, type ToleranceClass2768 } from "./iso2768";

export { ANGULAR, BROKEN_EDGES, LINEAR, TOLERANCE_CLASSES, type ToleranceClass2768 } from "./iso2768";

export const FEATURES = ["linear", "chamfer", "angle"] as const;

export const generalToleranceInputSchema = z.strictObject({
  size: z
    .number({ error: "Size must be a number (mm; for an angle, the shorter leg in mm)." })
    .positive("Size must be greater than 0 mm."),
  class: z.enum(TOLERANCE_CLASSES, { error: 'Tolerance class must be one of "f", "m", "c", "v" (ISO 2768-1).' }),
  feature: z.enum(FEATURES, { error: 'Feature must be "linear", "chamfer" or "angle".' }).optional(),
});
export type GeneralToleranceInput = z.infer<typeof generalToleranceInputSchema>;

export interface GeneralToleranceResult extends CalculatorResultMeta {
  feature: (typeof FEATURES)[number];
  class: ToleranceClass2768;
  /** e.g. "ISO 2768-m". */
  designation: string;
  sizeMm: number;
  applicable: boolean;
  /** ± deviation: mm for linear/chamfer, degrees for angle; null where the standard gives none. */
  plusMinus: number | null;
  plusMinusMm?: number | null;
  plusMinusDeg?: number | null;
  plusMinusArcMin?: number | null;
  /** "±0.2 mm" or "±0°30′". */
  plusMinusText: string | null;
  /** The table range used, mm ("over … up to and including …"; null upper = open). */
  rangeMm: { over: number; upTo: number | null } | null;
  note?: string;
}

const TABLE_TITLE = {
  linear: "ISO 2768-1:1989, Table 1 (linear dimensions)",
  chamfer: "ISO 2768-1:1989, Table 2 (broken edges: external radii and chamfer heights)",
  angle: "ISO 2768-1:1989, Table 3 (angular dimensions, by the shorter leg)",
} as const;

const CLASS_NAME: Record<ToleranceClass2768, string> = { f: "fine", m: "medium", c: "coarse", v: "very coarse" };

function rangeOf(band: Band | undefined): GeneralToleranceResult["rangeMm"] {
  return band ? { over: band.overMm, upTo: Number.isFinite(band.upToMm) ? band.upToMm : null } : null;
}

function compute(input: GeneralToleranceInput): GeneralToleranceResult {
  const feature = input.feature ?? "linear";
  const cls = input.class;
  const source: Source = { title: TABLE_TITLE[feature], kind: "standard", note: "values from memory" };
  const table = feature === "linear" ? LINEAR : feature === "chamfer" ? BROKEN_EDGES : ANGULAR;
  const band = bandFor(table, input.size);
  const value = band ? band.values[cls] : null;
  const base = {
    feature,
    class: cls,
    designation: `ISO 2768-${cls}`,
    sizeMm: input.size,
    rangeMm: rangeOf(band),
    sources: [source],
  };
  const cautions = ["General tolerances apply only where the drawing gives no individual tolerance; functional sizes need their own."];

  if (value === null || value === undefined) {
    const why = !band
      ? `${input.size} mm lies outside ISO 2768-1 ${feature === "angle" ? "Table 3" : feature === "chamfer" ? "Table 2" : "Table 1"} (below 0.5 mm${feature === "linear" ? " or above 4000 mm" : ""})`
      : `ISO 2768-1 gives no value for class ${cls} (${CLASS_NAME[cls]}) in the range over ${band.overMm} up to ${band.upToMm} mm`;
    const note = `${why}: write the tolerance beside the size on the drawing.`;
    return {
      ...base,
      applicable: false,
      plusMinus: null,
      ...(feature === "angle" ? { plusMinusDeg: null, plusMinusArcMin: null } : { plusMinusMm: null }),
      plusMinusText: null,
      note,
      cautions: [...cautions, note],
    };
  }

  if (feature === "angle") {
    const deg = Math.round((value / 60) * 1e6) / 1e6;
    return {
      ...base,
      applicable: true,
      plusMinus: deg,
      plusMinusDeg: deg,
      plusMinusArcMin: value,
      plusMinusText: formatArcMinutes(value),
      note: "For an angle, size is the length of the shorter leg and plusMinus is in degrees.",
      cautions,
    };
  }
  return { ...base, applicable: true, plusMinus: value, plusMinusMm: value, plusMinusText: `±${value} mm`, cautions };
}

export const generalToleranceCalculator: Calculator<typeof generalToleranceInputSchema, GeneralToleranceResult> = {
  kind: "general-tolerance",
  label: "General tolerance (ISO 2768-1)",
  summary: "The ± deviation a size, chamfer or angle gets from the drawing's general tolerance class f, m, c or v.",
  inputSchema: generalToleranceInputSchema,
  compute,
  sources: [
    { title: TABLE_TITLE.linear, kind: "standard", note: "values from memory" },
    { title: TABLE_TITLE.chamfer, kind: "standard", note: "values from memory" },
    { title: TABLE_TITLE.angle, kind: "standard", note: "values from memory" },
  ],
};
