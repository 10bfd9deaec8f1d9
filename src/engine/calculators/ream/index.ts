/**
 * `ream` calculator: the drill to use before reaming a hole, and the stock that leaves for the reamer.
 * Output (mm): `predrillMm` (the reamed diameter minus the tabulated allowance, taken down to a 0.05 mm
 * drill step), `allowanceMm` (the stock actually left), `allowanceRangeText`, `method`, and the limits of
 * the hole's tolerance class (H7 unless given) from ISO 286.
 */
import { z } from "zod";
import { holeLimits, type ToleranceLimits } from "../fit";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { allowanceBand, MAX_REAM_DIAMETER_MM, MIN_REAM_DIAMETER_MM, REAM_METHODS, type ReamMethod } from "./allowance";

export { ALLOWANCE, REAM_METHODS, type ReamMethod } from "./allowance";

export const reamInputSchema = z.strictObject({
  diameter: z
    .number({ error: "Reamed diameter must be a number (mm)." })
    .min(MIN_REAM_DIAMETER_MM, `Reamed diameter must be at least ${MIN_REAM_DIAMETER_MM} mm.`)
    .max(MAX_REAM_DIAMETER_MM, `Reamed diameter must be at most ${MAX_REAM_DIAMETER_MM} mm (table range).`),
  method: z.enum(REAM_METHODS, { error: 'Method must be "machine" or "hand".' }).optional(),
  toleranceClass: z.string({ error: 'Tolerance class must be text such as "H7".' }).trim().min(2).max(4).optional(),
});
export type ReamInput = z.infer<typeof reamInputSchema>;

export interface ReamResult extends CalculatorResultMeta {
  diameterMm: number;
  method: ReamMethod;
  predrillMm: number;
  allowanceMm: number;
  allowanceRangeText: string;
  hole: ToleranceLimits;
}

const sources: Source[] = [
  {
    title: "Reaming allowance tables (reamer makers' catalogues and workshop handbooks): machine 0.1 mm ≤ Ø4 … 0.5 mm ≤ Ø50; hand about 0.1 mm",
    kind: "from memory",
  },
  { title: "A 4 mm reamed hole is drilled 3.9 mm first", kind: "common practice" },
  { title: "ISO 286-1/-2 for the limits of the reamed hole's tolerance class", kind: "standard" },
];

/** Drill to use before reaming: diameter − allowance, taken DOWN to a 0.05 mm drill step so at least the allowance is left. */
export function predrillDiameterMm(diameterMm: number, method: ReamMethod = "machine"): number {
  const band = allowanceBand(diameterMm, method);
  if (!band || diameterMm < MIN_REAM_DIAMETER_MM) {
    throw new CalculatorInputError(
      `Reamed diameter ${diameterMm} mm is outside the table (${MIN_REAM_DIAMETER_MM}–${MAX_REAM_DIAMETER_MM} mm).`,
      "diameter",
    );
  }
  // Work in hundredths of a millimetre so 3.9 stays 3.9.
  const hundredths = Math.round((diameterMm - band.allowanceMm) * 1e4) / 100;
  return (Math.floor(hundredths / 5 + 1e-9) * 5) / 100;
}

function compute(input: ReamInput): ReamResult {
  const method = input.method ?? "machine";
  const band = allowanceBand(input.diameter, method);
  if (!band) throw new CalculatorInputError(`Reamed diameter ${input.diameter} mm is outside the table.`, "diameter");
  const predrillMm = predrillDiameterMm(input.diameter, method);
  const hole = holeLimits(input.diameter, input.toleranceClass ?? "H7");
  return {
    diameterMm: input.diameter,
    method,
    predrillMm,
    allowanceMm: Math.round((input.diameter - predrillMm) * 1000) / 1000,
    allowanceRangeText: `${band.range} mm on the diameter`,
    hole,
    cautions: [
      "A drilled hole usually runs oversize; in a new material drill a test hole and measure it before committing.",
      "Too little stock makes the reamer rub and glaze the hole, too much overloads it: keep to the reamer maker's figures.",
      `Check the reamed hole with a ${hole.toleranceClass} plug gauge or a calibrated bore gauge.`,
    ],
    sources,
  };
}

export const reamCalculator: Calculator<typeof reamInputSchema, ReamResult> = {
  kind: "ream",
  label: "Reamed hole: pre-drill and allowance",
  summary: "Which drill to use before reaming a hole of a given size by hand or machine, and the stock left for the reamer.",
  inputSchema: reamInputSchema,
  compute,
  sources,
};
