import { describe, expect, it } from "vitest";
import { counterboreCalculator as calc, SCREW_SIZES } from "./index";

describe("counterbore for ISO 4762", () => {
  it.each<[string, number, number, number, number, string]>([
    // screw, dk max, k max, counterbore Ø, clearance (medium) — source
    ["M3", 5.5, 3, 6.5, 3.4, "ISO 4762 M3 dk 5.5, k 3; DIN 974-1 Ø6.5; ISO 273 medium 3.4 (from memory)"],
    ["M4", 7, 4, 8, 4.5, "ISO 4762 M4 dk 7, k 4; DIN 974-1 Ø8; ISO 273 medium 4.5 (from memory)"],
    ["M5", 8.5, 5, 10, 5.5, "ISO 4762 M5 dk 8.5, k 5; DIN 974-1 Ø10; ISO 273 medium 5.5 (from memory)"],
    ["M6", 10, 6, 11, 6.6, "ISO 4762 M6 dk 10, k 6; DIN 974-1 Ø11; ISO 273 medium 6.6 (from memory)"],
    ["M8", 13, 8, 15, 9, "ISO 4762 M8 dk 13, k 8; DIN 974-1 Ø15; ISO 273 medium 9 (from memory)"],
    ["M10", 16, 10, 18, 11, "ISO 4762 M10 dk 16, k 10; DIN 974-1 Ø18; ISO 273 medium 11 (from memory)"],
    ["M12", 18, 12, 20, 13.5, "ISO 4762 M12 dk 18, k 12; DIN 974-1 Ø20; ISO 273 medium 13.5 (from memory)"],
  ])("%s — %s", (screw, dk, k, cb, hole) => {
    const r = calc.compute({ screw });
    expect(r).toMatchObject({ headDiameterMm: dk, headHeightMm: k, counterboreDiameterMm: cb, clearanceHoleMm: hole });
  });

  // Common practice: M6 socket head → counterbore Ø11 × 6.5 deep (k 6 + 0.5).
  it("gives M6 as Ø11 × 6.5 with the fine clearance hole on request", () => {
    const r = calc.compute({ screw: "m6", clearance: "fine" });
    expect([r.counterboreDiameterMm, r.counterboreDepthMm, r.clearanceHoleMm]).toEqual([11, 6.5, 6.4]);
  });

  it("always clears the knurled head and sinks it below the face", () => {
    for (const screw of SCREW_SIZES) {
      const r = calc.compute({ screw });
      expect(r.radialClearanceMm).toBeGreaterThan(0.2);
      expect(r.counterboreDepthMm).toBeGreaterThan(r.headHeightMm);
      expect(r.clearanceHoleMm).toBeGreaterThan(Number(screw.slice(1)));
      expect(r.clearanceHoleMm).toBeLessThan(r.headDiameterMm);
    }
  });

  it("refuses screws it has no data for", () => {
    expect(() => calc.compute({ screw: "M14" })).toThrow(/M3, M4/);
    expect(() => calc.compute({ screw: "M6x20" })).toThrow(/not covered/);
  });
});
