/**
 * `strap-clamp`: the force a strap (toe) clamp puts on the work from the stud's tension and the lever
 * proportions, the share the heel takes, the bending stress in the strap at the stud, the stud's own stress,
 * the strap's tilt, and (with a friction figure) how hard the work can be pushed before it slides.
 * Formulas: ./lever; stud preload: ../holding-force/bolts.
 */
import { z } from "zod";
import { getMaterial, MATERIAL_KEYS } from "../../materials";
import { frictionHoldN, preloadFromTorqueN, proofStressMpa, PROPERTY_CLASSES, type PropertyClass } from "../holding-force/bolts";
import { basicProfile, parseThread } from "../thread";
import { CalculatorInputError, SETUP_CAUTION, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import { heelForceN, slottedSectionModulusMm3, strapTiltDeg, workForceN } from "./lever";

export * from "./lever";

const positiveMm = (what: string) => z.number({ error: `${what} must be a number (mm).` }).positive(`${what} must be greater than 0 mm.`);

export const strapClampInputSchema = z.strictObject({
  /** Stud thread, e.g. "M10". */
  stud: z.string({ error: 'Stud must be text such as "M10".' }).trim().min(2).max(20),
  /** Tightening torque on the stud's nut, N·m (give this or `studForce`). */
  tighteningTorque: z.number({ error: "Tightening torque must be a number (N·m)." }).positive("Tightening torque must be greater than 0 N·m.").optional(),
  /** Stud tension, N (give this or `tighteningTorque`). */
  studForce: z.number({ error: "Stud force must be a number (N)." }).positive("Stud force must be greater than 0 N.").optional(),
  nutFactor: z.number({ error: "Nut factor must be a number." }).min(0.08).max(0.4).default(0.2),
  /** a: stud axis to where the strap bears on the work. */
  studToWork: positiveMm("Stud to work distance"),
  /** b: stud axis to where the strap bears on the heel block. */
  studToHeel: positiveMm("Stud to heel distance"),
  strapWidth: positiveMm("Strap width"),
  strapThickness: positiveMm("Strap thickness"),
  /** Width of the stud's slot through the strap (0 for a plain hole-free section). */
  slotWidth: z.number({ error: "Slot width must be a number (mm)." }).min(0, "Slot width cannot be negative.").default(0),
  material: z.enum(MATERIAL_KEYS, { error: `Material must be one of: ${MATERIAL_KEYS.join(", ")}.` }).optional(),
  yieldStrength: z.number({ error: "Yield strength must be a number (MPa)." }).positive().optional(),
  /** Wanted safety factor against yield in the strap. */
  safetyFactor: z.number({ error: "Safety factor must be a number." }).min(1, "A safety factor below 1 means yielding.").max(10).default(2),
  studClass: z.enum(PROPERTY_CLASSES, { error: `Stud property class must be one of ${PROPERTY_CLASSES.join(", ")} (ISO 898-1).` }).default("8.8"),
  /** Heights of the strap's two bearing points above the table (for the tilt). */
  workHeight: z.number({ error: "Work height must be a number (mm)." }).min(0).optional(),
  heelHeight: z.number({ error: "Heel height must be a number (mm)." }).min(0).optional(),
  /** Friction between the work and the table (for the holding force). */
  mu: z.number({ error: "Friction coefficient must be a number." }).positive().max(1).optional(),
});
export type StrapClampInput = z.infer<typeof strapClampInputSchema>;

export interface StrapClampResult extends CalculatorResultMeta {
  stud: string;
  studForceN: number;
  studForceSource: "torque" | "stated";
  /** b/(a + b): the share of the stud's pull that reaches the work. */
  workShare: number;
  workForceN: number;
  heelForceN: number;
  momentNmm: number;
  sectionModulusMm3: number;
  bendingStressMpa: number;
  yieldStrengthMpa: number | null;
  allowableStressMpa: number | null;
  /** Yield / bending stress. */
  yieldSafetyFactor: number | null;
  stressOk: boolean | null;
  studStressMpa: number;
  studProofStressMpa: number;
  studClass: PropertyClass;
  /** Stud tension / proof load. */
  studProofFraction: number;
  tiltDeg: number | null;
  tilt: "toward-work" | "level" | "toward-heel" | null;
  /** μ·F_work (friction at the table only; cautious). */
  holdingForceN: number | null;
}

export const strapClampSources: Source[] = [
  { title: "Meriam & Kraige, Engineering Mechanics: Statics — equilibrium of a rigid body, moments about each support: F_work = F_stud·b/(a + b)", kind: "from memory" },
  { title: "Gere & Timoshenko, Mechanics of Materials — flexure formula σ = M/Z, Z = b·h²/6 for a rectangle", kind: "from memory" },
  { title: "Shigley's Mechanical Engineering Design, bolted joints: T = K·F·d, K ≈ 0.2", kind: "from memory" },
  { title: "ISO 898-1, proof stress of the stud's property class", kind: "standard", note: "from memory" },
  { title: "Stud nearer the work than the heel; heel level with the work or a little higher", kind: "common practice" },
];

function compute(input: StrapClampInput): StrapClampResult {
  const thread = parseThread(input.stud);
  const profile = basicProfile(thread.majorDiameter, thread.pitch);
  if ((input.tighteningTorque === undefined) === (input.studForce === undefined)) {
    throw new CalculatorInputError("Give either the tightening torque (N·m) or the stud force (N), not both or neither.", "tighteningTorque");
  }
  if (input.slotWidth >= input.strapWidth) {
    throw new CalculatorInputError(`The slot (${input.slotWidth} mm) is as wide as the strap (${input.strapWidth} mm).`, "slotWidth");
  }
  if ((input.workHeight === undefined) !== (input.heelHeight === undefined)) {
    throw new CalculatorInputError("Give both the work height and the heel height for the strap's tilt, or neither.", "heelHeight");
  }
  const studForceSource = input.studForce !== undefined ? "stated" : "torque";
  const studForceN = input.studForce ?? preloadFromTorqueN(input.tighteningTorque!, input.nutFactor, thread.majorDiameter);
  const a = input.studToWork;
  const b = input.studToHeel;
  const fWork = workForceN(studForceN, a, b);
  const fHeel = heelForceN(studForceN, a, b);
  const momentNmm = fWork * a;
  const z = slottedSectionModulusMm3(input.strapWidth, input.strapThickness, input.slotWidth);
  const bendingStressMpa = momentNmm / z;
  const material = input.material !== undefined ? getMaterial(input.material) : undefined;
  const yieldStrengthMpa = input.yieldStrength ?? material?.yieldStrengthMpa ?? null;
  const allowableStressMpa = yieldStrengthMpa === null ? null : yieldStrengthMpa / input.safetyFactor;
  const studProofStressMpa = proofStressMpa(input.studClass, thread.majorDiameter);
  const studStressMpa = studForceN / profile.stressAreaMm2;
  const studProofFraction = studStressMpa / studProofStressMpa;
  let tiltDeg: number | null = null;
  let tilt: StrapClampResult["tilt"] = null;
  if (input.workHeight !== undefined && input.heelHeight !== undefined) {
    tiltDeg = strapTiltDeg(input.heelHeight, input.workHeight, a + b);
    tilt = Math.abs(tiltDeg) < 1e-9 ? "level" : tiltDeg > 0 ? "toward-work" : "toward-heel";
  }
  const cautions = [
    SETUP_CAUTION,
    "Put the stud as close to the work as it will go and the heel at work height or a little above: most of the stud's pull then presses the work.",
    "Use a spherical or hardened washer under the nut so the strap can tilt without bending the stud.",
    "Preload from a torque scatters by about ±25 %; the force on the work scatters with it.",
  ];
  if (a >= b) cautions.push(`The stud is ${a >= b && a === b ? "midway" : "nearer the heel"}: only ${Math.round((b / (a + b)) * 100)} % of its pull reaches the work.`);
  if (tilt === "toward-heel") cautions.push("The strap tips down toward the heel: it bears on the work with its inner edge and can push the work away. Raise the heel.");
  if (allowableStressMpa !== null && bendingStressMpa > allowableStressMpa) {
    cautions.push(`The strap's bending stress (${bendingStressMpa.toFixed(0)} MPa) is above ${allowableStressMpa.toFixed(0)} MPa (yield ÷ ${input.safetyFactor}): it may bend. Use a thicker strap or tighten less.`);
  }
  if (studProofFraction > 1) cautions.push(`The stud is loaded past its proof load (${Math.round(studProofFraction * 100)} %): it will stretch. Tighten less or use a larger or stronger stud.`);
  return {
    stud: thread.designation,
    studForceN,
    studForceSource,
    workShare: b / (a + b),
    workForceN: fWork,
    heelForceN: fHeel,
    momentNmm,
    sectionModulusMm3: z,
    bendingStressMpa,
    yieldStrengthMpa,
    allowableStressMpa,
    yieldSafetyFactor: yieldStrengthMpa === null ? null : yieldStrengthMpa / bendingStressMpa,
    stressOk: allowableStressMpa === null ? null : bendingStressMpa <= allowableStressMpa,
    studStressMpa,
    studProofStressMpa,
    studClass: input.studClass,
    studProofFraction,
    tiltDeg,
    tilt,
    holdingForceN: input.mu !== undefined ? frictionHoldN(input.mu, fWork) : null,
    cautions,
    sources: material ? [...strapClampSources, material.sources.yieldStrengthMpa] : strapClampSources,
  };
}

export const strapClampCalculator: Calculator<typeof strapClampInputSchema, StrapClampResult> = {
  kind: "strap-clamp",
  label: "Strap clamp",
  summary:
    "Force a strap (toe) clamp puts on the work from the stud's tension and the lever proportions, the heel's share, the strap's bending stress at the stud, the stud's stress and the strap's tilt.",
  inputSchema: strapClampInputSchema,
  compute,
  sources: strapClampSources,
};
