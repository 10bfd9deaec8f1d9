/**
 * Golden tests for templates/soft-jaws/vise-soft-jaws.yaml. Screw and counterbore sizes are ISO 4762 head
 * sizes (dk, k), the DIN 974-1 counterbore series and ISO 273 medium clearance holes (from memory, as in the
 * counterbore calculator); engagement by the tapped material is the common-practice rule of thumb (steel
 * 1·d, cast iron 1.5·d); V geometry is plane geometry (see the v-block calculator). Volumes by hand.
 */
import { describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine";
import { analysis, builtIn, evaluate, failedAny, part, passed, summary } from "./catalogue-helpers";

const T = builtIn("soft-jaws/vise-soft-jaws.yaml");
const disc = (d: number) => (Math.PI / 4) * d * d;
/** A through clearance hole Ø h in a jaw t thick with a counterbore Ø D × k: π/4·h²·t + π/4·(D² − h²)·k. */
const counterboredHole = (h: number, t: number, D: number, k: number) => disc(h) * t + (disc(D) - disc(h)) * k;

describe("soft jaws at their defaults (aluminium 100 × 30 × 12, two M6 at 60, a step)", () => {
  const e = evaluate(T);

  it("passes every check", () => {
    expect(failedAny(e)).toEqual([]);
    expect(e.ok).toBe(true);
  });

  // ISO 4762 M6: dk 10, k 6; counterbore Ø11 (DIN 974-1) × (6 + 0.5); clearance Ø6.6 (ISO 273 medium).
  it("counterbores for ISO 4762 M6 heads", () => {
    const cb = analysis<Record<string, number>>(e, "cb");
    expect([cb.headDiameterMm, cb.headHeightMm, cb.counterboreDiameterMm, cb.counterboreDepthMm, cb.clearanceHoleMm]).toEqual([10, 6, 11, 6.5, 6.6]);
    const hole = part(e, "jaw").features[1]!;
    expect(hole).toMatchObject({ kind: "pattern-linear", count: 2, spacing: { x: 60 }, feature: { diameter: 6.6, counterbore: { diameter: 11, depth: 6.5 }, at: { x: 20, z: 12 } } });
  });

  // Engagement in the vise = counterbore depth + screw length − jaw thickness = 6.5 + 16 − 12 = 10.5; cast iron
  // wants 1.5 × 6 = 9 (common practice); the 14 deep tapped hole leaves 3.5.
  it("works out the screws' engagement in the vise", () => {
    expect(analysis<Record<string, number>>(e, "screwThread").recommendedEngagementMm).toBe(9);
    expect(check(e, "thread-engagement")).toMatch(/10\.5 mm into the vise; about 9 mm/);
    expect(check(e, "screw-not-bottoming")).toMatch(/3\.5 mm short/);
    expect(check(e, "counterbore-wall")).toMatch(/leave 5\.5 mm of wall/);
  });

  // 100·12·30 = 36 000, less two counterbored holes (π/4·6.6²·12 + π/4·(11² − 6.6²)·6.5 each) and the step 100·3·10.
  it("has the jaw's volume worked out by hand", () => {
    const expected = 36000 - 2 * counterboredHole(6.6, 12, 11, 6.5) - 3000;
    expect(partVolumeMm3(part(e, "jaw"))).toBeCloseTo(expected, 6);
    // 6082 aluminium 2700 kg/m³ (from memory); two jaws.
    expect(summary(e, "jaw").massKg).toBeCloseTo(expected * 2700e-9, 9);
    expect(summary(e, "jaw").quantity).toBe(2);
  });
});

function check(e: ReturnType<typeof evaluate>, id: string): string {
  const c = e.checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c.message;
}

describe("soft jaws, other parameter sets", () => {
  // M8 in steel jaws 16 thick, upright V 10 deep for a Ø25 bar.
  // ISO 4762 M8: k 8 → counterbore Ø15 × 8.5, clearance Ø9; wall behind 16 − 8.5 = 7.5 ≥ max(3, 4).
  // Engagement 8.5 + 20 − 16 = 12.5 ≥ 8 (steel vise, 1·d). V 90°: Ø25 contact 12.5/√2 = 8.84 ≤ 10 (on the flanks),
  // centre 12.5·√2 = 17.68 from the apex → 7.68 out of the face. V 10 deep: h²·tan45·30 = 3 000.
  it("M8 screws, steel jaws, upright V for a Ø25 bar", () => {
    const p = { screw: "M8", jawThickness: 16, screwSpacing: 80, screwHeight: 14, screwLength: 20, tappedDepth: 16, viseMaterial: "mild-steel", jawMaterial: "mild-steel", holding: "v-upright", roundDiameter: 25, vDepth: 10 };
    const e = evaluate(T, p);
    expect(failedAny(e)).toEqual([]);
    expect(analysis<Record<string, number>>(e, "cb").counterboreDiameterMm).toBe(15);
    expect(analysis<Record<string, number>>(e, "screwThread").recommendedEngagementMm).toBe(8);
    expect(analysis<Record<string, number>>(e, "vRound").contactAboveApexMm).toBeCloseTo(12.5 / Math.SQRT2, 9);
    expect(analysis<Record<string, number>>(e, "vRound").centreAboveApexMm! - 10).toBeCloseTo(12.5 * Math.SQRT2 - 10, 9);
    const expected = 100 * 16 * 30 - 2 * counterboredHole(9, 16, 15, 8.5) - 10 * 10 * 1 * 30;
    expect(partVolumeMm3(part(e, "jaw"))).toBeCloseTo(expected, 6);
    expect(summary(e, "jaw").massKg).toBeCloseTo(expected * 7850e-9, 9);
  });

  // M5 in a 120 × 35 × 14 jaw with a 50 × 14 pocket, R3 corners, 4 deep at 24 up. ISO 4762 M5: k 5 → Ø10 × 5.5,
  // clearance Ø5.5. Pocket to counterbore: screw at x 15, z 10, pocket centre x 60 → |60 − 15| − 25 = 20 along,
  // |24 − 10| − 7 = 7 up, hypot 21.19, less the counterbore radius 5 = 16.19 ≥ 2.
  // Pocket area 50·14 − (4 − π)·3² = 692.27, × 4 deep.
  it("M5 screws with a rectangular pocket", () => {
    const p = { screw: "M5", jawWidth: 120, jawHeight: 35, jawThickness: 14, screwSpacing: 90, screwHeight: 10, screwLength: 16, holding: "pocket-rect", pocketWidth: 50, pocketHeight: 14, pocketCornerRadius: 3, pocketDepth: 4, pocketCentreHeight: 24 };
    const e = evaluate(T, p);
    expect(failedAny(e)).toEqual([]);
    expect(check(e, "pocket-clear-of-screws")).toMatch(/at least 2 mm clear/);
    const pocketArea = 50 * 14 - (4 - Math.PI) * 9;
    const expected = 120 * 14 * 35 - 2 * counterboredHole(5.5, 14, 10, 5.5) - pocketArea * 4;
    expect(partVolumeMm3(part(e, "jaw"))).toBeCloseTo(expected, 6);
  });

  // A V along a 45 tall jaw for Ø16 bar, 6 deep at 32 up (its face width 12 runs from 26 to 38);
  // screws at 12 leave |32 − 12| − 5.5 − 6 = 8.5 ≥ 2. Volume of the V: 6²·tan45·100 = 3 600.
  it("a V-groove along the jaw", () => {
    const e = evaluate(T, { jawHeight: 45, holding: "v-along", roundDiameter: 16, vDepth: 6, vHeight: 32 });
    expect(failedAny(e)).toEqual([]);
    expect(check(e, "groove-clear-of-screws")).toMatch(/keeps 8\.5 mm clear/);
    expect(partVolumeMm3(part(e, "jaw"))).toBeCloseTo(100 * 12 * 45 - 2 * counterboredHole(6.6, 12, 11, 6.5) - 3600, 6);
  });

  it("uses only the chosen feature", () => {
    const kinds = (holding: string) => part(evaluate(T, { holding }), "jaw").features.map((f) => f.id ?? f.kind);
    expect(kinds("plain")).toEqual(["block", "screw-holes"]);
    expect(kinds("pocket-round")).toEqual(["block", "screw-holes", "round-pocket"]);
    expect(kinds("v-upright")).toEqual(["block", "screw-holes", "v-upright"]);
  });
});

describe("soft jaw checks pass and fail at their boundaries", () => {
  const at = (p: Record<string, unknown>, id: string) => passed(evaluate(T, p), id);

  // Wall behind the M6 counterbore = t − 6.5 ≥ 3 ⇔ t ≥ 9.5.
  it("counterbore-wall at a 9.5 thick jaw", () => {
    expect(at({ jawThickness: 9.5, screwLength: 12 }, "counterbore-wall")).toBe(true);
    expect(at({ jawThickness: 9.4, screwLength: 12 }, "counterbore-wall")).toBe(false);
  });

  // 6.5 + L − 12 ≥ 9 ⇔ L ≥ 14.5.
  it("thread-engagement at an M6 × 14.5", () => {
    expect(at({ screwLength: 14.5 }, "thread-engagement")).toBe(true);
    expect(at({ screwLength: 14 }, "thread-engagement")).toBe(false);
  });

  // 6.5 + L − 12 ≤ 14 − 1 ⇔ L ≤ 18.5.
  it("screw-not-bottoming at an M6 × 18.5", () => {
    expect(at({ screwLength: 18.5 }, "screw-not-bottoming")).toBe(true);
    expect(at({ screwLength: 19 }, "screw-not-bottoming")).toBe(false);
  });

  // Counterbore radius 5.5 + 2 ⇔ screw height ≥ 7.5.
  it("screws-on-jaw at 7.5 up", () => {
    expect(at({ holding: "plain", screwHeight: 7.5 }, "screws-on-jaw")).toBe(true);
    expect(at({ holding: "plain", screwHeight: 7 }, "screws-on-jaw")).toBe(false);
  });

  // 12 + 5.5 + 2 ⇔ step height ≥ 19.5.
  it("step-clear-of-screws at a 19.5 ledge", () => {
    expect(at({ stepHeight: 19.5 }, "step-clear-of-screws")).toBe(true);
    expect(at({ stepHeight: 19 }, "step-clear-of-screws")).toBe(false);
  });

  it("step-fits-jaw: 3 mm of face above the ledge and behind the step", () => {
    expect(at({ stepHeight: 27 }, "step-fits-jaw")).toBe(true);
    expect(at({ stepHeight: 27.5 }, "step-fits-jaw")).toBe(false);
    expect(at({ stepDepth: 9 }, "step-fits-jaw")).toBe(true);
    expect(at({ stepDepth: 9.5 }, "step-fits-jaw")).toBe(false);
  });

  // Upright V 8 deep (half width 8): spacing/2 − 5.5 − 8 ≥ 2 ⇔ spacing ≥ 31.
  it("groove-clear-of-screws at a 31 spacing", () => {
    expect(at({ holding: "v-upright", screwSpacing: 31 }, "groove-clear-of-screws")).toBe(true);
    expect(at({ holding: "v-upright", screwSpacing: 30.5 }, "groove-clear-of-screws")).toBe(false);
  });

  it("groove-fits-jaw: at most 3 mm short of the back", () => {
    expect(at({ holding: "v-upright", vDepth: 9, roundDiameter: 22 }, "groove-fits-jaw")).toBe(true);
    expect(at({ holding: "v-upright", vDepth: 9.5, roundDiameter: 22 }, "groove-fits-jaw")).toBe(false);
  });

  // Ø20 in 90°: contact 10/√2 = 7.071 from the apex — the V must be at least that deep; centre 14.142 — the V
  // must be at most 14.142 − 0.5 = 13.642 deep so the faces stay apart (20 thick jaw so the groove fits).
  it("round-grips between 7.071 and 13.642 deep", () => {
    const p = { holding: "v-upright", jawThickness: 20, screwLength: 24, tappedDepth: 20 };
    expect(at({ ...p, vDepth: 7 }, "round-grips")).toBe(false);
    expect(at({ ...p, vDepth: 7.1 }, "round-grips")).toBe(true);
    expect(at({ ...p, vDepth: 13.6 }, "round-grips")).toBe(true);
    expect(at({ ...p, vDepth: 13.7 }, "round-grips")).toBe(false);
  });

  // Rect pocket 12 high at the screws' height: |50 − 20| − w/2 − 5.5 ≥ 2 ⇔ w ≤ 45.
  it("pocket-clear-of-screws for a rectangular pocket at 45 wide", () => {
    const p = { holding: "pocket-rect", pocketCentreHeight: 12 };
    expect(at({ ...p, pocketWidth: 45 }, "pocket-clear-of-screws")).toBe(true);
    expect(at({ ...p, pocketWidth: 45.5 }, "pocket-clear-of-screws")).toBe(false);
  });

  // Round Ø16 at 18 up, screws at 12: hypot(s/2, 6) − 8 − 5.5 ≥ 2 ⇔ s ≥ 2·√(15.5² − 6²) = 28.58.
  it("pocket-clear-of-screws for a round pocket at a 28.58 spacing", () => {
    expect(at({ holding: "pocket-round", screwSpacing: 28.6 }, "pocket-clear-of-screws")).toBe(true);
    expect(at({ holding: "pocket-round", screwSpacing: 28.5 }, "pocket-clear-of-screws")).toBe(false);
  });

  it("pocket-fits-jaw: 3 mm all round and behind", () => {
    expect(at({ holding: "pocket-rect", pocketCentreHeight: 21 }, "pocket-fits-jaw")).toBe(true);
    expect(at({ holding: "pocket-rect", pocketCentreHeight: 21.5 }, "pocket-fits-jaw")).toBe(false);
    expect(at({ holding: "pocket-round", pocketDepth: 9 }, "pocket-fits-jaw")).toBe(true);
    expect(at({ holding: "pocket-round", pocketDepth: 9.5 }, "pocket-fits-jaw")).toBe(false);
  });
});
