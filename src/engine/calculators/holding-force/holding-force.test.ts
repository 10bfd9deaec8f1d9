import { describe, expect, it } from "vitest";
import { holdingForceCalculator as calc, proofStressMpa } from "./index";

const run = (input: Record<string, unknown>) => calc.compute(calc.inputSchema.parse(input));

describe("holding-force", () => {
  // Hand-worked (Shigley T = K·F·d, from memory): M10 at 30 N·m with K 0.2 → F = 30 000 N·mm / (0.2 × 10 mm) = 15 000 N;
  // Coulomb friction μ 0.15 → 0.15 × 15 000 = 2 250 N. Stress area M10 = 58.0 mm² (ISO 898-1 table) → 258.6 MPa;
  // 8.8 proof stress 580 MPa (ISO 898-1, from memory) → proof load 33 640 N, 44.6 %.
  it("M10 at 30 N·m, μ 0.15: 15 kN preload holds 2.25 kN", () => {
    const r = run({ bolt: "M10", tighteningTorque: 30, mu: 0.15, load: 900 });
    expect(r.preloadN).toBeCloseTo(15000, 6);
    expect(r.holdingForceN).toBeCloseTo(2250, 6);
    expect(r.stressAreaMm2).toBe(58);
    expect(r.boltStressMpa).toBeCloseTo(15000 / 58, 6);
    expect(r.proofLoadN).toBeCloseTo(580 * 58, 6);
    expect(r.preloadFractionOfProof).toBeCloseTo(15000 / 33640, 6);
    expect(r.safetyFactor).toBeCloseTo(2.5, 9);
    expect(r.preloadSource).toBe("torque");
  });

  // Two bolts double the normal force; a stated preload gives back its torque: T = 0.2 × 20 000 × 12 / 1000 = 48 N·m.
  it("adds bolts and works back the torque of a stated preload", () => {
    const r = run({ bolt: "M12", preload: 20000, mu: 0.1, boltCount: 2 });
    expect(r.normalForceN).toBe(40000);
    expect(r.holdingForceN).toBeCloseTo(4000, 9);
    expect(r.tighteningTorqueNm).toBeCloseTo(48, 9);
    expect(r.stressAreaMm2).toBe(84.3); // ISO 898-1: M12 As = 84.3 mm²
    expect(r.safetyFactor).toBeNull();
  });

  // ISO 898-1 proof stresses (from memory).
  it.each([
    ["4.6", 10, 225],
    ["5.6", 10, 280],
    ["8.8", 16, 580],
    ["8.8", 20, 600],
    ["10.9", 12, 830],
    ["12.9", 12, 970],
  ] as const)("class %s M%d: proof stress %d MPa", (cls, d, sp) => {
    expect(proofStressMpa(cls, d)).toBe(sp);
  });

  it("warns when the preload nears or passes the proof load, or friction barely holds", () => {
    // M6 8.8: As 20.1, proof 580 → 11 658 N. 12 N·m → 10 000 N (86 %). 16 N·m → 13 333 N (114 %).
    expect(run({ bolt: "M6", tighteningTorque: 12, mu: 0.15 }).cautions.join(" ")).toMatch(/stay below about 75 %/);
    expect(run({ bolt: "M6", tighteningTorque: 16, mu: 0.15 }).cautions.join(" ")).toMatch(/stretch permanently/);
    expect(run({ bolt: "M10", tighteningTorque: 30, mu: 0.15, load: 1500 }).cautions.join(" ")).toMatch(/only 1.50 times/);
  });

  it("needs exactly one of torque and preload", () => {
    expect(() => run({ bolt: "M10", mu: 0.15 })).toThrow(/either the tightening torque/);
    expect(() => run({ bolt: "M10", mu: 0.15, preload: 1000, tighteningTorque: 10 })).toThrow(/not both/);
    expect(() => run({ bolt: "M30", mu: 0.15, preload: 1000 })).toThrow(/not covered/);
  });
});
