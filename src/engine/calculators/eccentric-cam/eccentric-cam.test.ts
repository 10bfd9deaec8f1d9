import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { SETUP_CAUTION, CalculatorInputError } from "../types";
import { CAM_CLAMPING_CAUTION, eccentricCamCalculator } from "./index";

const calc = eccentricCamCalculator;
const run = (raw: Record<string, unknown>) => calc.compute(calc.inputSchema.parse(raw));
const base = { diameter: 20, eccentricity: 1, pivotDiameter: 8, leverLength: 60, handForce: 50, muContact: 0.1, muPivot: 0.1, gap: 0.5 };
const deg = (d: number) => (d * Math.PI) / 180;

describe("eccentric-cam: hand-worked example (statics by hand, Meriam & Kraige friction chapter, from memory)", () => {
  // D 20 → R 10, e 1, d 8, L 60, F 50 N, μc = μp = 0.1, gap 0.5.
  // Engagement: e(1 − cos φe) = g ⇒ cos φe = 1 − 0.5/1 = 0.5 ⇒ φe = 60°.
  // Reach at φe: R − e cos φe = 10 − 0.5 = 9.5 mm. Throw = 2e = 2 mm.
  // Driving arm: e sin 60° = 0.866025 mm.
  // Contact friction arm: μc·9.5 = 0.95 mm.
  // Pivot friction arm: friction circle (d/2)·μp/√(1+μp²) = 4·0.1/1.004988 = 0.398015 mm, times the pin
  //   load factor √(1+μc²) = 1.004988 ⇒ 0.4 mm exactly (μp = μc).
  // Lock ratio: (0.95 + 0.4)/0.866025 = 1.558846 ⇒ margin +0.5588.
  // Torque: 50 N × 60 mm = 3000 N·mm = 3 N·m. Clamp force: 3000/(0.866025 + 1.35) = 3000/2.216025 = 1353.78 N.
  // Rise angle: atan(0.866025/9.5) = atan(0.0911606) = 5.2087°. Max: asin(e/R) = asin(0.1) = 5.7392° at
  //   cos φ = e/R = 0.1 ⇒ φ = 84.261°.
  // Worst angle in 45–135°: a = μc·R + 0.4 = 1.4, b = μc·e = 0.1, cos φ* = b/a = 1/14 ⇒ φ* = 85.904°,
  //   ratio (1.4 − 0.1/14)/sin φ* = 1.392857/0.997446 = 1.396424 ⇒ margin +0.3964.
  // Lever lying along the face at engagement: 90° − 0° − 60° = 30° ahead of the eccentric direction;
  //   released (φ = 0) it stands 60° above the face.
  const r = run(base);
  it("throw, engagement, reach", () => {
    expect(r.throwMm).toBe(2);
    expect(r.engageAngleDeg).toBeCloseTo(60, 9);
    expect(r.reachAtEngagementMm).toBeCloseTo(9.5, 9);
    expect(r.minReachMm).toBe(9);
  });
  it("moment arms at engagement", () => {
    expect(r.armsAtEngagement.drivingMm).toBeCloseTo(0.866025, 6);
    expect(r.armsAtEngagement.contactFrictionMm).toBeCloseTo(0.95, 9);
    expect(r.armsAtEngagement.pivotFrictionMm).toBeCloseTo(0.4, 9);
  });
  it("self-locking margin at engagement and over the working zone", () => {
    expect(r.selfLocking).toBe(true);
    expect(r.selfLockMargin).toBeCloseTo(0.558846, 5);
    expect(r.selfLockingOverZone).toBe(true);
    expect(r.workingZone.worstAngleDeg).toBeCloseTo(85.904, 3);
    expect(r.selfLockMarginOverZone).toBeCloseTo(0.396424, 5);
    expect(r.workingZone.engagementInZone).toBe(true);
  });
  it("torque and clamping force", () => {
    expect(r.torqueNm).toBeCloseTo(3, 12);
    expect(r.clampForceN).toBeCloseTo(1353.78, 1);
  });
  it("rise angles", () => {
    expect(r.riseAngleDeg).toBeCloseTo(5.2087, 3);
    expect(r.maxRiseAngleDeg).toBeCloseTo(5.7392, 3);
    expect(r.maxRiseAtAngleDeg).toBeCloseTo(84.261, 3);
  });
  it("lever placement", () => {
    expect(r.leverAngleDeg).toBeCloseTo(30, 9);
    expect(r.leverReleasedAngleDeg).toBeCloseTo(60, 9);
    // Lever to stand 20° above the face at engagement: 90 − 20 − 60 = 10°.
    expect(run({ ...base, leverEndAngleDeg: 20 }).leverAngleDeg).toBeCloseTo(10, 9);
  });
  it("curve: every 5° from 0 to 180, engaged from 60°", () => {
    expect(r.curve).toHaveLength(37);
    expect(r.curve.map((p) => p.angleDeg)).toEqual(Array.from({ length: 37 }, (_, i) => i * 5));
    const at90 = r.curve[18]!;
    // φ = 90°: lift = e = 1 mm; rise = atan(1/10) = 5.7106°; N = 3000/(1 + 0.1·10 + 0.4) = 1250 N.
    expect(at90.liftMm).toBeCloseTo(1, 12);
    expect(at90.riseAngleDeg).toBeCloseTo(5.7106, 3);
    expect(at90.clampForceN).toBeCloseTo(1250, 6);
    expect(r.curve.find((p) => p.engaged)?.angleDeg).toBe(60);
  });
  it("always carries the setup and clamping cautions and its sources", () => {
    expect(r.cautions).toContain(SETUP_CAUTION);
    expect(r.cautions).toContain(CAM_CLAMPING_CAUTION);
    expect(r.sources.map((s) => s.kind)).toContain("from memory");
    expect(r.sources.map((s) => s.kind)).toContain("common practice");
  });
  it("explains in words with the numbers and suggests computed changes", () => {
    expect(r.explanation).toContain("60°");
    expect(r.explanation).toContain("56 % more than needed");
    expect(r.explanation).toMatch(/Friction where the cam rim presses on the work does most of the holding/);
    const smallerE = r.suggestions.find((s) => s.parameter === "eccentricity")!;
    // e 1 → 0.8: cos φe = 1 − 0.5/0.8 = 0.375 ⇒ φe = 67.976°; driving 0.8·sin = 0.741620; reach 10 − 0.3 = 9.7;
    // ratio (0.97 + 0.4)/0.741620 = 1.847308 ⇒ margin +0.8473.
    expect(smallerE.to).toBeCloseTo(0.8, 12);
    expect(smallerE.engageAngleDeg).toBeCloseTo(67.976, 3);
    expect(smallerE.selfLockMargin).toBeCloseTo(0.847308, 5);
    expect(smallerE.message).toContain("+56 % → +85 %");
    const lever = r.suggestions.find((s) => s.parameter === "leverLength")!;
    expect(lever.selfLockMargin).toBeCloseTo(r.selfLockMargin, 12);
    expect(lever.clampForceN).toBeCloseTo((r.clampForceN * lever.to) / 60, 6);
  });
});

