import { describe, expect, it } from "vitest";
import { SETUP_CAUTION } from "../types";
import { MATERIAL_KEYS } from "../../materials";
import { cuttingSpeedCalculator, OPERATIONS, rpmFromCuttingSpeed, spindleSpeed, TOOL_MATERIALS } from "./index";

const run = (raw: Record<string, unknown>) => cuttingSpeedCalculator.compute(cuttingSpeedCalculator.inputSchema.parse(raw));

describe("cutting-speed: n = 1000·v/(π·D) (textbook)", () => {
  it("by hand: v = 25 m/min, D = 10 mm → 25000/31.416 = 795.8 → 796 rev/min", () => {
    expect(rpmFromCuttingSpeed(25, 10)).toBeCloseTo(795.77, 2);
  });
  it("CLI contract: mild steel, HSS, drill Ø10 → the table's 25 m/min and 796 rev/min", () => {
    // 25 m/min for an HSS drill in low-carbon steel: handbook starting value (from memory).
    const r = run({ material: "mild-steel", tool: "hss", operation: "drill", diameter: 10 });
    expect(r.cuttingSpeedMpm).toBe(25);
    expect(r.rpm).toBe(796);
    expect(r.capped).toBe(false);
    expect(r.cautions).toContain(SETUP_CAUTION);
  });
  it("by hand: turning Ø40 brass at 70 m/min (HSS) → 70000/125.66 = 557 rev/min", () => {
    expect(run({ material: "brass", tool: "hss", operation: "turn", diameter: 40 }).rpm).toBe(557);
  });
  it("caps at the machine's top speed and reports the cutting speed reached", () => {
    // Ø3 carbide drill in 6082: 150 m/min → 15 915 rev/min wanted; a 3000 rev/min machine reaches π·3·3000/1000 = 28.27 m/min.
    const r = run({ material: "aluminium-6082", tool: "carbide", operation: "drill", diameter: 3, machineMaxRpm: 3000 });
    expect(r.rpmExact).toBeCloseTo(15915.5, 1);
    expect(r.rpm).toBe(3000);
    expect(r.capped).toBe(true);
    expect(r.effectiveCuttingSpeedMpm).toBeCloseTo(28.274, 3);
    expect(r.cautions.some((c) => c.includes("tops out at 3000"))).toBe(true);
  });
  it("no cap when the machine is fast enough", () => {
    const r = spindleSpeed({ material: "mild-steel", tool: "hss", operation: "drill", diameterMm: 10, machineMaxRpm: 2000 });
    expect(r.capped).toBe(false);
    expect(r.rpm).toBe(796);
  });
  it("an explicit cutting speed overrides the table", () => {
    expect(run({ material: "mild-steel", tool: "hss", operation: "drill", diameter: 10, cuttingSpeed: 20 }).rpm).toBe(637);
  });
});

describe("cutting-speed: table facts of the trade", () => {
  it("common practice: reaming runs at one half to two thirds of drilling speed", () => {
    for (const material of MATERIAL_KEYS) {
      for (const tool of TOOL_MATERIALS) {
        const drill = spindleSpeed({ material, tool, operation: "drill", diameterMm: 6 }).cuttingSpeedMpm;
        const ream = spindleSpeed({ material, tool, operation: "ream", diameterMm: 6 }).cuttingSpeedMpm;
        expect(ream / drill).toBeGreaterThanOrEqual(0.5);
        expect(ream / drill).toBeLessThanOrEqual(2 / 3);
      }
    }
  });
  it("handbook tables (from memory): carbide runs faster than HSS, and aluminium and brass faster than steel, stainless slowest of the steels", () => {
    for (const material of MATERIAL_KEYS) {
      for (const operation of OPERATIONS) {
        const hss = spindleSpeed({ material, tool: "hss", operation, diameterMm: 10 }).cuttingSpeedMpm;
        const carbide = spindleSpeed({ material, tool: "carbide", operation, diameterMm: 10 }).cuttingSpeedMpm;
        expect(carbide).toBeGreaterThan(hss);
      }
    }
    const v = (material: (typeof MATERIAL_KEYS)[number]) => spindleSpeed({ material, tool: "hss", operation: "turn", diameterMm: 10 }).cuttingSpeedMpm;
    expect(v("aluminium-6061")).toBeGreaterThan(v("brass"));
    expect(v("brass")).toBeGreaterThan(v("mild-steel"));
    expect(v("free-cutting-steel")).toBeGreaterThan(v("mild-steel"));
    expect(v("stainless-304")).toBeLessThan(v("mild-steel"));
  });
  it("handbook range (from memory): HSS drilling of mild steel lies within 20–30 m/min", () => {
    const v = spindleSpeed({ material: "mild-steel", tool: "hss", operation: "drill", diameterMm: 10 }).cuttingSpeedMpm;
    expect(v).toBeGreaterThanOrEqual(20);
    expect(v).toBeLessThanOrEqual(30);
  });
});

describe("cutting-speed: bad input", () => {
  it("refuses unknown material, tool or operation and a non-positive diameter", () => {
    const ok = { material: "mild-steel", tool: "hss", operation: "drill", diameter: 10 };
    expect(cuttingSpeedCalculator.inputSchema.safeParse({ ...ok, material: "wood" }).success).toBe(false);
    expect(cuttingSpeedCalculator.inputSchema.safeParse({ ...ok, tool: "diamond" }).error?.issues[0]?.message).toMatch(/hss/);
    expect(cuttingSpeedCalculator.inputSchema.safeParse({ ...ok, operation: "grind" }).success).toBe(false);
    expect(cuttingSpeedCalculator.inputSchema.safeParse({ ...ok, diameter: 0 }).success).toBe(false);
    expect(() => spindleSpeed({ material: "wood" as never, tool: "hss", operation: "drill", diameterMm: 5 })).toThrow(/Unknown material/);
  });
});
