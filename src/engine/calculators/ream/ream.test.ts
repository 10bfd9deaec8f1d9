import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { predrillDiameterMm, reamCalculator as calc } from "./index";

describe("ream", () => {
  // Common practice (RULES.md list): a 4 mm reamed hole is drilled 3.9 mm first.
  it("drills a Ø4 reamed hole at 3.9 mm", () => {
    const r = calc.compute({ diameter: 4 });
    expect(r.predrillMm).toBe(3.9);
    expect(r.allowanceMm).toBe(0.1);
    // ISO 286-2:2010 H7, 3–6 mm: +12/0 (from memory).
    expect(r.hole).toMatchObject({ toleranceClass: "H7", upper: 0.012, lower: 0 });
  });

  it.each<[number, "machine" | "hand", number, string]>([
    [6, "machine", 5.8, "reaming allowance tables (from memory): machine, Ø4–11 → 0.2 mm"],
    [10, "machine", 9.8, "reaming allowance tables (from memory): machine, Ø4–11 → 0.2 mm"],
    [20, "machine", 19.7, "reaming allowance tables (from memory): machine ≈ 0.3 mm around Ø20"],
    [25, "machine", 24.6, "reaming allowance tables (from memory): machine, Ø20–32 → 0.4 mm"],
    [3, "machine", 2.9, "reaming allowance tables (from memory): machine, up to Ø4 → 0.1 mm"],
    [10, "hand", 9.9, "reaming allowance tables (from memory): hand up to Ø20 → about 0.1 mm"],
    [6.35, "machine", 6.15, "¼ in reamer: 6.35 − 0.2 = 6.15 (computed from the table)"],
  ])("Ø%s %s reamed → drill %s (%s)", (diameter, method, drill) => {
    expect(calc.compute({ diameter, method }).predrillMm).toBe(drill);
  });

  it("leaves at least the tabulated stock and never more than a drill step over it", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 50, noNaN: true }), fc.constantFrom("machine" as const, "hand" as const), (d, method) => {
        const r = calc.compute({ diameter: d, method });
        expect(r.predrillMm).toBeLessThan(d);
        expect(r.allowanceMm).toBeGreaterThanOrEqual(0.05 - 1e-9);
        expect(r.allowanceMm).toBeLessThanOrEqual(0.55 + 1e-9);
        expect(Math.round(r.predrillMm * 100) % 5).toBe(0);
      }),
    );
  });

  it("takes less stock by hand and more as the hole grows", () => {
    expect(predrillDiameterMm(16, "hand")).toBeGreaterThan(predrillDiameterMm(16, "machine"));
    expect(calc.compute({ diameter: 40 }).allowanceMm).toBeGreaterThan(calc.compute({ diameter: 8 }).allowanceMm);
  });

  it("refuses sizes outside the table and bad classes", () => {
    expect(calc.inputSchema.safeParse({ diameter: 60 }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ diameter: 0.5 }).success).toBe(false);
    expect(() => calc.compute({ diameter: 8, toleranceClass: "g6" })).toThrow(/shaft class/);
  });
});