describe("eccentric-cam: frictionless cross-check (virtual work: lever arm T/N = d(reach)/dφ)", () => {
  // Independent kinematics: rotate the disc centre, starting straight above the pivot at distance e, by φ
  // with a rotation matrix; the face touches the disc at a depth R below the centre, so reach = R − y.
  const R = 10;
  const e = 1.5;
  const reach = (phi: number) => {
    const x0 = 0;
    const y0 = e;
    const y = -Math.sin(phi) * x0 + Math.cos(phi) * y0; // clockwise rotation of (x0, y0)
    return R - y;
  };
  const frictionless = run({ ...base, diameter: 2 * R, eccentricity: e, pivotDiameter: 6, muContact: 0, muPivot: 0, gap: 1 });
  const torqueNmm = 50 * 60;
  for (const angleDeg of [15, 30, 45, 60, 90, 120, 150, 175]) {
    it(`at ${angleDeg}°`, () => {
      const point = frictionless.curve.find((p) => p.angleDeg === angleDeg)!;
      const h = 1e-5;
      const derivative = (reach(deg(angleDeg) + h) - reach(deg(angleDeg) - h)) / (2 * h);
      expect(torqueNmm / point.clampForceN!).toBeCloseTo(derivative, 6);
      expect(point.selfLocking).toBe(false); // no friction, no lock
    });
  }
  it("has no finite force at the lowest and highest points", () => {
    expect(frictionless.curve[0]!.clampForceN).toBeNull();
    expect(frictionless.curve[36]!.clampForceN).toBeNull();
  });
});

