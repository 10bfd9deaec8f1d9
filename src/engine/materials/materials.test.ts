import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "../calculators/types";
import { FRICTION_PAIRS, MATERIAL_KEYS, frictionCoefficient, frictionPair, getMaterial, materials } from "./index";

describe("materials catalogue", () => {
  it("holds every key the brief lists, each under its own key", () => {
    expect([...MATERIAL_KEYS].sort()).toEqual(Object.keys(materials).sort());
    for (const key of MATERIAL_KEYS) expect(materials[key].key).toBe(key);
  });

  it("names a source for every figure and keeps figures physical", () => {
    for (const m of Object.values(materials)) {
      for (const figure of ["densityKgM3", "elasticModulusMpa", "yieldStrengthMpa", "tensileStrengthMpa"] as const) {
        expect(m[figure]).toBeGreaterThan(0);
        expect(m.sources[figure].title.length).toBeGreaterThan(10);
      }
      // Tensile strength is never below the proof strength.
      expect(m.tensileStrengthMpa).toBeGreaterThanOrEqual(m.yieldStrengthMpa);
    }
  });

  // EN 1993-1-1 §3.2.6 (from memory): structural steel ρ = 7850 kg/m³, E = 210 GPa.
  it("uses the Eurocode steel figures", () => {
    expect(materials["mild-steel"].densityKgM3).toBe(7850);
    expect(materials["mild-steel"].elasticModulusMpa).toBe(210_000);
  });

  // EN 10025-2 (from memory): S235 has ReH ≥ 235 MPa up to 16 mm.
  it("gives S235 its name-sake yield", () => {
    expect(materials["mild-steel"].yieldStrengthMpa).toBe(235);
  });

  // Trade fact (common practice): aluminium is about one third the density and stiffness of steel.
  it("keeps aluminium about a third of steel", () => {
    const al = materials["aluminium-6082"];
    const st = materials["mild-steel"];
    expect(al.densityKgM3 / st.densityKgM3).toBeCloseTo(1 / 3, 1);
    expect(al.elasticModulusMpa / st.elasticModulusMpa).toBeCloseTo(1 / 3, 1);
  });

  // Trade fact (common practice): of these, only O1-class tool steel is through-hardened in a small shop.
  it("marks only the tool steel as hardenable", () => {
    expect(MATERIAL_KEYS.filter((k) => materials[k].hardenable)).toEqual(["tool-steel"]);
    expect(materials["tool-steel"].heatTreatmentNote).toMatch(/oil/i);
  });

  it("refuses an unknown key with the list of valid ones", () => {
    expect(() => getMaterial("unobtainium")).toThrow(CalculatorInputError);
    expect(() => getMaterial("unobtainium")).toThrow(/mild-steel/);
  });
});

describe("friction pairs", () => {
  it("keeps each typical figure inside its range and lubricated below dry", () => {
    for (const p of FRICTION_PAIRS) {
      expect(p.low).toBeLessThanOrEqual(p.typical);
      expect(p.typical).toBeLessThanOrEqual(p.high);
    }
    for (const other of MATERIAL_KEYS) {
      const dry = frictionPair("mild-steel", other, false);
      const wet = frictionPair("mild-steel", other, true);
      if (dry && wet) expect(wet.typical).toBeLessThan(dry.typical);
    }
  });

  // Machinery's Handbook static friction table (from memory): clean mild steel on mild steel, dry, 0.74.
  it("covers the handbook's dry steel-on-steel figure", () => {
    const p = frictionPair("mild-steel", "tool-steel", false);
    expect(p?.low).toBeLessThanOrEqual(0.74);
    expect(p?.high).toBeGreaterThanOrEqual(0.74);
  });

  // Machinery's Handbook static friction table (from memory): brass on mild steel, dry, 0.51.
  it("is symmetric and covers brass on steel", () => {
    expect(frictionCoefficient("brass", "mild-steel", false)).toBe(frictionCoefficient("mild-steel", "brass", false));
    expect(frictionPair("brass", "mild-steel", false)?.high).toBeGreaterThanOrEqual(0.51);
  });

  it("refuses a pair it has no figure for", () => {
    expect(() => frictionCoefficient("brass", "acetal", true)).toThrow(CalculatorInputError);
    expect(frictionPair("brass", "acetal", true)).toBeUndefined();
  });
});
