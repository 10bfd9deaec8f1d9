import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "../types";
import { COARSE_PITCH_MM, FINE_PITCHES_MM } from "./iso-metric";
import { parseThread, threadCalculator as calc } from "./index";

const t = (designation: string, material?: Parameters<typeof calc.compute>[0]["material"]) =>
  calc.compute(material ? { designation, material } : { designation });

describe("ISO 724 basic dimensions", () => {
  it.each<[string, number, number, number, number, string]>([
    // designation, P, d2, D1, d3 — source
    ["M6", 1, 5.35, 4.917, 4.773, "ISO 724:1993 table, M6: d2 5.350, D1 4.917; d3 4.773 (ISO 898-1) — from memory"],
    ["M10", 1.5, 9.026, 8.376, 8.16, "ISO 724:1993 table, M10: d2 9.026, D1 8.376; d3 8.160 — from memory"],
    ["M8x1", 1, 7.35, 6.917, 6.773, "ISO 724:1993 table, M8×1: d2 7.350, D1 6.917; d3 6.773 — from memory"],
    ["M8", 1.25, 7.188, 6.647, 6.466, "ISO 724:1993 table, M8: d2 7.188, D1 6.647; d3 6.466 — from memory"],
    ["M12", 1.75, 10.863, 10.106, 9.853, "ISO 724:1993 table, M12: d2 10.863, D1 10.106; d3 9.853 — from memory"],
    ["M3", 0.5, 2.675, 2.459, 2.387, "ISO 724:1993 table, M3: d2 2.675, D1 2.459; d3 2.387 — from memory"],
    ["M4", 0.7, 3.545, 3.242, 3.141, "ISO 724:1993 table, M4: d2 3.545, D1 3.242; d3 3.141 — from memory"],
    ["M16", 2, 14.701, 13.835, 13.546, "ISO 724:1993 table, M16: d2 14.701, D1 13.835; d3 13.546 — from memory"],
    ["M24", 3, 22.051, 20.752, 20.319, "ISO 724:1993 table, M24: d2 22.051, D1 20.752; d3 20.319 — from memory"],
    ["M1.6", 0.35, 1.373, 1.221, 1.171, "ISO 724:1993 table, M1.6: d2 1.373, D1 1.221; d3 1.171 — from memory"],
    ["M20x1.5", 1.5, 19.026, 18.376, 18.16, "ISO 724:1993 table, M20×1.5: d2 19.026, D1 18.376; d3 18.160 — from memory"],
  ])("%s — %s", (designation, pitch, d2, d1, d3) => {
    const r = t(designation);
    expect(r.pitch).toBe(pitch);
    expect(r.pitchDiameter).toBe(d2);
    expect(r.minorDiameterInternal).toBe(d1);
    expect(r.minorDiameterExternal).toBe(d3);
  });

  it("gives the CLI contract keys for M6", () => {
    const r = t("M6");
    expect(r).toMatchObject({ pitch: 1, majorDiameter: 6, pitchDiameter: 5.35, minorDiameterExternal: 4.773, minorDiameterInternal: 4.917, tapDrill: 5, series: "coarse", designation: "M6" });
    // ISO 68-1: H = 0.866025·P.
    expect(r.fundamentalTriangleHeight).toBeCloseTo(0.866025, 6);
  });
});