describe("eccentric-cam: handbook rule of thumb and common practice", () => {
  it("common practice: a Ø20 mm cam with 1 mm eccentricity (D/e = 20) locks well by hand", () => {
    const r = run(base);
    expect(r.ratioDiameterToEccentricity).toBe(20);
    expect(r.selfLockingOverZone).toBe(true);
    expect(r.selfLockMarginOverZone).toBeGreaterThan(0.2);
  });
  it("jig & fixture handbooks (from memory): D/e ≈ 14–20 self-locks for μ ≈ 0.1–0.15", () => {
    expect(run({ ...base, diameter: 28, eccentricity: 2, pivotDiameter: 10, muContact: 0.15, muPivot: 0.15, gap: 1 }).selfLockingOverZone).toBe(true);
    expect(run({ ...base, diameter: 20, eccentricity: 1, pivotDiameter: 8, muContact: 0.1, muPivot: 0.1, gap: 1 }).selfLockingOverZone).toBe(true);
  });
  it("jig & fixture handbooks (from memory): D/e ≈ 8 does not self-lock at μ 0.1", () => {
    const r = run({ ...base, diameter: 16, eccentricity: 2, pivotDiameter: 6, gap: 2 });
    // By hand: a = 0.1·8 + 3·0.1 = 1.1, b = 0.2; cos φ* = 0.1818 ⇒ ratio (1.1 − 0.0364)/(2·0.9833) = 0.541.
    expect(r.selfLockingOverZone).toBe(false);
    expect(r.selfLockMarginOverZone).toBeCloseTo(0.541 - 1, 2);
    expect(r.selfLocking).toBe(false);
    expect(r.explanation).toMatch(/short of what is needed/);
    expect(r.cautions.some((c) => c.includes("does not self-lock"))).toBe(true);
  });
  it("face friction alone: the ratio the rule needs spans about 14–20 over μ 0.1–0.15", () => {
    const at01 = run(base).contactOnlyMinRatio!;
    const at015 = run({ ...base, muContact: 0.15 }).contactOnlyMinRatio!;
    expect(at01).toBeCloseTo(20.1, 1); // 2√1.01/0.1
    expect(at015).toBeCloseTo(13.48, 1); // 2√1.0225/0.15
  });
  it("the largest self-locking eccentricity sits exactly on the lock limit", () => {
    const r = run(base);
    const atLimit = run({ ...base, eccentricity: r.maxSelfLockingEccentricityMm });
    expect(atLimit.selfLockMarginOverZone).toBeCloseTo(0, 9);
  });
});

