/**
 * `beam`: deflection and bending stress of a stop rod, clamp arm or bar — cantilever with an end load, or
 * simply supported with a centre load — for a round or rectangular section, with E (and the yield strength
 * for a safety factor) from the materials catalogue or given directly. Formulas: ./formulas.
 */
import { z } from "zod";
import { getMaterial, MATERIAL_KEYS } from "../../materials";
import { CalculatorInputError, SETUP_CAUTION, type Calculator, type CalculatorResultMeta, type Source } from "../types";
import {
  bendingStressMpa,
  deflectionMm,
  extremeFibreMm,
  maxMomentNmm,
  secondMomentMm4,
  sectionDepthMm,
  type BeamSection,
} from "./formulas";

export * from "./formulas";

const positiveMm = (what: string) => z.number({ error: `${what} must be a number (mm).` }).positive(`${what} must be greater than 0 mm.`);

export const beamInputSchema = z
  .strictObject({
    case: z.enum(["cantilever", "simply-supported"], { error: 'Case must be "cantilever" (end load) or "simply-supported" (centre load).' }),
    section: z.enum(["round", "rectangular"], { error: 'Section must be "round" or "rectangular".' }),
    /** Round section diameter. */
    diameter: positiveMm("Diameter").optional(),
    /** Rectangular section width (across the load). */
    width: positiveMm("Width").optional(),
    /** Rectangular section height (in the load direction). */
    height: positiveMm("Height").optional(),
    /** Cantilever: fixed end to load; simply supported: span between supports. */
    length: positiveMm("Length"),
    /** Point load, N. */
    load: z.number({ error: "Load must be a number (N)." }).positive("Load must be greater than 0 N."),
    /** Materials catalogue key; supplies E and the yield strength. */
    material: z.enum(MATERIAL_KEYS, { error: `Material must be one of: ${MATERIAL_KEYS.join(", ")}.` }).optional(),
    /** Young's modulus E in MPa, overriding the material's. */
    elasticModulus: z.number({ error: "Elastic modulus must be a number (MPa)." }).positive("Elastic modulus must be greater than 0 MPa.").optional(),
    /** Yield (0.2 % proof) strength in MPa, overriding the material's. */
    yieldStrength: z.number({ error: "Yield strength must be a number (MPa)." }).positive("Yield strength must be greater than 0 MPa.").optional(),
  })
  .superRefine((v, ctx) => {
    if (v.section === "round" && v.diameter === undefined) {
      ctx.addIssue({ code: "custom", path: ["diameter"], message: "A round section needs a diameter (mm)." });
    }
    if (v.section === "rectangular") {
      if (v.width === undefined) ctx.addIssue({ code: "custom", path: ["width"], message: "A rectangular section needs a width (mm)." });
      if (v.height === undefined) {
        ctx.addIssue({ code: "custom", path: ["height"], message: "A rectangular section needs a height in the load direction (mm)." });
      }
    }
    if (v.material === undefined && v.elasticModulus === undefined) {
      ctx.addIssue({ code: "custom", path: ["material"], message: "Give a material from the catalogue or an elastic modulus (MPa)." });
    }
  });
export type BeamInput = z.infer<typeof beamInputSchema>;

export interface BeamResult extends CalculatorResultMeta {
  case: BeamInput["case"];
  section: BeamInput["section"];
  /** Deflection under the load. */
  deflectionMm: number;
  /** Largest bending stress (extreme fibre, at the fixed end or under the centre load). */
  stressMpa: number;
  secondMomentMm4: number;
  sectionModulusMm3: number;
  momentNmm: number;
  /** Load per unit deflection at the load point. */
  stiffnessNPerMm: number;
  elasticModulusMpa: number;
  yieldStrengthMpa: number | null;
  /** Yield strength / bending stress (null when no yield strength is known). */
  yieldSafetyFactor: number | null;
  material: string | null;
}

