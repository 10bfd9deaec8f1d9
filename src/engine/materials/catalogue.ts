/**
 * The workshop materials catalogue: the stock a small shop buys, with the figures the calculators need.
 *
 * Figures are typical minimum (specified) values for the named standard grade and condition, not test
 * certificates: the real bar can be stronger or weaker. Every figure names where it comes from; "from memory"
 * marks a value recalled from the standard or datasheet family rather than read from it here.
 *
 * `hardenable` means "can be through-hardened by quench and temper in a small shop"; case hardening or
 * surface hardening that needs other kit is described in `heatTreatmentNote`.
 */
import { z } from "zod";
import type { Source } from "../calculators/types";

export const MATERIAL_KEYS = [
  "mild-steel",
  "free-cutting-steel",
  "tool-steel",
  "stainless-303",
  "stainless-304",
  "leaded-bronze",
  "phosphor-bronze",
  "brass",
  "aluminium-6061",
  "aluminium-6082",
  "cast-iron",
  "acetal",
] as const;

export type MaterialKey = (typeof MATERIAL_KEYS)[number];

/** Groups used to pick cutting speeds (the cutting-speed calculator keys its table on these). */
export const CUTTING_GROUPS = [
  "steel-low-carbon",
  "steel-free-cutting",
  "tool-steel",
  "stainless",
  "bronze",
  "brass",
  "aluminium",
  "cast-iron",
  "plastic",
] as const;
export type CuttingGroup = (typeof CUTTING_GROUPS)[number];

/** Broad family used for friction pairs. */
export type FrictionFamily = "steel" | "cast-iron" | "bronze" | "brass" | "aluminium" | "acetal";

/** Which figure a source backs. */
export type MaterialFigure = "densityKgM3" | "elasticModulusMpa" | "yieldStrengthMpa" | "tensileStrengthMpa";

export interface Material {
  key: MaterialKey;
  /** Shop name shown to the user. */
  name: string;
  /** Grade and condition the figures refer to, e.g. "S235JR (1.0038), hot rolled, EN 10025-2". */
  grade: string;
  densityKgM3: number;
  /** Young's modulus E in MPa (N/mm²). */
  elasticModulusMpa: number;
  /** 0.2 % proof (or yield) strength, typical specified minimum, MPa. */
  yieldStrengthMpa: number;
  /** Tensile strength, lower end of the specified range, MPa. */
  tensileStrengthMpa: number;
  cuttingGroup: CuttingGroup;
  frictionFamily: FrictionFamily;
  hardenable: boolean;
  heatTreatmentNote?: string;
  notes: string;
  /** Where each figure comes from. */
  sources: Record<MaterialFigure, Source>;
}

const fromMemory = (title: string, note?: string): Source => ({ title, kind: "from memory", ...(note ? { note } : {}) });
const steelDensityAndModulus = fromMemory(
  "EN 1993-1-1 §3.2.6 design values for structural steel: ρ 7850 kg/m³, E 210 000 MPa",
);

