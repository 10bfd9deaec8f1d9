/**
 * `holding-force`: how hard a part fastened by bolts can be pushed sideways before it slides — bolt preload
 * (from the tightening torque via T = K·F·d, or stated) × the number of bolts × friction — with the bolt's
 * stress against its property class and, when a sideways load is given, the safety factor. Formulas: ./bolts.
 */
import { z } from "zod";
import { parseThread, basicProfile } from "../thread";
import { CalculatorInputError, SETUP_CAUTION, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { frictionHoldN, PRELOAD_CAUTION_FRACTION, preloadFromTorqueN, proofStressMpa, PROPERTY_CLASSES, torqueForPreloadNm, type PropertyClass } from "./bolts";

export * from "./bolts";

export const holdingForceInputSchema = z.strictObject({
  /** Bolt thread, e.g. "M10" (ISO metric, M1.6–M24). */
  bolt: z.string({ error: 'Bolt must be text such as "M10".' }).trim().min(2).max(20),
  /** Tightening torque, N·m (give this or `preload`). */
  tighteningTorque: z.number({ error: "Tightening torque must be a number (N·m)." }).positive("Tightening torque must be greater than 0 N·m.").optional(),
  /** Bolt preload per bolt, N (give this or `tighteningTorque`). */
  preload: z.number({ error: "Preload must be a number (N)." }).positive("Preload must be greater than 0 N.").optional(),
  /** Nut factor K in T = K·F·d; 0.2 for plain dry steel (common practice). */
  nutFactor: z.number({ error: "Nut factor must be a number." }).min(0.08, "A nut factor below 0.08 is unrealistic.").max(0.4, "A nut factor above 0.4 is unrealistic.").default(0.2),
  /** Friction coefficient between the part and what it sits on. */
  mu: z.number({ error: "Friction coefficient must be a number." }).positive("Friction coefficient must be greater than 0.").max(1, "A friction coefficient above 1 is unrealistic."),
  /** Number of bolts sharing the load. */
  boltCount: z.number({ error: "Bolt count must be a whole number." }).int("Bolt count must be a whole number.").min(1).max(12).default(1),
  propertyClass: z.enum(PROPERTY_CLASSES, { error: `Property class must be one of ${PROPERTY_CLASSES.join(", ")} (ISO 898-1).` }).default("8.8"),
  /** The sideways load to be held, N (optional: gives a safety factor). */
  load: z.number({ error: "Load must be a number (N)." }).positive("Load must be greater than 0 N.").optional(),
});
export type HoldingForceInput = z.infer<typeof holdingForceInputSchema>;

export interface HoldingForceResult extends CalculatorResultMeta {
  bolt: string;
  boltNominalMm: number;
  stressAreaMm2: number;
  preloadSource: "torque" | "stated";
  /** Preload of one bolt. */
  preloadN: number;
  /** The torque that gives the preload (the input, or T = K·F·d for a stated preload). */
  tighteningTorqueNm: number;
  nutFactor: number;
  /** Total force pressing the part down: n·F. */
  normalForceN: number;
  /** Largest sideways force friction holds: μ·n·F. */
  holdingForceN: number;
  boltStressMpa: number;
  propertyClass: PropertyClass;
  proofStressMpa: number;
  proofLoadN: number;
  /** Preload / proof load. */
  preloadFractionOfProof: number;
  /** Holding force / load (null without a load). */
  safetyFactor: number | null;
}

export const holdingForceSources: Source[] = [
  { title: "Shigley's Mechanical Engineering Design, bolted joints: tightening torque T = K·F·d, K ≈ 0.2 when the finish is not known", kind: "from memory" },
  { title: "Coulomb dry friction, F ≤ μ·N (statics texts, e.g. Meriam & Kraige, Engineering Mechanics: Statics, friction chapter)", kind: "textbook" },
  { title: "ISO 898-1, mechanical properties of steel bolts: proof stress by property class", kind: "standard", note: "from memory" },
  { title: "Preload from a torque spanner scatters by about ±25 % with the friction in the thread and under the head", kind: "common practice" },
];

function compute(input: HoldingForceInput): HoldingForceResult {
  const thread = parseThread(input.bolt);
  const profile = basicProfile(thread.majorDiameter, thread.pitch);
  const d = thread.majorDiameter;
  if ((input.tighteningTorque === undefined) === (input.preload === undefined)) {
    throw new CalculatorInputError("Give either the tightening torque (N·m) or the preload (N), not both or neither.", "tighteningTorque");
  }
  const preloadSource = input.preload !== undefined ? "stated" : "torque";
  const preloadN = input.preload ?? preloadFromTorqueN(input.tighteningTorque!, input.nutFactor, d);
  const tighteningTorqueNm = input.tighteningTorque ?? torqueForPreloadNm(preloadN, input.nutFactor, d);
  const normalForceN = input.boltCount * preloadN;
  const holdingForceN = frictionHoldN(input.mu, normalForceN);
  const sp = proofStressMpa(input.propertyClass, d);
  const proofLoadN = sp * profile.stressAreaMm2;
  const boltStressMpa = preloadN / profile.stressAreaMm2;
  const preloadFractionOfProof = preloadN / proofLoadN;
  const safetyFactor = input.load !== undefined ? holdingForceN / input.load : null;

  const cautions = [
    SETUP_CAUTION,
    "Friction holding depends on clean, dry, flat faces: oil, swarf or a painted base can halve it. A positive stop behind the part is safer than friction alone.",
    `The preload from a torque scatters by about ±25 % (the nut factor ${input.nutFactor} is an estimate); the holding force scatters with it.`,
  ];
  if (preloadFractionOfProof > 1) {
    cautions.push(`The preload is ${Math.round(preloadFractionOfProof * 100)} % of the ${thread.designation} ${input.propertyClass} bolt's proof load: it will stretch permanently or break. Tighten less or use a larger or stronger bolt.`);
  } else if (preloadFractionOfProof > PRELOAD_CAUTION_FRACTION) {
    cautions.push(`The preload is ${Math.round(preloadFractionOfProof * 100)} % of the bolt's proof load; for a bolt that is tightened again and again, stay below about 75 %.`);
  }
  if (safetyFactor !== null && safetyFactor < 2) {
    cautions.push(`Friction holds only ${safetyFactor.toFixed(2)} times the load; cutting forces vibrate and can creep a part that friction barely holds.`);
  }
  return {
    bolt: thread.designation,
    boltNominalMm: d,
    stressAreaMm2: profile.stressAreaMm2,
    preloadSource,
    preloadN,
    tighteningTorqueNm,
    nutFactor: input.nutFactor,
    normalForceN,
    holdingForceN,
    boltStressMpa,
    propertyClass: input.propertyClass,
    proofStressMpa: sp,
    proofLoadN,
    preloadFractionOfProof,
    safetyFactor,
    cautions,
    sources: holdingForceSources,
  };
}

export const holdingForceCalculator: Calculator<typeof holdingForceInputSchema, HoldingForceResult> = {
  kind: "holding-force",
  label: "Bolted holding force",
  summary: "How hard a bolted part can be pushed sideways before it slides: preload from the tightening torque (T = K·F·d) or stated, times friction, with the bolt's stress.",
  inputSchema: holdingForceInputSchema,
  compute,
  sources: holdingForceSources,
};