const beamSources: Source[] = [
  {
    title: "Roark's Formulas for Stress and Strain, Table 8.1 — cantilever with end load (δ = FL³/3EI), simply supported with centre load (δ = FL³/48EI)",
    kind: "from memory",
  },
  { title: "Mechanics of materials texts: flexure formula σ = M·c/I; I = πd⁴/64 (round), bh³/12 (rectangle)", kind: "textbook" },
];

function sectionOf(input: BeamInput): BeamSection {
  if (input.section === "round") {
    if (input.diameter === undefined) throw new CalculatorInputError("A round section needs a diameter (mm).", "diameter");
    return { kind: "round", diameterMm: input.diameter };
  }
  if (input.width === undefined) throw new CalculatorInputError("A rectangular section needs a width (mm).", "width");
  if (input.height === undefined) throw new CalculatorInputError("A rectangular section needs a height (mm).", "height");
  return { kind: "rectangular", widthMm: input.width, heightMm: input.height };
}

function compute(input: BeamInput): BeamResult {
  const section = sectionOf(input);
  const material = input.material !== undefined ? getMaterial(input.material) : undefined;
  const elasticModulusMpa = input.elasticModulus ?? material?.elasticModulusMpa;
  if (elasticModulusMpa === undefined) {
    throw new CalculatorInputError("Give a material from the catalogue or an elastic modulus (MPa).", "material");
  }
  const yieldStrengthMpa = input.yieldStrength ?? material?.yieldStrengthMpa ?? null;
  const iMm4 = secondMomentMm4(section);
  const cMm = extremeFibreMm(section);
  const momentNmm = maxMomentNmm(input.case, input.load, input.length);
  const deflection = deflectionMm(input.case, input.load, input.length, elasticModulusMpa, iMm4);
  const stressMpa = bendingStressMpa(momentNmm, cMm, iMm4);
  const yieldSafetyFactor = yieldStrengthMpa === null ? null : yieldStrengthMpa / stressMpa;

  const cautions = [
    SETUP_CAUTION,
    "Elastic bending only: a real fixed end (a rod held in a bored hole or a clamp) is never fully rigid, so the part " +
      "deflects more; stress at a cross hole, thread or shoulder is higher than the plain-beam figure.",
  ];
  const depth = sectionDepthMm(section);
  if (input.length < 5 * depth) {
    cautions.push(`The beam is short for its depth (length ${input.length} mm < 5 × ${depth} mm): shear adds deflection the bending formula leaves out.`);
  }
  if (deflection > 0.02 * input.length) {
    cautions.push("The deflection is large for the length: small-deflection beam theory no longer holds; make the section stiffer.");
  }
  if (yieldSafetyFactor !== null && yieldSafetyFactor < 1) {
    cautions.push(`The bending stress ${stressMpa.toFixed(0)} MPa exceeds the yield strength ${yieldStrengthMpa} MPa: the part bends permanently.`);
  } else if (yieldSafetyFactor !== null && yieldSafetyFactor < 2) {
    cautions.push(`Safety factor against yield is only ${yieldSafetyFactor.toFixed(2)}; shocks and fatigue need more.`);
  }

  return {
    case: input.case,
    section: input.section,
    deflectionMm: deflection,
    stressMpa,
    secondMomentMm4: iMm4,
    sectionModulusMm3: iMm4 / cMm,
    momentNmm,
    stiffnessNPerMm: input.load / deflection,
    elasticModulusMpa,
    yieldStrengthMpa,
    yieldSafetyFactor,
    material: material?.key ?? null,
    cautions,
    sources: material ? [...beamSources, material.sources.elasticModulusMpa, material.sources.yieldStrengthMpa] : beamSources,
  };
}

export const beamCalculator: Calculator<typeof beamInputSchema, BeamResult> = {
  kind: "beam",
  label: "Beam deflection",
  summary: "Deflection and bending stress of a round or rectangular bar, as a cantilever with an end load or simply supported with a centre load.",
  inputSchema: beamInputSchema,
  sources: beamSources,
  compute,
};
