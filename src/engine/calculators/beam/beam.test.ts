import { describe, expect, it } from "vitest";
import { SETUP_CAUTION } from "../types";
import { beamCalculator, secondMomentMm4 } from "./index";

const run = (raw: Record<string, unknown>) => beamCalculator.compute(beamCalculator.inputSchema.parse(raw));

describe("beam: worked examples (Roark's Table 8.1 cases and the flexure formula, values by hand)", () => {
  it("stop rod: cantilever Ø5 × 25 mm, 20 N end load, stainless 303 (E 200 GPa, Rp0.2 190 MPa per the catalogue)", () => {
    // I = π·5⁴/64 = 30.6796 mm⁴; δ = F·L³/(3EI) = 20·15625/(3·200000·30.6796) = 312500/18407769 = 0.016977 mm.
    // M = F·L = 500 N·mm; σ = M·c/I = 500·2.5/30.6796 = 40.744 MPa; safety factor 190/40.744 = 4.663.
    const r = run({ case: "cantilever", section: "round", diameter: 5, length: 25, load: 20, material: "stainless-303" });
    expect(r.secondMomentMm4).toBeCloseTo(30.6796, 4);
    expect(r.deflectionMm).toBeCloseTo(0.016977, 6);
    expect(r.momentNmm).toBe(500);
    expect(r.stressMpa).toBeCloseTo(40.744, 3);
    expect(r.yieldSafetyFactor).toBeCloseTo(4.663, 3);
    expect(r.cautions).toContain(SETUP_CAUTION);
  });

  it("clamp arm: simply supported 20 × 10 mm bar on a 200 mm span, 1 kN at mid-span, mild steel (E 210 GPa, 235 MPa)", () => {
    // I = b·h³/12 = 20·1000/12 = 1666.667 mm⁴; δ = F·L³/(48EI) = 1000·8e6/(48·210000·1666.667) = 0.476190 mm.
    // M = F·L/4 = 50 000 N·mm; σ = 50 000·5/1666.667 = 150 MPa; safety factor 235/150 = 1.567 (→ caution).
    const r = run({ case: "simply-supported", section: "rectangular", width: 20, height: 10, length: 200, load: 1000, material: "mild-steel" });
    expect(r.secondMomentMm4).toBeCloseTo(1666.667, 3);
    expect(r.deflectionMm).toBeCloseTo(0.47619, 5);
    expect(r.momentNmm).toBe(50_000);
    expect(r.stressMpa).toBeCloseTo(150, 9);
    expect(r.sectionModulusMm3).toBeCloseTo(333.333, 3); // b·h²/6
    expect(r.yieldSafetyFactor).toBeCloseTo(1.5667, 4);
    expect(r.cautions.some((c) => c.includes("only 1.57"))).toBe(true);
  });

  it("explicit modulus: aluminium-like E 70 GPa cantilever 10 × 4 mm flat, 100 mm, 10 N, no yield given", () => {
    // I = 10·64/12 = 53.333 mm⁴; δ = 10·1e6/(3·70000·53.333) = 0.892857 mm; σ = 1000·2/53.333 = 37.5 MPa.
    const r = run({ case: "cantilever", section: "rectangular", width: 10, height: 4, length: 100, load: 10, elasticModulus: 70_000 });
    expect(r.deflectionMm).toBeCloseTo(0.892857, 6);
    expect(r.stressMpa).toBeCloseTo(37.5, 9);
    expect(r.yieldSafetyFactor).toBeNull();
    expect(r.stiffnessNPerMm).toBeCloseTo(10 / 0.892857, 4);
  });

  it("the cantilever deflects 16× the centre-loaded simple span of the same bar and length (48/3)", () => {
    const common = { section: "round", diameter: 8, length: 80, load: 50, material: "mild-steel" };
    const ratio = run({ ...common, case: "cantilever" }).deflectionMm / run({ ...common, case: "simply-supported" }).deflectionMm;
    expect(ratio).toBeCloseTo(16, 12);
  });

  it("second moment of a circle by numerical integration of y² dA agrees with πd⁴/64 (independent check)", () => {
    const d = 12;
    const r = d / 2;
    const n = 20000;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const y = -r + ((i + 0.5) * d) / n;
      sum += y * y * 2 * Math.sqrt(r * r - y * y) * (d / n);
    }
    expect(secondMomentMm4({ kind: "round", diameterMm: d })).toBeCloseTo(sum, 1);
  });

  it("warns when the stress passes yield and when the beam is short", () => {
    const r = run({ case: "cantilever", section: "round", diameter: 3, length: 10, load: 200, material: "aluminium-6082" });
    expect(r.yieldSafetyFactor!).toBeLessThan(1);
    expect(r.cautions.some((c) => c.includes("bends permanently"))).toBe(true);
    expect(r.cautions.some((c) => c.includes("shear"))).toBe(true);
  });
});

describe("beam: bad input", () => {
  it("names the missing section size or material", () => {
    const noDiameter = beamCalculator.inputSchema.safeParse({ case: "cantilever", section: "round", length: 25, load: 20, material: "brass" });
    expect(noDiameter.success).toBe(false);
    expect(noDiameter.error?.issues[0]?.path).toEqual(["diameter"]);
    const noHeight = beamCalculator.inputSchema.safeParse({ case: "cantilever", section: "rectangular", width: 5, length: 25, load: 20, material: "brass" });
    expect(noHeight.error?.issues.map((i) => i.path[0])).toEqual(["height"]);
    const noMaterial = beamCalculator.inputSchema.safeParse({ case: "cantilever", section: "round", diameter: 5, length: 25, load: 20 });
    expect(noMaterial.error?.issues[0]?.message).toMatch(/material.*elastic modulus/);
  });
  it("refuses unknown cases, materials and non-positive sizes", () => {
    const base = { case: "cantilever", section: "round", diameter: 5, length: 25, load: 20, material: "mild-steel" };
    expect(beamCalculator.inputSchema.safeParse({ ...base, case: "fixed-fixed" }).success).toBe(false);
    expect(beamCalculator.inputSchema.safeParse({ ...base, material: "unobtainium" }).error?.issues[0]?.message).toMatch(/mild-steel/);
    expect(beamCalculator.inputSchema.safeParse({ ...base, length: 0 }).success).toBe(false);
  });
});
