/**
 * Golden tests for templates/blocks/v-block.yaml. Every expected figure is worked out here by hand from
 * plane geometry (a round of radius r in a V of half angle α: centre r/sin α above the apex, contact
 * r·cos²α/sin α above it, top r·(1 + 1/sin α); see src/engine/calculators/v-block/geometry.ts) or by an
 * independent numeric method, and the method is written beside it.
 */
import { describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine";
import { analysis, builtIn, d1, evaluate, faceChamferMm3, failedAny, holeChamferMm3, part, passed, summary } from "./catalogue-helpers";

const T = builtIn("blocks/v-block.yaml");
const S2 = Math.SQRT2;

describe("v-block at its defaults (90° V 15 deep in a 50 × 60 × 45 block, rounds Ø15–Ø40)", () => {
  const e = evaluate(T);

  it("passes every check", () => {
    expect(failedAny(e)).toEqual([]);
    expect(e.ok).toBe(true);
    expect(e.buildable).toBe(true);
  });

  // Plane geometry, α = 45°: Ø15 → centre 7.5·√2 = 10.607 above the apex, apex 45 − 15 = 30 above the base
  // → 40.607; contact 7.5/√2 = 5.303; top 7.5·(1 + √2) = 18.107 → stands 3.107 proud of the 15 deep V.
  it("places the smallest and largest rounds", () => {
    const small = analysis<Record<string, number>>(e, "vSmall");
    expect(small.centreAboveBaseMm).toBeCloseTo(30 + 7.5 * S2, 9);
    expect(small.contactAboveApexMm).toBeCloseTo(7.5 / S2, 9);
    expect(small.standsProudMm).toBeCloseTo(7.5 * (1 + S2) - 15, 9);
    const large = analysis<Record<string, number>>(e, "vLarge");
    // Ø40: centre 20·√2 = 28.284 → 58.284 above the base; contact 20/√2 = 14.142 < 15 (on the flank).
    expect(large.centreAboveBaseMm).toBeCloseTo(30 + 20 * S2, 9);
    expect(large.contactAboveApexMm).toBeCloseTo(20 / S2, 9);
    // Usable range of this V: 2(15 + 2)/(1 + √2) = 14.083 … 2·15·sin45/cos²45 = 30√2 = 42.426.
    expect(large.minDiameterMm).toBeCloseTo(34 / (1 + S2), 9);
    expect(large.maxDiameterMm).toBeCloseTo(30 * S2, 9);
  });

  // Stirrup by hand: largest top 30 + 20(1 + √2) = 78.284; bridge underside ⌈78.284 + 3⌉ = 82; lips 8 − 2 = 6 high
  // sit with their tops at the groove top 10 + 8 = 18, so the stirrup starts at z = 12 and is 82 + 10 − 12 = 80 high,
  // 2 × 8 = 16 wide, 60 + 2 + 2 × 8 = 78 across. Smallest top 30 + 7.5(1 + √2) = 48.107: the screw must reach
  // 82 − 48.107 = 33.893 below the bridge; an M8 × 50 reaches 50 − 10 = 40.
  it("sizes the stirrup and the screw reach", () => {
    expect(e.derived.largestTop).toBeCloseTo(30 + 20 * (1 + S2), 9);
    expect(e.derived.bridgeUnderside).toBe(82);
    expect(e.derived.clampHeight).toBe(80);
    expect(e.derived.outerWidth).toBe(78);
    expect(e.derived.clampWidth).toBe(16);
    expect(e.derived.reachNeeded).toBeCloseTo(82 - 30 - 7.5 * (1 + S2), 9);
    expect(e.derived.screwReach).toBe(40);
    // The derived tops agree with the calculator's plane geometry.
    expect(e.derived.largestTop).toBeCloseTo(analysis<Record<string, number>>(e, "vLarge").topAboveBaseMm!, 9);
    expect(e.derived.smallestTop).toBeCloseTo(analysis<Record<string, number>>(e, "vSmall").topAboveBaseMm!, 9);
  });

  // Analytic volume by hand. Block: 50·60·45 = 135 000, less the V h²·tan45·L = 15²·50 = 11 250, the relief
  // 3·3·50 = 450, two grooves 2·(5·8·50) = 4 000 and the base chamfer 0.5²/2·2(50 + 60) − 4·0.5³/3 = 27.333.
  it("has the block's volume worked out by hand", () => {
    const block = part(e, "block");
    const expected = 135000 - 11250 - 450 - 4000 - faceChamferMm3(0.5, 50, 60);
    expect(partVolumeMm3(block)).toBeCloseTo(expected, 6);
    // Mild steel 7850 kg/m³ (EN 1993-1-1 design value, from memory).
    expect(summary(e, "block").massKg).toBeCloseTo(expected * 7850e-9, 9);
    expect(summary(e, "block").quantity).toBe(2);
  });

  // Stirrup: 16·78·80 = 99 840, less the opening 16·62·64 = 63 488, the gap between the lips 16·52·6 = 4 992,
  // the M8 tap-drill bore D1 = 8 − 1.082532·1.25 = 6.647 to 10.5 deep with a 0.5 entry chamfer, and the
  // top-face chamfer 0.5²/2·2(16 + 78) − 4·0.5³/3.
  it("has the stirrup's volume worked out by hand", () => {
    const bore = d1(8, 1.25);
    const expected = 99840 - 63488 - 4992 - (Math.PI / 4) * bore * bore * 10.5 - holeChamferMm3(bore, 0.5) - faceChamferMm3(0.5, 16, 78);
    expect(partVolumeMm3(part(e, "stirrup"))).toBeCloseTo(expected, 6);
  });

  it("says how to heat treat and finish the pair", () => {
    expect(part(e, "block").heatTreatment).toMatch(/None required/);
    expect(evaluate(T, { blockMaterial: "tool-steel" }).parts[0]!.heatTreatment).toMatch(/Harden and temper/);
    expect(part(e, "block").drawing?.notes?.join(" ")).toMatch(/matched pair/);
  });
});

describe("v-block, other parameter sets", () => {
  // 120° V, 10 deep, block 70 × 40 high, rounds Ø10–Ø30 (α = 60°, sin 0.8660, cos 0.5):
  // Ø10 top 5·(1 + 1/0.8660) = 10.774 → only 0.774 proud (< 2): fails; smallest that stands 2 proud:
  // 2·12/(1 + 1.1547) = 11.138. Ø30 contact 15·0.25/0.8660 = 4.330 < 10: on the flanks. V width 2·10·tan60 = 34.64.
  it("120° V 10 deep: the Ø10 does not stand proud, the Ø30 sits well", () => {
    const e = evaluate(T, { vAngle: 120, vDepth: 10, blockHeight: 40, blockWidth: 70, smallestRound: 10, largestRound: 30 });
    const s = Math.sin(Math.PI / 3);
    expect(passed(e, "smallest-stands-proud")).toBe(false);
    expect(e.ok).toBe(false);
    expect(analysis<Record<string, number>>(e, "vSmall").standsProudMm).toBeCloseTo(5 * (1 + 1 / s) - 10, 9);
    expect(analysis<Record<string, number>>(e, "vSmall").minDiameterMm).toBeCloseTo(24 / (1 + 1 / s), 9);
    expect(passed(e, "largest-touches-flanks")).toBe(true);
    expect(analysis<Record<string, number>>(e, "vLarge").contactAboveApexMm).toBeCloseTo((15 * 0.25) / s, 9);
    expect(e.derived.vWidthAtTop).toBeCloseTo(20 * Math.sqrt(3), 9);
    expect(e.derived.landWidth).toBeCloseTo((70 - 20 * Math.sqrt(3)) / 2, 9);
    // Centre of the Ø30 above the base: apex 30 + 15/0.8660 = 47.321.
    expect(analysis<Record<string, number>>(e, "vLarge").centreAboveBaseMm).toBeCloseTo(30 + 15 / s, 9);
  });

  // 60° V, 20 deep in a 80 × 70 × 60 block, Ø8–Ø25 (α = 30°): in a 60° V the centre is one diameter above the apex.
  // Ø8 top 4 + 8 = 12 above the apex — 8 below the top: not proud. Ø25 contact 12.5·0.75/0.5 = 18.75 < 20.
  // Flank limit 2·20·0.5/0.75 = 26.667.
  it("60° V 20 deep: centre one diameter above the apex", () => {
    const e = evaluate(T, { vAngle: 60, vDepth: 20, blockHeight: 60, blockWidth: 70, blockLength: 80, smallestRound: 8, largestRound: 25 });
    expect(analysis<Record<string, number>>(e, "vSmall").centreAboveApexMm).toBeCloseTo(8, 9);
    expect(analysis<Record<string, number>>(e, "vSmall").standsProudMm).toBeCloseTo(-8, 9);
    expect(passed(e, "smallest-stands-proud")).toBe(false);
    expect(analysis<Record<string, number>>(e, "vLarge").contactAboveApexMm).toBeCloseTo(18.75, 9);
    expect(analysis<Record<string, number>>(e, "vLarge").maxDiameterMm).toBeCloseTo(80 / 3, 9);
    expect(passed(e, "largest-touches-flanks")).toBe(true);
    expect(e.derived.apexHeight).toBe(40);
  });

  // The same block in inches: 2 in wide, 1.75 in high; lengths shown in inches, the engine works in mm.
  it("shows lengths in inches for an inch user", () => {
    const e = evaluate(T, { blockWidth: 2.5, blockHeight: 1.75 }, "in");
    expect(e.parameters.blockWidth).toBeCloseTo(2.5, 9);
    expect(part(e, "block").features[0]).toMatchObject({ size: { y: 63.5, z: 44.45 } });
    // Apex 44.45 − 15 = 29.45 mm = 1.1594 in.
    expect(e.derived.apexHeight).toBeCloseTo(29.45 / 25.4, 9);
  });
});

describe("v-block checks pass and fail at their boundaries", () => {
  const at = (p: Record<string, unknown>, id: string) => passed(evaluate(T, p), id);

  it("range-order: the smallest must be smaller than the largest", () => {
    expect(at({ smallestRound: 20, largestRound: 20 }, "range-order")).toBe(false);
    expect(at({ smallestRound: 19.9, largestRound: 20 }, "range-order")).toBe(true);
  });

  // Relief 3 wide: contact offset r·cos45 ≥ 1.5 ⇔ d ≥ 3/cos45 = 4.243.
  it("smallest-touches-flanks: at the relief limit Ø4.243", () => {
    expect(at({ smallestRound: 4.2 }, "smallest-touches-flanks")).toBe(false);
    expect(at({ smallestRound: 4.3 }, "smallest-touches-flanks")).toBe(true);
  });

  // 2(15 + 2)/(1 + √2) = 14.083.
  it("smallest-stands-proud: at Ø14.083", () => {
    expect(at({ smallestRound: 14.05 }, "smallest-stands-proud")).toBe(false);
    expect(at({ smallestRound: 14.1 }, "smallest-stands-proud")).toBe(true);
  });

  // 30√2 = 42.426.
  it("largest-touches-flanks: at Ø42.426", () => {
    expect(at({ largestRound: 42.4 }, "largest-touches-flanks")).toBe(true);
    expect(at({ largestRound: 42.45 }, "largest-touches-flanks")).toBe(false);
  });

  it("largest-stands-proud: at Ø14.083 too", () => {
    expect(at({ smallestRound: 5, largestRound: 14.05 }, "largest-stands-proud")).toBe(false);
    expect(at({ smallestRound: 5, largestRound: 14.1 }, "largest-stands-proud")).toBe(true);
  });

  // Land (W − 30)/2 ≥ 5 ⇔ W ≥ 40.
  it("v-fits-block: at a 40 wide block", () => {
    expect(at({ blockWidth: 40, largestRound: 30 }, "v-fits-block")).toBe(true);
    expect(at({ blockWidth: 39.8, largestRound: 30 }, "v-fits-block")).toBe(false);
  });

  // Groove top ≤ 45 − 3 = 42 ⇔ grooveHeight ≤ 34 (width 8).
  it("groove-clear-of-v: grooves at least 3 below the top", () => {
    expect(at({ grooveHeight: 34 }, "groove-clear-of-v")).toBe(true);
    expect(at({ grooveHeight: 34.5 }, "groove-clear-of-v")).toBe(false);
  });

  /**
   * Independent method for the groove-to-V wall: sample the flank segment from the apex to the top edge and
   * the relief box's outline finely, and take the least distance to the groove box. Grooves 12 deep in a block
   * 40 wide with a 90° V 15 deep and a 9 wide relief (15.5 to 24.5 across): it comes within 3.5 of the groove.
   */
  it("groove-clear-of-v: the wall agrees with a sampled distance and fails under 4 mm", () => {
    const p = { blockWidth: 40, grooveDepth: 12, reliefWidth: 9, grooveHeight: 20, grooveWidth: 8, largestRound: 30 };
    const e = evaluate(T, p);
    const apexY = 20;
    const apexZ = 30;
    const box = { y0: 0, y1: 12, z0: 20, z1: 28 };
    const toBox = (y: number, z: number) => Math.hypot(Math.max(box.y0 - y, 0, y - box.y1), Math.max(box.z0 - z, 0, z - box.z1));
    let best = Infinity;
    for (let i = 0; i <= 20000; i++) {
      const t = i / 20000;
      best = Math.min(best, toBox(apexY - t * 15, apexZ + t * 15)); // flank up to the top edge (tan 45° = 1)
      best = Math.min(best, toBox(apexY - 4.5 + 9 * t, 27), toBox(apexY - 4.5, 27 + 3 * t)); // relief bottom and side
    }
    expect(e.derived.grooveToV).toBeCloseTo(best, 3);
    expect(best).toBeCloseTo(3.5, 3);
    expect(passed(e, "groove-clear-of-v")).toBe(false);
    // Lower grooves (top at 22): 3.5 across and 5 down to the relief, hypot = 6.10.
    expect(evaluate(T, { ...p, grooveHeight: 14 }).derived.grooveToV).toBeCloseTo(Math.hypot(3.5, 5), 9);
    expect(at({ ...p, grooveHeight: 14 }, "groove-clear-of-v")).toBe(true);
  });

  // Lip engagement = groove depth − 1 mm clearance ≥ 2.
  it("lips-engage: at a 3 mm groove", () => {
    expect(at({ grooveDepth: 3 }, "lips-engage")).toBe(true);
    expect(at({ grooveDepth: 2.5 }, "lips-engage")).toBe(false);
  });

  // Reach needed 33.893 + bridge 10 → a screw of 43.893 or longer.
  it("screw-reaches-smallest: at an M8 × 43.9", () => {
    expect(at({ clampScrewLength: 43.8 }, "screw-reaches-smallest")).toBe(false);
    expect(at({ clampScrewLength: 44 }, "screw-reaches-smallest")).toBe(true);
  });

  it("leaves the stirrup and its checks out when no clamp is made", () => {
    const e = evaluate(T, { withClamp: false, clampScrewLength: 20 });
    expect(e.parts.map((p) => p.id)).toEqual(["block"]);
    expect(e.checks.some((c) => c.id === "screw-reaches-smallest")).toBe(false);
    expect(e.ok).toBe(true);
  });
});
