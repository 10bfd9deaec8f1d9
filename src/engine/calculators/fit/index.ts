/**
 * `fit` calculator: ISO 286-1/-2 limits for a hole class, a shaft class or both at one nominal size, and the
 * resulting fit. Output (mm): hole/shaft `{ upper, lower }` deviations plus limit sizes `max`/`min` and the
 * IT value `itMm`; `clearanceMin`, `clearanceMax` (negative = interference) and `kind` when both are given.
 */
import { z } from "zod";
import { CalculatorInputError, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { fitBetween, holeLimits, MAX_SIZE_MM, shaftLimits, type FitKind, type ToleranceLimits } from "./iso286";

export { deltaUm, fitBetween, holeLimits, shaftLimits, toleranceGrade, HOLE_LETTERS, SHAFT_LETTERS } from "./iso286";
export type { FitKind, FitLimits, ToleranceLimits } from "./iso286";

export const fitInputSchema = z
  .strictObject({
    size: z
      .number({ error: "Nominal size must be a number (mm)." })
      .positive("Nominal size must be greater than 0 mm.")
      .max(MAX_SIZE_MM, `Nominal size must be at most ${MAX_SIZE_MM} mm (ISO 286 as covered here).`),
    hole: z.string({ error: "Hole class must be text such as \"H7\"." }).trim().min(1).max(4).optional(),
    shaft: z.string({ error: "Shaft class must be text such as \"g6\"." }).trim().min(1).max(4).optional(),
  })
  .refine((v) => v.hole !== undefined || v.shaft !== undefined, {
    message: "Give a hole class, a shaft class, or both (e.g. hole \"H7\", shaft \"g6\").",
    path: ["hole"],
  });
export type FitInput = z.infer<typeof fitInputSchema>;

export interface FitResult extends CalculatorResultMeta {
  sizeMm: number;
  hole?: ToleranceLimits;
  shaft?: ToleranceLimits;
  clearanceMin?: number;
  clearanceMax?: number;
  kind?: FitKind;
  /** "H7/g6" when both classes are given. */
  designation?: string;
}

const sources: Source[] = [
  { title: "ISO 286-1:2010, Table 1 (standard tolerance grades IT1–IT18)", kind: "standard", note: "values from memory, cross-checked against the standard's tolerance-factor formula" },
  { title: "ISO 286-1:2010, Tables 2 and 3 (fundamental deviations of shafts and holes, Δ rule)", kind: "standard", note: "values from memory" },
  { title: "ISO 286-2:2010 (tables of limit deviations) for the check values in the tests", kind: "standard", note: "from memory" },
];

const KIND_NOTE: Record<FitKind, string> = {
  clearance: "Clearance fit: the shaft always goes in.",
  transition: "Transition fit: depending on the actual sizes it may slide or need light pressing.",
  interference: "Interference fit: needs pressing, or heating the hub / cooling the shaft; check hub stress and assembly force.",
};

function compute(input: FitInput): FitResult {
  if (input.hole === undefined && input.shaft === undefined) {
    throw new CalculatorInputError("Give a hole class, a shaft class, or both.", "hole");
  }
  const hole = input.hole !== undefined ? holeLimits(input.size, input.hole) : undefined;
  const shaft = input.shaft !== undefined ? shaftLimits(input.size, input.shaft) : undefined;
  const cautions = [
    "Limits apply at the reference temperature of 20 °C (ISO 1); measure the finished part with gauges or a calibrated instrument.",
  ];
  const result: FitResult = { sizeMm: input.size, cautions, sources };
  if (hole) result.hole = hole;
  if (shaft) result.shaft = shaft;
  if (hole && shaft) {
    const fit = fitBetween(hole, shaft);
    Object.assign(result, fit, { designation: `${hole.toleranceClass}/${shaft.toleranceClass}` });
    cautions.push(KIND_NOTE[fit.kind]);
  }
  return result;
}

export const fitCalculator: Calculator<typeof fitInputSchema, FitResult> = {
  kind: "fit",
  label: "Hole and shaft fit (ISO 286)",
  summary: "Limit deviations of a hole and/or shaft tolerance class and the clearance or interference between them.",
  inputSchema: fitInputSchema,
  compute,
  sources,
};