describe("tap drills (d − P to the drill series)", () => {
  it.each<[string, number, string]>([
    ["M3", 2.5, "tap-drill table (ISO 2306 / workshop charts, from memory): M3 → 2.5"],
    ["M4", 3.3, "tap-drill table: M4 → 3.3"],
    ["M5", 4.2, "tap-drill table: M5 → 4.2"],
    ["M6", 5, "tap-drill table: M6 → 5.0"],
    ["M8", 6.8, "tap-drill table: M8 → 6.8"],
    ["M10", 8.5, "tap-drill table: M10 → 8.5"],
    ["M12", 10.2, "tap-drill table: M12 → 10.2"],
    ["M2.5", 2.05, "tap-drill table: M2.5 → 2.05"],
    ["M16", 14, "tap-drill table: M16 → 14"],
    ["M20", 17.5, "tap-drill table: M20 → 17.5"],
    ["M8x1", 7, "tap-drill table: M8×1 → 7.0"],
    ["M6x0.75", 5.2, "tap-drill table: M6×0.75 → 5.2"],
    ["M10x1.25", 8.8, "tap-drill table: M10×1.25 → 8.8"],
    ["M1.6", 1.25, "tap-drill table: M1.6 → 1.25"],
    ["M3.5", 2.9, "tap-drill table: M3.5 → 2.9"],
    ["M3x0.35", 2.65, "tap-drill table: M3×0.35 → 2.65"],
  ])("%s → Ø%s (%s)", (designation, drill) => {
    const r = t(designation);
    expect(r.tapDrill).toBe(drill);
    // Common practice: the chosen drill is never more than half a drill step from d − P.
    expect(Math.abs(r.tapDrill - (r.majorDiameter - r.pitch))).toBeLessThanOrEqual(0.05 + 1e-9);
  });

  // Common practice cross-check: the tap drill lies between the internal minor diameter D1 and the pitch
  // diameter, so the tap cuts a full-depth crest without the drill removing the flanks.
  it("lies between D1 and d2 for every tabulated thread", () => {
    const all = Object.entries(COARSE_PITCH_MM).flatMap(([d, p]) => [`M${d}x${p}`, ...(FINE_PITCHES_MM[d] ?? []).map((f) => `M${d}x${f}`)]);
    expect(all.length).toBeGreaterThan(40);
    for (const designation of all) {
      const r = t(designation);
      expect(r.tapDrill).toBeGreaterThan(r.minorDiameterInternal);
      expect(r.tapDrill).toBeLessThan(r.pitchDiameter);
      expect(r.minorDiameterExternal).toBeLessThan(r.minorDiameterInternal);
      expect(r.clearanceHoles.fine).toBeGreaterThan(r.majorDiameter);
    }
  });
});

describe("stress area, clearance holes, engagement", () => {
  it.each<[string, number, string]>([
    ["M6", 20.1, "ISO 898-1 table of stress areas: M6 20.1 mm² (from memory)"],
    ["M8", 36.6, "ISO 898-1: M8 36.6 mm² (from memory)"],
    ["M10", 58, "ISO 898-1: M10 58.0 mm² (from memory)"],
    ["M12", 84.3, "ISO 898-1: M12 84.3 mm² (from memory)"],
    ["M8x1", 39.2, "ISO 898-1: M8×1 39.2 mm² (from memory)"],
    ["M12x1.5", 88.1, "ISO 898-1: M12×1.5 88.1 mm² (from memory)"],
  ])("%s As = %s mm² (%s)", (designation, area) => {
    expect(t(designation).stressAreaMm2).toBe(area);
  });

  it("gives ISO 273 clearance holes", () => {
    // ISO 273:1979 (from memory): M6 6.4 / 6.6 / 7; M8 8.4 / 9 / 10; M3 3.2 / 3.4 / 3.6.
    expect(t("M6").clearanceHoles).toEqual({ fine: 6.4, medium: 6.6, coarse: 7 });
    expect(t("M8").clearanceHole).toBe(9);
    expect(t("M3").clearanceHoles).toEqual({ fine: 3.2, medium: 3.4, coarse: 3.6 });
    // ISO 273: a fine-pitch thread takes the hole of its nominal diameter.
    expect(t("M10x1").clearanceHole).toBe(11);
  });

  it("recommends engagement by the tapped material", () => {
    // Common practice rule of thumb (from memory): steel 1·d, cast iron 1.25–1.5·d, aluminium 2·d.
    expect(t("M6", "mild-steel").recommendedEngagementMm).toBe(6);
    expect(t("M6", "cast-iron").recommendedEngagementMm).toBe(9);
    expect(t("M6", "aluminium-6082").recommendedEngagementMm).toBe(12);
    expect(t("M6", "stainless-303").engagementMaterial?.group).toBe("steel");
    expect(t("M8").engagementMm).toMatchObject({ steel: 8, aluminium: 16, bronze: 12 });
  });
});

describe("thread designations", () => {
  it("accepts the usual spellings", () => {
    expect(parseThread("M6×0.75")).toEqual({ designation: "M6x0.75", series: "fine", majorDiameter: 6, pitch: 0.75 });
    expect(parseThread(" m8 x 1 ")).toMatchObject({ designation: "M8x1", series: "fine" });
    expect(parseThread("M10x1.5")).toMatchObject({ designation: "M10", series: "coarse" });
  });

  it("refuses what it does not know, saying what it does", () => {
    expect(() => parseThread("6mm")).toThrow(CalculatorInputError);
    expect(() => parseThread("M9")).toThrow(/not covered/);
    expect(() => parseThread("M6x0.5")).toThrow(/M6x1, M6x0.75/);
    expect(() => parseThread("M30")).toThrow(/not covered/);
    expect(calc.inputSchema.safeParse({ designation: "M6", material: "wood" }).success).toBe(false);
  });
});
