import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalculatorInputError } from "../types";
import { deltaUm, fitCalculator, holeLimits, shaftLimits, toleranceGrade } from "./index";
import { INTERMEDIATE_RANGE_UPPER_MM, IT_UM, MAIN_RANGE_UPPER_MM, SHAFT_FD_INTERMEDIATE_UM, SHAFT_FD_MAIN_UM, SHAFT_K_IT4_TO_IT7_UM } from "./iso286-tables";

/** Deviations in µm, as ISO 286-2 prints them. */
const um = (mm: number) => Math.round(mm * 1e5) / 100;
const hole = (size: number, cls: string) => {
  const l = holeLimits(size, cls);
  return [um(l.upper), um(l.lower)];
};
const shaft = (size: number, cls: string) => {
  const l = shaftLimits(size, cls);
  return [um(l.upper), um(l.lower)];
};

type Row = [number, string, number, number, string];
describe("ISO 286 hole limits", () => {
  it.each<Row>([
    // [size, class, upper µm, lower µm, source]
    [8, "H7", 15, 0, "ISO 286-2:2010 H7, 6–10 mm: +15/0 (from memory)"],
    [25, "H7", 21, 0, "ISO 286-2:2010 H7, 18–30 mm: +21/0 (from memory)"],
    [120, "H7", 35, 0, "ISO 286-2:2010 H7, 80–120 mm: +35/0 (from memory); 120 belongs to 80–120"],
    [200, "H8", 72, 0, "ISO 286-2:2010 H8, 180–250 mm: +72/0 (from memory)"],
    [12, "G7", 24, 6, "ISO 286-2:2010 G7, 10–18 mm: +24/+6 (from memory)"],
    [12, "F8", 43, 16, "ISO 286-2:2010 F8, 10–18 mm: +43/+16 (from memory)"],
    [40, "K7", 7, -18, "ISO 286-2:2010 K7, 30–50 mm: +7/−18 (from memory; ES = −2 + Δ9)"],
    [25, "K6", 2, -11, "ISO 286-2:2010 K6, 18–30 mm: +2/−11 (from memory)"],
    [5, "K8", 5, -13, "ISO 286-2:2010 K8, 3–6 mm: +5/−13 (from memory)"],
    [2, "K7", 0, -10, "ISO 286-2:2010 K7, 0–3 mm: 0/−10 (from memory; Δ = 0 up to 3 mm)"],
    [40, "M7", 0, -25, "ISO 286-2:2010 M7, 30–50 mm: 0/−25 (from memory)"],
    [25, "M6", -4, -17, "ISO 286-2:2010 M6, 18–30 mm: −4/−17 (from memory)"],
    [280, "M6", -9, -41, "ISO 286-1:2010 Table 3 special case M6 above 250 up to 315 mm: ES = −9 (from memory)"],
    [40, "N7", -8, -33, "ISO 286-2:2010 N7, 30–50 mm: −8/−33 (from memory)"],
    [25, "N7", -7, -28, "ISO 286-2:2010 N7, 18–30 mm: −7/−28 (from memory)"],
    [12, "N9", 0, -43, "ISO 286-2:2010 N9, 10–18 mm: 0/−43 (from memory; keyway width 12 N9 in ISO/DIN key tables)"],
    [2, "N9", -4, -29, "ISO 286-2:2010 N9, 0–3 mm: −4/−29 (from memory)"],
    [60, "P7", -21, -51, "ISO 286-2:2010 P7, 50–80 mm: −21/−51 (from memory)"],
    [25, "P7", -14, -35, "ISO 286-2:2010 P7, 18–30 mm: −14/−35 (from memory)"],
    [8, "P9", -15, -51, "ISO 286-2:2010 P9, 6–10 mm: −15/−51 (from memory; keyway width 8 P9)"],
    [12, "JS9", 21.5, -21.5, "ISO 286-2:2010 JS9, 10–18 mm: ±21.5 (from memory; keyway width 12 JS9 ±0.0215)"],
  ])("%s %s = %s/%s µm — %s", (size, cls, upper, lower) => {
    expect(hole(size, cls)).toEqual([upper, lower]);
  });
});

