/**
 * `counterbore` calculator: counterbore and clearance hole for an ISO 4762 socket head cap screw M3–M12.
 * Output (mm): `headDiameterMm` (dk max, plain), `headDiameterKnurledMm`, `headHeightMm` (k max),
 * `clearanceHoleMm` (ISO 273, medium unless `fine` is asked), `counterboreDiameterMm` (DIN 974-1 series),
 * `counterboreDepthMm` (k max + 0.5), `headBelowFaceMm`, `radialClearanceMm` (counterbore to knurled head).
 */
import { z } from "zod";
import { CLEARANCE_HOLES_MM } from "../thread/iso-metric";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { HEAD_BELOW_FACE_MM, ISO_4762, SCREW_SIZES, type ScrewSize } from "./iso4762";

export { ISO_4762, SCREW_SIZES, type ScrewSize } from "./iso4762";

export const CLEARANCE_SERIES = ["fine", "medium"] as const;

export const counterboreInputSchema = z.strictObject({
  screw: z.string({ error: 'Screw must be text such as "M6".' }).trim().min(2).max(5),
  clearance: z.enum(CLEARANCE_SERIES, { error: 'Clearance must be "fine" or "medium" (ISO 273).' }).optional(),
});
export type CounterboreInput = z.infer<typeof counterboreInputSchema>;

export interface CounterboreResult extends CalculatorResultMeta {
  screw: ScrewSize;
  standard: "ISO 4762";
  headDiameterMm: number;
  headDiameterKnurledMm: number;
  headHeightMm: number;
  clearanceHoleMm: number;
  clearanceSeries: (typeof CLEARANCE_SERIES)[number];
  counterboreDiameterMm: number;
  counterboreDepthMm: number;
  headBelowFaceMm: number;
  radialClearanceMm: number;
}

const sources: Source[] = [
  { title: "ISO 4762:2004, hexagon socket head cap screws: dk max, k max", kind: "standard", note: "from memory" },
  { title: "ISO 273:1979, clearance holes for bolts and screws (fine, medium)", kind: "standard", note: "from memory" },
  { title: "DIN 974-1, counterbore diameters for ISO 4762 screws without washers", kind: "standard", note: "from memory" },
  { title: "Counterbore depth = head height k max + 0.5 mm, head just below the face", kind: "common practice" },
];

export function parseScrew(text: string): ScrewSize {
  const normalised = text.trim().toUpperCase().replace(/\s+/g, "");
  if (!(SCREW_SIZES as readonly string[]).includes(normalised)) {
    throw new CalculatorInputError(`"${text}" is not covered: ISO 4762 screws ${SCREW_SIZES.join(", ")}.`, "screw");
  }
  return normalised as ScrewSize;
}

function compute(input: CounterboreInput): CounterboreResult {
  const screw = parseScrew(input.screw);
  const spec = ISO_4762[screw];
  const series = input.clearance ?? "medium";
  const holes = CLEARANCE_HOLES_MM[String(spec.nominalMm)];
  if (!holes) throw new Error(`ISO 273 table lacks ${screw}.`);
  return {
    screw,
    standard: "ISO 4762",
    headDiameterMm: spec.headDiameterMaxMm,
    headDiameterKnurledMm: spec.headDiameterKnurledMaxMm,
    headHeightMm: spec.headHeightMaxMm,
    clearanceHoleMm: holes[series],
    clearanceSeries: series,
    counterboreDiameterMm: spec.counterboreDiameterMm,
    counterboreDepthMm: spec.headHeightMaxMm + HEAD_BELOW_FACE_MM,
    headBelowFaceMm: HEAD_BELOW_FACE_MM,
    radialClearanceMm: Math.round(((spec.counterboreDiameterMm - spec.headDiameterKnurledMaxMm) / 2) * 1000) / 1000,
    cautions: [
      "Sizes assume ISO 4762 screws without washers; a washer or a low-head screw needs a different counterbore.",
      "Use the screw maker's data for the actual head; heads vary within ISO 4762 limits.",
    ],
    sources,
  };
}

export const counterboreCalculator: Calculator<typeof counterboreInputSchema, CounterboreResult> = {
  kind: "counterbore",
  label: "Counterbore for socket head cap screws (ISO 4762)",
  summary: "Counterbore diameter and depth and the clearance hole for an ISO 4762 socket head cap screw M3–M12.",
  inputSchema: counterboreInputSchema,
  compute,
  sources,
};