export const materials: Readonly<Record<MaterialKey, Material>> = {
  "mild-steel": {
    key: "mild-steel",
    name: "Mild steel",
    grade: "S235JR (1.0038), hot rolled, EN 10025-2 (bright drawn EN 10277 bar is similar or stronger)",
    densityKgM3: 7850,
    elasticModulusMpa: 210_000,
    yieldStrengthMpa: 235,
    tensileStrengthMpa: 360,
    cuttingGroup: "steel-low-carbon",
    frictionFamily: "steel",
    hardenable: false,
    heatTreatmentNote: "Too little carbon to through-harden; can be case hardened (carburised) for a wear skin.",
    notes: "General fabrication and jig bodies; welds well; machines with a stringy chip.",
    sources: {
      densityKgM3: steelDensityAndModulus,
      elasticModulusMpa: steelDensityAndModulus,
      yieldStrengthMpa: fromMemory("EN 10025-2, S235JR: ReH ≥ 235 MPa for thickness ≤ 16 mm"),
      tensileStrengthMpa: fromMemory("EN 10025-2, S235JR: Rm 360–510 MPa for thickness 3–100 mm"),
    },
  },
  "free-cutting-steel": {
    key: "free-cutting-steel",
    name: "Free-cutting steel",
    grade: "11SMnPb30 (1.0718), cold drawn +C, EN 10277 (16–40 mm bar)",
    densityKgM3: 7850,
    elasticModulusMpa: 210_000,
    yieldStrengthMpa: 375,
    tensileStrengthMpa: 460,
    cuttingGroup: "steel-free-cutting",
    frictionFamily: "steel",
    hardenable: false,
    heatTreatmentNote: "Not a through-hardening grade; case hardening possible but sulphur/lead grades are poor for it.",
    notes: "Leaded, resulphurised bar for turned parts; excellent finish and short chips; poor for welding.",
    sources: {
      densityKgM3: steelDensityAndModulus,
      elasticModulusMpa: steelDensityAndModulus,
      yieldStrengthMpa: fromMemory("EN 10277 (free-cutting steels, +C cold drawn), 11SMnPb30 16–40 mm: Rp0.2 ≥ 375 MPa"),
      tensileStrengthMpa: fromMemory("EN 10277 (free-cutting steels, +C cold drawn), 11SMnPb30 16–40 mm: Rm 460–710 MPa"),
    },
  },
  "tool-steel": {
    key: "tool-steel",
    name: "Tool steel (O1, annealed)",
    grade: "100MnCrW4 / O1 class (1.2510), soft annealed, EN ISO 4957",
    densityKgM3: 7800,
    elasticModulusMpa: 210_000,
    yieldStrengthMpa: 400,
    tensileStrengthMpa: 700,
    cuttingGroup: "tool-steel",
    frictionFamily: "steel",
    hardenable: true,
    heatTreatmentNote:
      "Oil hardening: heat to about 790–820 °C, quench in oil, temper at 180–250 °C for about 58–62 HRC " +
      "(follow the steel maker's datasheet). Strength figures here are for the annealed bar as machined.",
    notes: "Ground flat stock (gauge plate) for wear parts, stop rods and cams that are hardened after machining.",
    sources: {
      densityKgM3: fromMemory("Tool-steel maker datasheets for 1.2510: ρ ≈ 7800 kg/m³"),
      elasticModulusMpa: fromMemory("Tool-steel maker datasheets for 1.2510: E ≈ 200–214 GPa"),
      yieldStrengthMpa: fromMemory(
        "Estimate for soft-annealed 1.2510 (≤ 229 HB by EN ISO 4957)",
        "EN ISO 4957 specifies annealed hardness only; the proof strength is an estimate from that hardness",
      ),
      tensileStrengthMpa: fromMemory(
        "Hardness conversion (ISO 18265) of the annealed maximum 229 HB gives about 770 MPa; 700 MPa taken as a typical lower figure",
      ),
    },
  },
  "stainless-303": {
    key: "stainless-303",
    name: "Stainless steel 303",
    grade: "X8CrNiS18-9 (1.4305), solution annealed bar, EN 10088-3",
    densityKgM3: 7900,
    elasticModulusMpa: 200_000,
    yieldStrengthMpa: 190,
    tensileStrengthMpa: 500,
    cuttingGroup: "stainless",
    frictionFamily: "steel",
    hardenable: false,
    heatTreatmentNote: "Austenitic: not hardenable by heat treatment; strengthened only by cold work.",
    notes: "Free-machining austenitic stainless; the sulphur lowers corrosion resistance a little versus 304.",
    sources: {
      densityKgM3: fromMemory("EN 10088-1, 1.4305: ρ 7.9 kg/dm³"),
      elasticModulusMpa: fromMemory("EN 10088-1, austenitic grades: E 200 GPa at 20 °C"),
      yieldStrengthMpa: fromMemory("EN 10088-3, 1.4305 +AT bar: Rp0.2 ≥ 190 MPa"),
      tensileStrengthMpa: fromMemory("EN 10088-3, 1.4305 +AT bar: Rm 500–750 MPa"),
    },
  },
  "stainless-304": {
    key: "stainless-304",
    name: "Stainless steel 304",
    grade: "X5CrNi18-10 (1.4301), solution annealed bar, EN 10088-3",
    densityKgM3: 7900,
    elasticModulusMpa: 200_000,
    yieldStrengthMpa: 190,
    tensileStrengthMpa: 500,
    cuttingGroup: "stainless",
    frictionFamily: "steel",
    hardenable: false,
    heatTreatmentNote: "Austenitic: not hardenable by heat treatment; work hardens quickly when cut.",
    notes: "General stainless; gummy to machine — keep the tool cutting, do not rub.",
    sources: {
      densityKgM3: fromMemory("EN 10088-1, 1.4301: ρ 7.9 kg/dm³"),
      elasticModulusMpa: fromMemory("EN 10088-1, austenitic grades: E 200 GPa at 20 °C"),
      yieldStrengthMpa: fromMemory("EN 10088-3, 1.4301 +AT bar: Rp0.2 ≥ 190 MPa"),
      tensileStrengthMpa: fromMemory("EN 10088-3, 1.4301 +AT bar: Rm 500–700 MPa"),
    },
  },
  "leaded-bronze": {
    key: "leaded-bronze",
    name: "Leaded bronze (gunmetal)",
    grade: "CuSn7Zn4Pb7-C (CC493K), continuously cast, EN 1982",
    densityKgM3: 8800,
    elasticModulusMpa: 90_000,
    yieldStrengthMpa: 130,
    tensileStrengthMpa: 260,
    cuttingGroup: "bronze",
    frictionFamily: "bronze",
    hardenable: false,
    notes: "Bearing bronze for bushes and sliding parts; machines freely with a short chip.",
    sources: {
      densityKgM3: fromMemory("Copper-alloy datasheets for CC493K: ρ ≈ 8.8 kg/dm³"),
      elasticModulusMpa: fromMemory("Copper-alloy datasheets for CC493K: E ≈ 85–95 GPa"),
      yieldStrengthMpa: fromMemory("EN 1982, CC493K continuously cast (GC): Rp0.2 ≥ 130 MPa"),
      tensileStrengthMpa: fromMemory("EN 1982, CC493K continuously cast (GC): Rm ≥ 260 MPa"),
    },
  },
  "phosphor-bronze": {
    key: "phosphor-bronze",
    name: "Phosphor bronze",
    grade: "CuSn11P-C (CC481K), continuously cast, EN 1982",
    densityKgM3: 8700,
    elasticModulusMpa: 100_000,
    yieldStrengthMpa: 170,
    tensileStrengthMpa: 350,
    cuttingGroup: "bronze",
    frictionFamily: "bronze",
    hardenable: false,
    notes: "Hard bearing bronze for heavily loaded bushes, nuts and wear strips; tougher to cut than leaded bronze.",
    sources: {
      densityKgM3: fromMemory("Copper-alloy datasheets for CC481K: ρ ≈ 8.7 kg/dm³"),
      elasticModulusMpa: fromMemory("Copper-alloy datasheets for CC481K: E ≈ 95–110 GPa"),
      yieldStrengthMpa: fromMemory("EN 1982, CC481K continuously cast (GC): Rp0.2 ≥ 170 MPa"),
      tensileStrengthMpa: fromMemory("EN 1982, CC481K continuously cast (GC): Rm ≥ 350 MPa"),
    },
  },
  brass: {
    key: "brass",
    name: "Free-cutting brass",
    grade: "CuZn39Pb3 (CW614N), drawn rod R430, EN 12164",
    densityKgM3: 8470,
    elasticModulusMpa: 97_000,
    yieldStrengthMpa: 250,
    tensileStrengthMpa: 430,
    cuttingGroup: "brass",
    frictionFamily: "brass",
    hardenable: false,
    notes: "Turned fittings, knobs and small parts; the tool can grab — use zero or slightly negative top rake.",
    sources: {
      densityKgM3: fromMemory("Copper-alloy datasheets for CW614N: ρ 8.47 kg/dm³"),
      elasticModulusMpa: fromMemory("Copper-alloy datasheets for CW614N: E ≈ 96–97 GPa"),
      yieldStrengthMpa: fromMemory("EN 12164, CW614N R430: Rp0.2 typically ≥ 250 MPa (the standard lists it as informative)"),
      tensileStrengthMpa: fromMemory("EN 12164, CW614N R430: Rm ≥ 430 MPa"),
    },
  },
  "aluminium-6061": {
    key: "aluminium-6061",
    name: "Aluminium 6061-T6",
    grade: "EN AW-6061 T6, extruded bar, EN 755-2",
    densityKgM3: 2700,
    elasticModulusMpa: 69_000,
    yieldStrengthMpa: 240,
    tensileStrengthMpa: 260,
    cuttingGroup: "aluminium",
    frictionFamily: "aluminium",
    hardenable: false,
    heatTreatmentNote: "Precipitation hardened at the mill (T6); re-heat treatment needs a furnace and controlled ageing.",
    notes: "Soft jaws, light fixtures; anodises well. Galls against itself and soft steel when dry.",
    sources: {
      densityKgM3: fromMemory("EN 573/EN 755 alloy datasheets, EN AW-6061: ρ 2.70 kg/dm³"),
      elasticModulusMpa: fromMemory("Aluminium alloy datasheets, 6061: E ≈ 68.9 GPa"),
      yieldStrengthMpa: fromMemory("EN 755-2, EN AW-6061 T6 bar: Rp0.2 ≥ 240 MPa"),
      tensileStrengthMpa: fromMemory("EN 755-2, EN AW-6061 T6 bar: Rm ≥ 260 MPa"),
    },
  },
  "aluminium-6082": {
    key: "aluminium-6082",
    name: "Aluminium 6082-T6",
    grade: "EN AW-6082 T6, extruded bar 20–150 mm, EN 755-2",
    densityKgM3: 2700,
    elasticModulusMpa: 70_000,
    yieldStrengthMpa: 260,
    tensileStrengthMpa: 310,
    cuttingGroup: "aluminium",
    frictionFamily: "aluminium",
    hardenable: false,
    heatTreatmentNote: "Precipitation hardened at the mill (T6); re-heat treatment needs a furnace and controlled ageing.",
    notes: "The common European structural alloy for plate and bar; slightly stronger than 6061.",
    sources: {
      densityKgM3: fromMemory("EN 573/EN 755 alloy datasheets, EN AW-6082: ρ 2.70 kg/dm³"),
      elasticModulusMpa: fromMemory("Aluminium alloy datasheets, 6082: E ≈ 70 GPa"),
      yieldStrengthMpa: fromMemory("EN 755-2, EN AW-6082 T6 bar 20–150 mm: Rp0.2 ≥ 260 MPa"),
      tensileStrengthMpa: fromMemory("EN 755-2, EN AW-6082 T6 bar 20–150 mm: Rm ≥ 310 MPa"),
    },
  },
  "cast-iron": {
    key: "cast-iron",
    name: "Grey cast iron",
    grade: "EN-GJL-250, EN 1561",
    densityKgM3: 7200,
    elasticModulusMpa: 110_000,
    yieldStrengthMpa: 165,
    tensileStrengthMpa: 250,
    cuttingGroup: "cast-iron",
    frictionFamily: "cast-iron",
    hardenable: false,
    heatTreatmentNote:
      "Pearlitic grades can be flame or induction hardened on the surface; not a small-shop through-hardening job.",
    notes: "Brittle: no real yield, little elongation. Damps vibration; machines dry with a powdery chip.",
    sources: {
      densityKgM3: fromMemory("EN 1561 informative annex, EN-GJL-250: ρ 7.2 kg/dm³"),
      elasticModulusMpa: fromMemory("EN 1561 informative annex, EN-GJL-250: E 103–118 GPa"),
      yieldStrengthMpa: fromMemory(
        "EN 1561 informative annex, EN-GJL-250: 0.1 % proof 165–228 MPa",
        "Grey iron has no distinct yield; this is a 0.1 % proof figure, use with care",
      ),
      tensileStrengthMpa: fromMemory("EN 1561, EN-GJL-250: Rm 250–350 MPa (separately cast test bar)"),
    },
  },
  acetal: {
    key: "acetal",
    name: "Acetal (POM-C)",
    grade: "Polyoxymethylene copolymer, extruded semi-finished rod/plate",
    densityKgM3: 1410,
    elasticModulusMpa: 2_800,
    yieldStrengthMpa: 65,
    tensileStrengthMpa: 65,
    cuttingGroup: "plastic",
    frictionFamily: "acetal",
    hardenable: false,
    notes: "Non-marring pads and jaws; low friction on steel; creeps under sustained load and moves with heat.",
    sources: {
      densityKgM3: fromMemory("Semi-finished POM-C datasheets: ρ 1.41 g/cm³"),
      elasticModulusMpa: fromMemory("Semi-finished POM-C datasheets, ISO 527 tensile modulus: 2.6–3.0 GPa"),
      yieldStrengthMpa: fromMemory("Semi-finished POM-C datasheets, ISO 527 tensile stress at yield: 60–70 MPa"),
      tensileStrengthMpa: fromMemory(
        "Semi-finished POM-C datasheets, ISO 527",
        "POM breaks soon after yield; the tensile strength is taken equal to the yield stress",
      ),
    },
  },
};

export function isMaterialKey(key: string): key is MaterialKey {
  return (MATERIAL_KEYS as readonly string[]).includes(key);
}

/** Zod schema accepting exactly the catalogue keys (for calculator and template inputs). */
export const materialKeySchema = z.enum(MATERIAL_KEYS);
