import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { generalToleranceCalculator as calc, LINEAR, TOLERANCE_CLASSES } from "./index";

const pm = (size: number, cls: "f" | "m" | "c" | "v", feature?: "linear" | "chamfer" | "angle") =>
  calc.compute(feature ? { size, class: cls, feature } : { size, class: cls }).plusMinus;

describe("ISO 2768-1 Table 1, linear", () => {
  it.each<[number, "f" | "m" | "c" | "v", number, string]>([
    [30, "m", 0.2, "ISO 2768-1 Table 1: m, over 6 up to 30 → ±0.2 (from memory); 30 is in 6–30"],
    [6, "m", 0.1, "ISO 2768-1 Table 1: m, over 3 up to 6 → ±0.1 (from memory)"],
    [120, "m", 0.3, "ISO 2768-1 Table 1: m, over 30 up to 120 → ±0.3 (from memory)"],
    [3, "f", 0.05, "ISO 2768-1 Table 1: f, 0.5 up to 3 → ±0.05 (from memory)"],
    [400, "c", 1.2, "ISO 2768-1 Table 1: c, over 120 up to 400 → ±1.2 (from memory)"],
    [0.5, "m", 0.1, "ISO 2768-1 Table 1: m, 0.5 up to 3 → ±0.1 (from memory); 0.5 is included"],
    [30.01, "m", 0.3, "ISO 2768-1 Table 1: m, over 30 up to 120 → ±0.3 (from memory)"],
    [50, "f", 0.15, "ISO 2768-1 Table 1: f, over 30 up to 120 → ±0.15 (from memory)"],
    [1500, "v", 6, "ISO 2768-1 Table 1: v, over 1000 up to 2000 → ±6 (from memory)"],
    [3000, "m", 2, "ISO 2768-1 Table 1: m, over 2000 up to 4000 → ±2 (from memory)"],
  ])("%s mm class %s → ±%s — %s", (size, cls, value) => {
    expect(pm(size, cls)).toBe(value);
  });

  it("reports the empty cells as not applicable", () => {
    // ISO 2768-1 Table 1 (from memory): no value below 0.5 mm, none for v up to 3 mm, none for f over 2000 mm.
    for (const [size, cls] of [[0.3, "m"], [2, "v"], [2500, "f"], [5000, "c"]] as const) {
      const r = calc.compute({ size, class: cls });
      expect(r.applicable).toBe(false);
      expect(r.plusMinus).toBeNull();
      expect(r.note).toMatch(/beside the size/);
    }
  });

  it("never gets finer as the class gets coarser or the size larger", () => {
    fc.assert(
      fc.property(fc.double({ min: 3.001, max: 2000, noNaN: true }), fc.double({ min: 3.001, max: 2000, noNaN: true }), (a, b) => {
        const [s, l] = a <= b ? [a, b] : [b, a];
        let previous = 0;
        for (const cls of TOLERANCE_CLASSES) {
          const small = pm(s, cls) ?? NaN;
          expect(pm(l, cls) ?? NaN).toBeGreaterThanOrEqual(small);
          expect(small).toBeGreaterThanOrEqual(previous);
          previous = small;
        }
      }),
    );
    expect(LINEAR.length).toBe(8);
  });
});

describe("ISO 2768-1 Table 2, broken edges", () => {
  it.each<[number, "f" | "m" | "c" | "v", number, string]>([
    [1, "m", 0.2, "ISO 2768-1 Table 2: f/m, 0.5 up to 3 → ±0.2 (from memory)"],
    [4, "m", 0.5, "ISO 2768-1 Table 2: f/m, over 3 up to 6 → ±0.5 (from memory)"],
    [10, "f", 1, "ISO 2768-1 Table 2: f/m, over 6 → ±1 (from memory)"],
    [2, "c", 0.4, "ISO 2768-1 Table 2: c/v, 0.5 up to 3 → ±0.4 (from memory)"],
    [8, "v", 2, "ISO 2768-1 Table 2: c/v, over 6 → ±2 (from memory)"],
  ])("chamfer %s mm class %s → ±%s — %s", (size, cls, value) => {
    expect(pm(size, cls, "chamfer")).toBe(value);
  });
});

describe("ISO 2768-1 Table 3, angles", () => {
  it.each<[number, "f" | "m" | "c" | "v", number, string, string]>([
    [8, "m", 1, "±1°", "ISO 2768-1 Table 3: f/m, shorter leg up to 10 → ±1° (from memory)"],
    [40, "m", 0.5, "±0°30′", "ISO 2768-1 Table 3: f/m, over 10 up to 50 → ±0°30′ (from memory)"],
    [100, "c", 0.5, "±0°30′", "ISO 2768-1 Table 3: c, over 50 up to 120 → ±0°30′ (from memory)"],
    [200, "f", 10 / 60, "±0°10′", "ISO 2768-1 Table 3: f/m, over 120 up to 400 → ±0°10′ (from memory)"],
    [5, "v", 3, "±3°", "ISO 2768-1 Table 3: v, up to 10 → ±3° (from memory)"],
    [500, "c", 10 / 60, "±0°10′", "ISO 2768-1 Table 3: c, over 400 → ±0°10′ (from memory)"],
  ])("leg %s mm class %s → ±%s° — %s", (size, cls, deg, text) => {
    const r = calc.compute({ size, class: cls, feature: "angle" });
    expect(r.plusMinusDeg).toBeCloseTo(deg, 6);
    expect(r.plusMinus).toBe(r.plusMinusDeg);
    expect(r.plusMinusText).toBe(text);
  });
});

describe("general-tolerance input", () => {
  it("refuses unknown classes and non-positive sizes", () => {
    expect(calc.inputSchema.safeParse({ size: 10, class: "x" }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ size: 0, class: "m" }).success).toBe(false);
    expect(calc.inputSchema.safeParse({ size: 10, class: "m", feature: "thread" }).success).toBe(false);
  });
});
