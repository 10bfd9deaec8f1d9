import { describe, expect, it } from "vitest";
import { DIN_508_NUTS, ISO_299_T_SLOTS, tSlotCalculator as calc } from "./index";

const run = (input: Record<string, unknown>) => calc.compute(calc.inputSchema.parse(input));

describe("t-slot (ISO 299)", () => {
  // ISO 299:1987 nominal slot widths and their bolts (from memory; same as DIN 650).
  it.each([
    [5, "M4"],
    [6, "M5"],
    [8, "M6"],
    [10, "M8"],
    [12, "M10"],
    [14, "M12"],
    [18, "M16"],
    [22, "M20"],
    [28, "M24"],
    [36, "M30"],
    [42, "M36"],
    [48, "M42"],
    [54, "M48"],
  ])("a %d mm slot takes an %s bolt (ISO 299)", (a, bolt) => {
    expect(run({ slotWidth: a }).matchedBolt).toBe(bolt);
  });

  // ISO 299 / DIN 650, 14 mm slot: head space b 23–25, c 9–11, depth h 23–28 (from memory).
  it("gives the 14 mm slot's head space and depth", () => {
    const r = run({ slotWidth: 14 });
    expect([r.headSpaceWidthMinMm, r.headSpaceWidthMaxMm, r.headSpaceHeightMinMm, r.headSpaceHeightMaxMm, r.depthMinMm, r.depthMaxMm]).toEqual([23, 25, 9, 11, 23, 28]);
    expect(r.lipThicknessMinMm).toBe(12);
  });

  // DIN 508 (from memory): 12 mm slot nut M10, head 18 wide, 14 high, head 7, 20 long.
  it("gives the DIN 508 nut for a 12 mm slot, with its tongue", () => {
    const nut = run({ slotWidth: 12 }).tNut!;
    expect(nut).toMatchObject({ headWidthMm: 18, heightMm: 14, headHeightMm: 7, lengthMm: 20, tongueHeightMm: 7 });
    expect(nut.tongueWidthMm).toBeCloseTo(11.7, 9);
  });

  // Trade fact (fit of parts): every tabulated nut fits its slot's smallest head space, passes the throat and
  // stays below the table top when pulled against the lips.
  it("every DIN 508 nut fits inside its ISO 299 slot", () => {
    for (const slot of ISO_299_T_SLOTS) {
      const nut = DIN_508_NUTS[slot.widthMm];
      if (!nut) continue;
      expect(nut.headWidthMm, `${slot.widthMm}`).toBeLessThan(slot.headSpaceWidthMm[0]);
      expect(nut.headHeightMm, `${slot.widthMm}`).toBeLessThan(slot.headSpaceHeightMm[0]);
      expect(nut.heightMm - nut.headHeightMm, `${slot.widthMm}`).toBeLessThan(slot.depthMm[0] - slot.headSpaceHeightMm[1]);
      expect(run({ slotWidth: slot.widthMm }).tNut!.standsBelowTableMm).toBeGreaterThan(0);
    }
  });

  it("the head space grows with the slot and always exceeds the throat", () => {
    for (let i = 0; i < ISO_299_T_SLOTS.length; i++) {
      const s = ISO_299_T_SLOTS[i]!;
      expect(s.headSpaceWidthMm[0]).toBeGreaterThan(s.widthMm);
      expect(s.boltNominalMm).toBeLessThan(s.widthMm);
      if (i > 0) expect(s.widthMm).toBeGreaterThan(ISO_299_T_SLOTS[i - 1]!.widthMm);
    }
  });

  it("judges the bolt: matched, one size down, too large, too small", () => {
    expect(run({ slotWidth: 12, bolt: "M10" })).toMatchObject({ boltSuits: true, boltVerdict: "matched", throatClearanceMm: 1 });
    expect(run({ slotWidth: 12, bolt: "M8" })).toMatchObject({ boltSuits: true, boltVerdict: "reduced" });
    expect(run({ slotWidth: 12, bolt: "M12" })).toMatchObject({ boltSuits: false, boltVerdict: "too-large" });
    const small = run({ slotWidth: 12, bolt: "m6" });
    expect(small).toMatchObject({ boltSuits: false, boltVerdict: "too-small", bolt: "M6" });
    expect(small.cautions.join(" ")).toMatch(/small for a 12 mm slot/);
    expect(run({ slotWidth: 12 }).boltSuits).toBeNull();
  });

  it("refuses widths that are not ISO 299 sizes and bolts that are not metric", () => {
    expect(() => run({ slotWidth: 16 })).toThrow(/8, 10, 12, 14, 18/);
    expect(() => run({ slotWidth: 12, bolt: "3/8 UNC" })).toThrow(/not a metric bolt/);
  });

  it("says when it holds no nut data", () => {
    const r = run({ slotWidth: 36 });
    expect(r.tNut).toBeNull();
    expect(r.cautions.join(" ")).toMatch(/No DIN 508 nut data/);
  });
});
