import { describe, expect, it } from "vitest";
import { strapClampCalculator as calc } from "./index";

const run = (input: Record<string, unknown>) => calc.compute(calc.inputSchema.parse(input));

/**
 * Independent method: solve the strap's two support reactions from the general equilibrium equations
 * (ΣF_z = 0 and ΣM = 0 about an arbitrary point x0) as a 2 × 2 linear system by Cramer's rule, instead of
 * the lever rule. Work at x = 0, stud at x = a, heel at x = a + b.
 */
function reactions(studForce: number, a: number, b: number, x0 = 17.3) {
  // Unknowns R_w, R_h (upward).  R_w + R_h = F ;  R_w·(0 − x0) + R_h·(a + b − x0) = F·(a − x0).
  const [a11, a12, c1] = [1, 1, studForce];
  const [a21, a22, c2] = [0 - x0, a + b - x0, studForce * (a - x0)];
  const det = a11 * a22 - a12 * a21;
  return { work: (c1 * a22 - a12 * c2) / det, heel: (a11 * c2 - c1 * a21) / det };
}

describe("strap-clamp", () => {
  // Hand-worked: M10 stud at 20 N·m, K 0.2 → 20 000 / (0.2 × 10) = 10 000 N. a = 35, b = 70:
  // lever rule (Meriam & Kraige, statics) F_work = 10 000 × 70/105 = 6 666.7 N, heel 3 333.3 N;
  // M = 6 666.7 × 35 = 233 333 N·mm; strap 50 × 20 with an 11 slot: Z = (50 − 11)·20²/6 = 2 600 mm³ (Gere &
  // Timoshenko) → σ = 89.74 MPa; mild steel 235 MPa → factor 2.62; allowable at SF 2 = 117.5 MPa.
  it("M10 at 20 N·m, a 35, b 70, strap 50 × 20 slotted 11", () => {
    const r = run({ stud: "M10", tighteningTorque: 20, studToWork: 35, studToHeel: 70, strapWidth: 50, strapThickness: 20, slotWidth: 11, material: "mild-steel" });
    expect(r.studForceN).toBeCloseTo(10000, 6);
    expect(r.workForceN).toBeCloseTo(20000 / 3, 6);
    expect(r.heelForceN).toBeCloseTo(10000 / 3, 6);
    expect(r.workShare).toBeCloseTo(2 / 3, 12);
    expect(r.momentNmm).toBeCloseTo(700000 / 3, 4);
    expect(r.sectionModulusMm3).toBeCloseTo(2600, 9);
    expect(r.bendingStressMpa).toBeCloseTo(700000 / 3 / 2600, 6);
    expect(r.yieldSafetyFactor).toBeCloseTo(235 / (700000 / 3 / 2600), 6);
    expect(r.allowableStressMpa).toBeCloseTo(117.5, 9);
    expect(r.stressOk).toBe(true);
    // Stud: 10 000 N on As 58 mm² = 172.4 MPa, 29.7 % of 8.8's 580 MPa proof stress.
    expect(r.studStressMpa).toBeCloseTo(10000 / 58, 6);
    expect(r.studProofFraction).toBeCloseTo(10000 / 58 / 580, 6);
  });

  it.each([
    [8000, 20, 60],
    [8000, 60, 20],
    [12345, 33.3, 41.7],
  ])("F %d N, a %d, b %d: the lever rule agrees with the general equilibrium", (f, a, b) => {
    const r = run({ stud: "M12", studForce: f, studToWork: a, studToHeel: b, strapWidth: 40, strapThickness: 16 });
    const eq = reactions(f, a, b);
    expect(r.workForceN).toBeCloseTo(eq.work, 6);
    expect(r.heelForceN).toBeCloseTo(eq.heel, 6);
    // Bending under the stud is the same from either side.
    expect(r.momentNmm).toBeCloseTo(eq.heel * b, 4);
    expect(r.stressOk).toBeNull();
  });

  it("says when the stud is nearer the heel", () => {
    const r = run({ stud: "M10", studForce: 9000, studToWork: 60, studToHeel: 30, strapWidth: 40, strapThickness: 16 });
    expect(r.workForceN).toBeCloseTo(3000, 9);
    expect(r.cautions.join(" ")).toMatch(/only 33 % of its pull reaches the work/);
  });

  // Tilt: heel 2 mm above the work over a + b = 100 → atan(0.02) = 1.146°, toward the work.
  it("measures the tilt toward the work or the heel", () => {
    const base = { stud: "M10", studForce: 9000, studToWork: 40, studToHeel: 60, strapWidth: 40, strapThickness: 16 };
    expect(run({ ...base, workHeight: 30, heelHeight: 32 }).tiltDeg).toBeCloseTo((Math.atan(0.02) * 180) / Math.PI, 9);
    expect(run({ ...base, workHeight: 30, heelHeight: 32 }).tilt).toBe("toward-work");
    expect(run({ ...base, workHeight: 30, heelHeight: 30 }).tilt).toBe("level");
    const back = run({ ...base, workHeight: 30, heelHeight: 28 });
    expect(back.tilt).toBe("toward-heel");
    expect(back.cautions.join(" ")).toMatch(/Raise the heel/);
  });

  it("flags an over-stressed strap and stud, and the holding force from friction", () => {
    const r = run({ stud: "M10", tighteningTorque: 40, studToWork: 40, studToHeel: 60, strapWidth: 25, strapThickness: 10, slotWidth: 11, material: "mild-steel", mu: 0.1 });
    expect(r.stressOk).toBe(false);
    expect(r.holdingForceN).toBeCloseTo(0.1 * 20000 * 0.6, 6);
    expect(r.studProofFraction).toBeGreaterThan(0.5);
    expect(r.cautions.join(" ")).toMatch(/it may bend/);
  });

  it("refuses incomplete or impossible input", () => {
    const base = { stud: "M10", studToWork: 40, studToHeel: 60, strapWidth: 25, strapThickness: 10 };
    expect(() => run(base)).toThrow(/either the tightening torque/);
    expect(() => run({ ...base, studForce: 100, slotWidth: 25 })).toThrow(/as wide as the strap/);
    expect(() => run({ ...base, studForce: 100, workHeight: 10 })).toThrow(/both the work height/);
  });
});
