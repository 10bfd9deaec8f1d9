import { describe, expect, it } from "vitest";
import { maxDiameterOnFlanksMm, minDiameterProudMm, vBlockCalculator as calc } from "./index";

const run = (input: Record<string, unknown>) => calc.compute(calc.inputSchema.parse(input));

/**
 * Independent method: coordinates instead of the closed forms. The flank is the line through the apex
 * (0, 0) and the point (tan α, 1); the centre (0, h) is found by bisection on the point-to-line distance
 * |a·x + b·y| / √(a² + b²) = r, and the contact by projecting the centre onto the line (dot product).
 */
function byCoordinates(diameter: number, angleDeg: number) {
  const r = diameter / 2;
  const t = Math.tan((angleDeg / 2) * (Math.PI / 180));
  // Line through (0,0) and (t,1): 1·x − t·y = 0.
  const dist = (h: number) => Math.abs(1 * 0 - t * h) / Math.hypot(1, t);
  let lo = 0;
  let hi = 100 * diameter;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (dist(mid) < r) lo = mid;
    else hi = mid;
  }
  const h = (lo + hi) / 2;
  const ux = t / Math.hypot(1, t);
  const uy = 1 / Math.hypot(1, t);
  const along = 0 * ux + h * uy;
  return { h, along, contactY: along * uy, contactX: along * ux };
}

describe("v-block: a round in a V (plane geometry)", () => {
  // Plane geometry, worked by hand: 90° V, d = 20 → α = 45°, h = 10/sin 45° = 10√2 = 14.142;
  // along the flank 10/tan 45° = 10; contact height 14.142 − 10·sin 45° = 7.071 = 10/√2; offset 10·cos 45° = 7.071.
  it("90° V, Ø20: centre 14.142 above the apex, contact 10 along the flank at 7.071 high", () => {
    const r = run({ diameter: 20, angleDeg: 90 });
    expect(r.centreAboveApexMm).toBeCloseTo(10 * Math.SQRT2, 9);
    expect(r.contactAlongFlankMm).toBeCloseTo(10, 9);
    expect(r.contactAboveApexMm).toBeCloseTo(10 / Math.SQRT2, 9);
    expect(r.contactOffsetMm).toBeCloseTo(10 / Math.SQRT2, 9);
    expect(r.topAboveApexMm).toBeCloseTo(10 * Math.SQRT2 + 10, 9);
  });

  // Plane geometry: in a 60° V the centre sits one diameter above the apex (sin 30° = ½, so h = r/½ = 2r = d),
  // and the contact is at h − r·sin 30° = 2r − r/2 = 1.5·r.
  it("60° V: the centre is one diameter above the apex", () => {
    const r = run({ diameter: 25, angleDeg: 60 });
    expect(r.centreAboveApexMm).toBeCloseTo(25, 9);
    expect(r.contactAboveApexMm).toBeCloseTo(1.5 * 12.5, 9);
    expect(r.contactAlongFlankMm).toBeCloseTo(12.5 * Math.sqrt(3), 9);
  });

  it.each([
    [20, 90],
    [6, 60],
    [40, 120],
    [13.7, 75],
    [50, 150],
  ])("Ø%d in a %d° V agrees with the coordinate method", (d, angle) => {
    const r = run({ diameter: d, angleDeg: angle });
    const c = byCoordinates(d, angle);
    expect(r.centreAboveApexMm).toBeCloseTo(c.h, 8);
    expect(r.contactAlongFlankMm).toBeCloseTo(c.along, 8);
    expect(r.contactAboveApexMm).toBeCloseTo(c.contactY, 8);
    expect(r.contactOffsetMm).toBeCloseTo(c.contactX, 8);
  });

  // Limits for a 90° V 15 deep: flank limit 2·15·sin45/cos²45 = 30√2 = 42.43; proud 2 mm: 2·17/(1 + √2) = 14.08.
  it("gives the usable range of a 90° V 15 deep with 2 mm proud", () => {
    const r = run({ diameter: 20, angleDeg: 90, depth: 15, proud: 2, reliefWidth: 3 });
    expect(r.maxDiameterMm).toBeCloseTo(30 * Math.SQRT2, 9);
    expect(r.minDiameterMm).toBeCloseTo(34 / (1 + Math.SQRT2), 9);
    expect(r.minDiameterLimit).toBe("proud");
    expect(r.flankLengthMm).toBeCloseTo(15 * Math.SQRT2, 9);
    expect(r.widthAtTopMm).toBeCloseTo(30, 9);
    expect(r.inRange).toBe(true);
  });

  it("touches both flanks up to the flank limit and not beyond", () => {
    const dMax = maxDiameterOnFlanksMm(90, 15);
    expect(run({ diameter: dMax - 0.01, angleDeg: 90, depth: 15 }).touchesBothFlanks).toBe(true);
    const over = run({ diameter: dMax + 0.01, angleDeg: 90, depth: 15 });
    expect(over.touchesBothFlanks).toBe(false);
    expect(over.cautions.join(" ")).toMatch(/too large/);
    // At the limit the contact is exactly at the top edge.
    expect(run({ diameter: dMax, angleDeg: 90, depth: 15 }).contactAboveApexMm).toBeCloseTo(15, 9);
  });

  it("stands proud from the proud limit on, and not below it", () => {
    const dMin = minDiameterProudMm(90, 15, 2);
    expect(run({ diameter: dMin + 0.01, angleDeg: 90, depth: 15, proud: 2 }).standsProudEnough).toBe(true);
    expect(run({ diameter: dMin - 0.01, angleDeg: 90, depth: 15, proud: 2 }).standsProudEnough).toBe(false);
    expect(run({ diameter: dMin, angleDeg: 90, depth: 15, proud: 2 }).standsProudMm).toBeCloseTo(2, 9);
  });

  // Relief 3 wide in a 90° V: the contact offset r·cos45 must reach 1.5, so d ≥ 3/cos45 = 4.243.
  it("a small round drops into the apex relief", () => {
    expect(run({ diameter: 4.2, angleDeg: 90, depth: 15, reliefWidth: 3 }).touchesBothFlanks).toBe(false);
    expect(run({ diameter: 4.3, angleDeg: 90, depth: 15, reliefWidth: 3 }).touchesBothFlanks).toBe(true);
    expect(run({ diameter: 4.3, angleDeg: 90, depth: 1, reliefWidth: 1.9 }).minDiameterLimit).toBe("relief");
  });

  it("gives heights above the base when the block height is known", () => {
    const r = run({ diameter: 20, angleDeg: 90, depth: 15, blockHeight: 45 });
    expect(r.centreAboveBaseMm).toBeCloseTo(30 + 10 * Math.SQRT2, 9);
    expect(r.contactAboveBaseMm).toBeCloseTo(30 + 10 / Math.SQRT2, 9);
  });

  it("refuses nonsense", () => {
    expect(() => calc.inputSchema.parse({ diameter: 10, angleDeg: 180 })).toThrow(/170/);
    expect(() => calc.inputSchema.parse({ diameter: -1, angleDeg: 90 })).toThrow(/greater than 0/);
    expect(() => run({ diameter: 10, angleDeg: 90, depth: 50, blockHeight: 40 })).toThrow(/shallower/);
    expect(() => run({ diameter: 10, angleDeg: 90, depth: 2, reliefWidth: 5 })).toThrow(/relief/);
  });
});
