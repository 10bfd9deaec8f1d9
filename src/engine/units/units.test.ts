import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { convertLength, formatForce, formatLength, formatNumber, inchToMm, lbfToNewton, MM_PER_INCH, mmToInch, NEWTON_PER_LBF, newtonToLbf } from "./index";

describe("defining constants", () => {
  // International yard and pound agreement (1959), NIST SP 811 Appendix B: 1 in = 25.4 mm exactly.
  it("uses 25.4 mm per inch exactly", () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchToMm(1)).toBe(25.4);
    expect(inchToMm(0.5)).toBe(12.7);
    expect(mmToInch(25.4)).toBe(1);
  });

  // NIST SP 811 Appendix B: 1 lbf = 4.448 221 615 260 5 N exactly (0.453 592 37 kg × 9.806 65 m/s²).
  it("uses 4.4482216152605 N per lbf exactly", () => {
    expect(NEWTON_PER_LBF).toBe(4.4482216152605);
    expect(NEWTON_PER_LBF).toBeCloseTo(0.45359237 * 9.80665, 13);
    expect(lbfToNewton(1)).toBe(4.4482216152605);
    expect(newtonToLbf(4.4482216152605)).toBe(1);
  });

  // Common conversions from any engineering handbook: 1/4 in = 6.35 mm, 1/8 in = 3.175 mm, 100 lbf = 444.822 N.
  it("converts common shop sizes", () => {
    expect(inchToMm(0.25)).toBe(6.35);
    expect(inchToMm(0.125)).toBe(3.175);
    expect(lbfToNewton(100)).toBeCloseTo(444.822, 3);
  });
});

describe("round trips (property tests)", () => {
  // Values a user can type: up to 4 decimals of a millimetre, up to 5 of an inch, within ±10 m.
  const mmValues = fc.integer({ min: -100_000_000, max: 100_000_000 }).map((n) => n / 10_000);
  const inchValues = fc.integer({ min: -40_000_000, max: 40_000_000 }).map((n) => n / 100_000);

  it("mm → in → mm comes home exactly", () => {
    fc.assert(fc.property(mmValues, (mm) => inchToMm(mmToInch(mm)) === mm), { numRuns: 2000 });
  });

  it("in → mm → in comes home exactly", () => {
    fc.assert(fc.property(inchValues, (inch) => mmToInch(inchToMm(inch)) === inch), { numRuns: 2000 });
  });

  it("N → lbf → N comes home exactly", () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 10_000_000 }).map((n) => n / 1000), (n) => lbfToNewton(newtonToLbf(n)) === n), { numRuns: 1000 });
  });

  it("converting to the same system is the identity", () => {
    fc.assert(fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (v) => Object.is(convertLength(v, "mm", "mm"), v)));
  });
});

describe("formatting", () => {
  it("shows mm to 2 decimals and inches to 3, trimmed", () => {
    expect(formatLength(12.5, "mm", "mm")).toBe("12.5 mm");
    expect(formatLength(12.5, "mm", "in")).toBe("0.492 in");
    expect(formatLength(0.5, "in", "mm")).toBe("12.7 mm");
    expect(formatNumber(-0.0001, 2)).toBe("0");
  });
  it("shows lbf beside N for inch users", () => {
    expect(formatForce(444.822, "mm")).toBe("445 N");
    expect(formatForce(444.822, "in")).toBe("445 N (100 lbf)");
  });
});