describe("ISO 286 shaft limits", () => {
  it.each<Row>([
    [8, "g6", -5, -14, "ISO 286-2:2010 g6, 6–10 mm: −5/−14 (from memory)"],
    [25, "g6", -7, -20, "ISO 286-2:2010 g6, 18–30 mm: −7/−20 (from memory)"],
    [25, "f7", -20, -41, "ISO 286-2:2010 f7, 18–30 mm: −20/−41 (from memory)"],
    [40, "e8", -50, -89, "ISO 286-2:2010 e8, 30–50 mm: −50/−89 (from memory)"],
    [10, "h6", 0, -9, "ISO 286-2:2010 h6, 6–10 mm: 0/−9 (from memory); 10 belongs to 6–10"],
    [50, "h9", 0, -62, "ISO 286-2:2010 h9, 30–50 mm: 0/−62 (from memory)"],
    [6, "js6", 4, -4, "ISO 286-2:2010 js6, 3–6 mm: ±4 (from memory)"],
    [50, "k6", 18, 2, "ISO 286-2:2010 k6, 30–50 mm: +18/+2 (from memory)"],
    [25, "k6", 15, 2, "ISO 286-2:2010 k6, 18–30 mm: +15/+2 (from memory)"],
    [25, "k9", 52, 0, "ISO 286-1:2010 Table 2: k above IT7 has ei = 0 (from memory)"],
    [16, "m6", 18, 7, "ISO 286-2:2010 m6, 10–18 mm: +18/+7 (from memory)"],
    [25, "n6", 28, 15, "ISO 286-2:2010 n6, 18–30 mm: +28/+15 (from memory)"],
    [30, "p6", 35, 22, "ISO 286-2:2010 p6, 18–30 mm: +35/+22 (from memory)"],
    [60, "r6", 60, 41, "ISO 286-2:2010 r6, 50–65 mm: +60/+41 (from memory; r = √(p·s) per ISO 286-1)"],
    [100, "s6", 93, 71, "ISO 286-2:2010 s6, 80–100 mm: +93/+71 (computed from ISO 286-1: s = IT7 + 0.4D, D = √(80·100))"],
    [110, "s6", 101, 79, "ISO 286-2:2010 s6, 100–120 mm: +101/+79 (computed from ISO 286-1: s = IT7 + 0.4D)"],
  ])("%s %s = %s/%s µm — %s", (size, cls, upper, lower) => {
    expect(shaft(size, cls)).toEqual([upper, lower]);
  });
});

