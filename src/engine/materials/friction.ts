/**
 * Static friction coefficients for the sliding pairs a workshop fixture meets (steel against each family).
 *
 * The handbook tables (Machinery's Handbook and Marks' Standard Handbook for Mechanical Engineers,
 * "coefficients of static friction", from memory) give clean laboratory surfaces; shop surfaces with oxide,
 * oil films and machining marks scatter widely. Each entry therefore carries a range and a `typical` design
 * figure we chose inside it (the range is the sourced part; the typical figure is our pick, not a handbook
 * value). For a self-locking check use the LOW end (less friction locks less); for a force
 * estimate the typical figure. Lubricated means a greasy or oiled film, not hydrodynamic lubrication.
 */
import { CalculatorInputError, type Source } from "../calculators/types";
import { getMaterial } from "./lookup";
import type { FrictionFamily, MaterialKey } from "./catalogue";

export interface FrictionPair {
  families: readonly [FrictionFamily, FrictionFamily];
  lubricated: boolean;
  /** Our design figure, chosen inside the handbook range (not itself a handbook value). */
  typical: number;
  low: number;
  high: number;
  source: Source;
  note?: string;
}

const handbook = (range: string, note?: string): Source => ({
  title: `Machinery's Handbook / Marks' Standard Handbook, static friction tables: ${range}`,
  kind: "from memory",
  ...(note ? { note } : {}),
});

/** The table: steel against each family, dry and lubricated. */
export const FRICTION_PAIRS: readonly FrictionPair[] = [
  { families: ["steel", "steel"], lubricated: false, typical: 0.6, low: 0.5, high: 0.8, source: handbook("steel on steel, dry 0.5–0.8 (clean mild 0.74, hard 0.78)") },
  { families: ["steel", "steel"], lubricated: true, typical: 0.12, low: 0.1, high: 0.2, source: handbook("steel on steel, greasy 0.1–0.2") },
  { families: ["steel", "cast-iron"], lubricated: false, typical: 0.3, low: 0.2, high: 0.4, source: handbook("mild steel on cast iron, dry 0.2–0.4") },
  { families: ["steel", "cast-iron"], lubricated: true, typical: 0.15, low: 0.1, high: 0.2, source: handbook("mild steel on cast iron, greasy 0.1–0.2") },
  { families: ["steel", "bronze"], lubricated: false, typical: 0.35, low: 0.3, high: 0.5, source: handbook("steel on bronze / phosphor bronze, dry 0.3–0.5") },
  { families: ["steel", "bronze"], lubricated: true, typical: 0.1, low: 0.08, high: 0.16, source: handbook("steel on bronze, greasy 0.08–0.16") },
  { families: ["steel", "brass"], lubricated: false, typical: 0.45, low: 0.35, high: 0.51, source: handbook("brass on mild steel, dry 0.35–0.51") },
  { families: ["steel", "brass"], lubricated: true, typical: 0.15, low: 0.1, high: 0.2, source: handbook("brass on steel, greasy 0.1–0.2") },
  { families: ["steel", "aluminium"], lubricated: false, typical: 0.5, low: 0.45, high: 0.61, source: handbook("aluminium on mild steel, dry 0.45–0.61") },
  { families: ["steel", "aluminium"], lubricated: true, typical: 0.2, low: 0.1, high: 0.3, source: handbook("aluminium on steel, greasy 0.1–0.3"), note: "Aluminium galls on steel; the figure scatters." },
  {
    families: ["steel", "acetal"], lubricated: false, typical: 0.25, low: 0.2, high: 0.35,
    source: { title: "POM-C semi-finished datasheets, static friction on steel: 0.2–0.35", kind: "from memory" },
  },
  {
    families: ["steel", "acetal"], lubricated: true, typical: 0.1, low: 0.08, high: 0.15,
    source: { title: "POM-C semi-finished datasheets, lubricated on steel: 0.08–0.15", kind: "from memory" },
  },
];

/** The table entry for two catalogue materials (order does not matter), or undefined when not tabulated. */
export function frictionPair(a: MaterialKey, b: MaterialKey, lubricated: boolean): FrictionPair | undefined {
  const fa = getMaterial(a).frictionFamily;
  const fb = getMaterial(b).frictionFamily;
  return FRICTION_PAIRS.find(
    (p) => p.lubricated === lubricated && ((p.families[0] === fa && p.families[1] === fb) || (p.families[0] === fb && p.families[1] === fa)),
  );
}

/**
 * Typical static friction coefficient μ between two catalogue materials.
 * Throws CalculatorInputError when the pair is not tabulated (only steel against each family is).
 * Use `frictionPair(...).low` for self-locking checks.
 */
export function frictionCoefficient(a: MaterialKey, b: MaterialKey, lubricated: boolean): number {
  const pair = frictionPair(a, b, lubricated);
  if (!pair) {
    throw new CalculatorInputError(
      `No friction figure for ${a} on ${b}: the table covers steel (incl. stainless and tool steel) against ` +
        "steel, cast iron, bronze, brass, aluminium and acetal. Enter a friction coefficient directly.",
    );
  }
  return pair.typical;
}