describe("eccentric-cam: properties (fast-check)", () => {
  const cams = fc
    .record({
      diameter: fc.double({ min: 8, max: 80, noNaN: true }),
      eRatio: fc.double({ min: 0.02, max: 0.3, noNaN: true }),
      gapRatio: fc.double({ min: 0.01, max: 0.99, noNaN: true }),
      muContact: fc.double({ min: 0, max: 0.3, noNaN: true }),
      muPivot: fc.double({ min: 0, max: 0.3, noNaN: true }),
      pinRatio: fc.double({ min: 0, max: 0.5, noNaN: true }),
    })
    .map((c) => {
      const R = c.diameter / 2;
      const e = c.eRatio * R;
      return {
        ...base,
        diameter: c.diameter,
        eccentricity: e,
        pivotDiameter: c.pinRatio * (R - e),
        muContact: c.muContact,
        muPivot: c.muPivot,
        gap: c.gapRatio * 2 * e,
      };
    });

  it("lift lies between 0 and the throw 2e and rises monotonically over 0–180°", () => {
    fc.assert(
      fc.property(cams, (input) => {
        const r = run(input);
        let previous = -Infinity;
        for (const p of r.curve) {
          expect(p.liftMm).toBeGreaterThanOrEqual(-1e-12);
          expect(p.liftMm).toBeLessThanOrEqual(2 * input.eccentricity + 1e-12);
          expect(p.liftMm).toBeGreaterThanOrEqual(previous);
          previous = p.liftMm;
        }
        expect(r.curve[36]!.liftMm).toBeCloseTo(r.throwMm, 9);
      }),
    );
  });

  it("the maximum rise angle is asin(e/R) and bounds every point of the curve", () => {
    fc.assert(
      fc.property(cams, (input) => {
        const r = run(input);
        const expected = (Math.asin(input.eccentricity / (input.diameter / 2)) * 180) / Math.PI;
        expect(r.maxRiseAngleDeg).toBeCloseTo(expected, 9);
        for (const p of r.curve) expect(p.riseAngleDeg).toBeLessThanOrEqual(expected + 1e-9);
      }),
    );
  });

  it("without pivot friction the cam locks exactly where tan(rise angle) ≤ μ (wedge self-locking, statics textbook)", () => {
    fc.assert(
      fc.property(cams, (input) => {
        const r = run({ ...input, pivotDiameter: 0 });
        for (const p of r.curve) {
          if (p.angleDeg === 0 || p.angleDeg === 180) continue;
          const tanAlpha = Math.tan(deg(p.riseAngleDeg));
          if (Math.abs(tanAlpha - input.muContact) < 1e-9) continue; // on the limit itself
          expect(p.selfLocking).toBe(tanAlpha <= input.muContact);
        }
      }),
    );
  });

  it("the working-zone margin is the smallest margin anywhere in the zone", () => {
    fc.assert(
      fc.property(cams, (input) => {
        const r = run(input);
        const r5 = run({ ...input, gap: input.eccentricity }); // engages at 90°, inside the zone
        expect(r.selfLockMarginOverZone).toBeCloseTo(r5.selfLockMarginOverZone, 9);
        expect(r5.selfLockMargin).toBeGreaterThanOrEqual(r.selfLockMarginOverZone - 1e-9);
      }),
    );
  });
});

describe("eccentric-cam: bad input gets a clear error", () => {
  it("refuses a gap the throw cannot take up", () => {
    expect(() => run({ ...base, gap: 2 })).toThrow(CalculatorInputError);
    expect(() => run({ ...base, gap: 2.5 })).toThrow(/never engages.*smaller than 2 mm/);
  });
  it("refuses an eccentricity as large as the radius, and a pivot that breaks out", () => {
    expect(() => run({ ...base, eccentricity: 10 })).toThrow(/smaller than the cam radius/);
    expect(() => run({ ...base, eccentricity: 7, pivotDiameter: 8 })).toThrow(/breaks out/);
  });
  it("refuses negative, missing or non-numeric values through the schema", () => {
    expect(calc.inputSchema.safeParse({ ...base, diameter: -1 }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ ...base, muContact: 1.5 }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ ...base, gap: undefined }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ ...base, handForce: "lots" }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ ...base, extra: 1 }).success).toBe(false);
  });
  it("refuses a working zone that ends before it starts", () => {
    expect(() => run({ ...base, workingZoneStartDeg: 120, workingZoneEndDeg: 60 })).toThrow(/working zone/);
  });
});