describe("ISO 286-1 standard tolerances and Δ", () => {
  it.each<[number, number, number, string]>([
    [1, 11, 0.06, "ISO 286-1:2010 Table 1: IT11 up to 3 mm = 60 µm (from memory)"],
    [40, 5, 0.011, "ISO 286-1:2010 Table 1: IT5 30–50 mm = 11 µm (from memory)"],
    [500, 7, 0.063, "ISO 286-1:2010 Table 1: IT7 400–500 mm = 63 µm (from memory)"],
    [10, 14, 0.36, "ISO 286-1:2010 Table 1: IT14 6–10 mm = 0.36 mm (from memory)"],
    [100, 14, 0.87, "ISO 286-1:2010 Table 1: IT14 80–120 mm = 0.87 mm (from memory)"],
  ])("IT at %s mm, grade %s = %s mm — %s", (size, grade, value) => {
    expect(toleranceGrade(size, grade)).toBe(value);
  });

  it.each<[number, number, number, string]>([
    [5, 8, 6, "ISO 286-1:2010 Table 3: Δ for IT8, 3–6 mm = 6 µm (from memory)"],
    [25, 7, 8, "ISO 286-1:2010 Table 3: Δ for IT7, 18–30 mm = 8 µm (from memory)"],
    [100, 6, 7, "ISO 286-1:2010 Table 3: Δ for IT6, 80–120 mm = 7 µm (from memory)"],
    [450, 8, 34, "ISO 286-1:2010 Table 3: Δ for IT8, 400–500 mm = 34 µm (from memory)"],
    [5, 4, 1.5, "ISO 286-1:2010 Table 3: Δ for IT4, 3–6 mm = 1.5 µm (from memory)"],
    [2, 7, 0, "ISO 286-1:2010 Table 3: Δ = 0 up to 3 mm"],
  ])("Δ at %s mm, IT%s = %s µm — %s", (size, grade, value) => {
    expect(deltaUm(size, grade)).toBe(value);
  });

  const lowerBounds = [1, 3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400];
  const multipliers: Record<number, number> = { 5: 7, 6: 10, 7: 16, 8: 25, 9: 40, 10: 64, 11: 100, 12: 160, 13: 250, 14: 400, 15: 640, 16: 1000, 17: 1600, 18: 2500 };
  const geometricMean = (j: number) => Math.sqrt((lowerBounds[j] ?? 0) * (MAIN_RANGE_UPPER_MM[j] ?? 0));

  // Independent computation: ISO 286-1 §5.1 tolerance factor i = 0.45·∛D + 0.001·D (µm), ITn = multiplier·i;
  // the table rounds these (IT6 at 3–6 mm most, +9 %), so agree within 10 % above 3 mm (the first range is set apart by the standard).
  it("agrees with the ISO 286-1 tolerance-factor formula for IT5–IT18 above 3 mm", () => {
    for (let j = 1; j < MAIN_RANGE_UPPER_MM.length; j++) {
      const d = geometricMean(j);
      const i = 0.45 * Math.cbrt(d) + 0.001 * d;
      for (let grade = 5; grade <= 18; grade++) {
        const table = IT_UM[grade]?.[j] ?? NaN;
        expect(Math.abs(table / ((multipliers[grade] ?? 0) * i) - 1)).toBeLessThan(0.1);
      }
    }
  });

  // Independent computation: the ISO 286-1 (1988, Annex) formulas behind Table 2, rounded by the standard:
  // d = 16·D^0.44, e = 11·D^0.41, f = 5.5·D^0.41, g = 2.5·D^0.34, n = 5·D^0.34, m = IT7 − IT6,
  // p = IT7 + 0…5, k(IT4–7) = 0.6·∛D, s = IT8 + 1…4 (D ≤ 50) or IT7 + 0.4·D, r = √(p·s).
  it("agrees with the ISO 286-1 fundamental-deviation formulas above 3 mm", () => {
    for (let j = 1; j < MAIN_RANGE_UPPER_MM.length; j++) {
      const d = geometricMean(j);
      const near = (table: number | undefined, formula: number) => expect(Math.abs((table ?? NaN) / formula - 1)).toBeLessThan(0.05);
      near(-(SHAFT_FD_MAIN_UM.d[j] ?? NaN), 16 * d ** 0.44);
      near(-(SHAFT_FD_MAIN_UM.e[j] ?? NaN), 11 * d ** 0.41);
      near(-(SHAFT_FD_MAIN_UM.f[j] ?? NaN), 5.5 * d ** 0.41);
      near(-(SHAFT_FD_MAIN_UM.g[j] ?? NaN), 2.5 * d ** 0.34);
      near(SHAFT_FD_MAIN_UM.n[j], 5 * d ** 0.34);
      const it6 = IT_UM[6]?.[j] ?? NaN;
      const it7 = IT_UM[7]?.[j] ?? NaN;
      expect(SHAFT_FD_MAIN_UM.m[j]).toBe(it7 - it6);
      const p = SHAFT_FD_MAIN_UM.p[j] ?? NaN;
      expect(p - it7).toBeGreaterThanOrEqual(0);
      expect(p - it7).toBeLessThanOrEqual(5);
      expect(Math.abs((SHAFT_K_IT4_TO_IT7_UM[j] ?? NaN) - 0.6 * Math.cbrt(d))).toBeLessThanOrEqual(0.5);
    }
    const interLower = [0, 3, 6, 10, 18, 30, 50, 65, 80, 100, 120, 140, 160, 180, 200, 225, 250, 280, 315, 355, 400, 450];
    for (let j = 1; j < INTERMEDIATE_RANGE_UPPER_MM.length; j++) {
      const upper = INTERMEDIATE_RANGE_UPPER_MM[j] ?? NaN;
      const d = Math.sqrt((interLower[j] ?? NaN) * upper);
      const s = SHAFT_FD_INTERMEDIATE_UM.s[j] ?? NaN;
      const r = SHAFT_FD_INTERMEDIATE_UM.r[j] ?? NaN;
      const p = shaftLimits(upper, "p6").lower * 1000;
      if (upper <= 50) {
        const excess = s - toleranceGrade(upper, 8) * 1000;
        expect(excess).toBeGreaterThanOrEqual(1);
        expect(excess).toBeLessThanOrEqual(4);
      } else {
        expect(Math.abs(s / (toleranceGrade(upper, 7) * 1000 + 0.4 * d) - 1)).toBeLessThan(0.01);
      }
      expect(Math.abs(r / Math.sqrt(p * s) - 1)).toBeLessThan(0.03);
    }
  });
});

describe("fit calculator", () => {
  // ISO 286-2:2010 (from memory): Ø8 H7 +15/0, g6 −5/−14 → clearance 5…29 µm, a clearance fit.
  it("gives the CLI contract for 8 H7/g6", () => {
    const r = fitCalculator.compute({ size: 8, hole: "H7", shaft: "g6" });
    expect(r.hole).toMatchObject({ upper: 0.015, lower: 0, max: 8.015, min: 8, itMm: 0.015 });
    expect(r.shaft).toMatchObject({ upper: -0.005, lower: -0.014, max: 7.995, min: 7.986, itMm: 0.009 });
    expect(r.clearanceMin).toBe(0.005);
    expect(r.clearanceMax).toBe(0.029);
    expect(r.kind).toBe("clearance");
    expect(r.designation).toBe("H7/g6");
    expect(r.sources.length).toBeGreaterThan(0);
    expect(r.cautions.length).toBeGreaterThan(0);
  });

  it.each<[number, string, string, number, number, string, string]>([
    // ISO 286-2:2010 (from memory) limits combined per ISO 286-1 §3.4 fit definitions.
    [25, "H7", "h6", 0, 0.034, "clearance", "H7 +21/0, h6 0/−13"],
    [25, "H7", "k6", -0.015, 0.019, "transition", "H7 +21/0, k6 +15/+2"],
    [25, "H7", "n6", -0.028, 0.006, "transition", "H7 +21/0, n6 +28/+15"],
    [25, "H7", "p6", -0.035, -0.001, "interference", "H7 +21/0, p6 +35/+22"],
    [100, "H7", "s6", -0.093, -0.036, "interference", "H7 +35/0, s6 +93/+71"],
  ])("%s %s/%s → %s…%s mm, %s (%s)", (size, h, s, cMin, cMax, kind) => {
    const r = fitCalculator.compute({ size, hole: h, shaft: s });
    expect([r.clearanceMin, r.clearanceMax, r.kind]).toEqual([cMin, cMax, kind]);
  });

  it("accepts a hole or a shaft alone", () => {
    const r = fitCalculator.compute({ size: 20, shaft: "h6" });
    expect(r.shaft?.lower).toBe(-0.013);
    expect(r.hole).toBeUndefined();
    expect(r.kind).toBeUndefined();
  });

  it("refuses unknown classes, wrong case and out-of-range sizes clearly", () => {
    expect(() => holeLimits(10, "g6")).toThrow(/shaft class/);
    expect(() => shaftLimits(10, "H7")).toThrow(/hole class/);
    expect(() => holeLimits(10, "X7")).toThrow(/not covered/);
    expect(() => holeLimits(10, "H")).toThrow(CalculatorInputError);
    expect(() => holeLimits(10, "H19")).toThrow(/1 to 18/);
    expect(() => holeLimits(0, "H7")).toThrow(/outside ISO 286/);
    expect(() => holeLimits(600, "H7")).toThrow(/outside ISO 286/);
    expect(() => holeLimits(20, "K9")).toThrow(/K coarser than IT8/);
    // ISO 286-1:2010 §5.1 note (from memory): IT14–IT18 are not used up to 1 mm.
    expect(() => toleranceGrade(1, 14)).toThrow(/IT14 to IT18/);
    expect(() => shaftLimits(0.01, "d9")).toThrow(/limit of size/);
    expect(fitCalculator.inputSchema.safeParse({ size: 10 }).success).toBe(false);
    expect(fitCalculator.inputSchema.safeParse({ size: -1, hole: "H7" }).success).toBe(false);
  });
});

describe("ISO 286 properties", () => {
  // Above 1 mm so IT14 (grade 13 + 1) is allowed and no d-shaft limit drops to zero.
  const size = fc.double({ min: 1.001, max: 500, noNaN: true });
  const grade = fc.integer({ min: 1, max: 13 });

  it("IT grows with grade and never shrinks with size", () => {
    fc.assert(
      fc.property(size, size, grade, (a, b, g) => {
        const [small, large] = a <= b ? [a, b] : [b, a];
        expect(toleranceGrade(small, g + 1)).toBeGreaterThan(toleranceGrade(small, g));
        expect(toleranceGrade(large, g)).toBeGreaterThanOrEqual(toleranceGrade(small, g));
      }),
    );
  });

  it("every class spans exactly its IT and its limit sizes sit on the deviations", () => {
    const holeClass = fc.constantFrom("F", "G", "H", "JS", "M", "P", "R", "S");
    const shaftClass = fc.constantFrom("d", "e", "f", "g", "h", "js", "k", "m", "n", "p", "r", "s");
    fc.assert(
      fc.property(size, fc.integer({ min: 5, max: 11 }), holeClass, shaftClass, (d, g, hc, sc) => {
        for (const l of [holeLimits(d, `${hc}${g}`), shaftLimits(d, `${sc}${g}`)]) {
          expect(l.upper - l.lower).toBeCloseTo(l.itMm, 9);
          // Limit sizes are rounded to 0.01 µm.
          expect(l.max).toBeCloseTo(d + l.upper, 5);
          expect(l.min).toBeCloseTo(d + l.lower, 5);
        }
      }),
    );
  });

  // ISO 286-1 §4.3.2.5: the Δ rule exists so that a hole-basis fit (H(n)/x(n−1)) and the equivalent
  // shaft-basis fit (X(n)/h(n−1)) have the same clearances — an independent check of the Δ arithmetic.
  it("hole-basis and shaft-basis equivalents give the same fit", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3.001, max: 500, noNaN: true }),
        fc.constantFrom("k", "m", "n", "p", "r", "s"),
        fc.integer({ min: 5, max: 8 }),
        (d, letter, g) => {
          const maxGrade = ["k", "m", "n"].includes(letter) ? 8 : 7;
          if (g > maxGrade) return;
          if (letter === "m" && g === 6 && d > 250 && d <= 315) return; // the standard's special case
          const holeBasis = fitCalculator.compute({ size: d, hole: `H${g}`, shaft: `${letter}${g - 1}` });
          const shaftBasis = fitCalculator.compute({ size: d, hole: `${letter.toUpperCase()}${g}`, shaft: `h${g - 1}` });
          expect(shaftBasis.clearanceMin).toBeCloseTo(holeBasis.clearanceMin ?? NaN, 9);
          expect(shaftBasis.clearanceMax).toBeCloseTo(holeBasis.clearanceMax ?? NaN, 9);
        },
      ),
    );
  });
});
