/**
 * Golden tests for templates/clamps/strap-clamp.yaml. The force on the work is the lever rule of statics —
 * the stud's pull divides in the inverse ratio of the distances, F_work = F·b/(a + b) (Meriam & Kraige,
 * Engineering Mechanics: Statics, equilibrium of rigid bodies; from memory); the strap's stress is the flexure
 * formula with Z = (w − s)·t²/6 (Gere & Timoshenko, from memory); the stud's tension is T = K·F·d with
 * K = 0.2 (Shigley, from memory; common practice). T-slot and T-nut sizes: ISO 299 / DIN 508 (from memory).
 */
import { describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine";
import { analysis, builtIn, d1, evaluate, faceChamferMm3, failedAny, holeChamferMm3, part, passed } from "./catalogue-helpers";

const T = builtIn("clamps/strap-clamp.yaml");
const disc = (d: number) => (Math.PI / 4) * d * d;

describe("strap clamp at its defaults (12 mm slot, M10, 50 × 20 mild steel strap, 25 high work)", () => {
  const e = evaluate(T);

  it("passes every check", () => {
    expect(failedAny(e)).toEqual([]);
    expect(e.ok).toBe(true);
  });

  // 120 N × 0.170 m = 20.4 N·m; F = 20 400 N·mm / (0.2 × 10 mm) = 10 200 N. Lever rule, a 35, b 70:
  // work 10 200·70/105 = 6 800 N, heel 3 400 N. M = 6 800·35 = 238 000 N·mm; Z = (50 − 11)·20²/6 = 2 600 mm³
  // (slot 11 = ISO 273 medium for M10) → 91.54 MPa; allowable 235/2 = 117.5 MPa.
  it("works out the forces and the strap's stress by the lever rule", () => {
    const c = analysis<Record<string, number>>(e, "clamp");
    expect(e.derived.tighteningTorqueNm).toBeCloseTo(20.4, 9);
    expect(c.studForceN).toBeCloseTo(10200, 6);
    expect(c.workForceN).toBeCloseTo(6800, 6);
    expect(c.heelForceN).toBeCloseTo(3400, 6);
    expect(c.momentNmm).toBeCloseTo(238000, 4);
    expect(c.sectionModulusMm3).toBeCloseTo(2600, 9);
    expect(c.bendingStressMpa).toBeCloseTo(238000 / 2600, 6);
    // Friction 0.1 at the table: 680 N of sideways push.
    expect(c.holdingForceN).toBeCloseTo(680, 6);
  });

  // Steps 12, 20, 28, 36: the first at or above 25 is 28 (index 2); tilt atan(3/105) = 1.637° toward the work.
  it("picks the heel step and the strap's tilt", () => {
    expect(e.derived.heelStepIndex).toBe(2);
    expect(e.derived.heelHeight).toBe(28);
    expect(analysis<Record<string, number>>(e, "clamp").tiltDeg).toBeCloseTo((Math.atan(3 / 105) * 180) / Math.PI, 9);
  });

  // ISO 299, 12 mm slot: M10, lip ≥ 20 − 9 = 11; DIN 508 nut 18 × 20 × 14, head 7 (from memory).
  it("sizes the T-nut and the stud from the slot", () => {
    const nut = part(e, "t-nut");
    expect(nut.features[0]).toMatchObject({ size: { x: 18, y: 20, z: 14 } });
    // Stud: nut bottom 11 + 7 = 18 below the table, up to the strap top 25 + 20, washer 2, nut 8, two pitches 3 → 76 → 80.
    expect(part(e, "stud").features[0]).toMatchObject({ steps: [{ diameter: 10, length: 80 }] });
    expect(e.derived.strapLength).toBe(118);
  });

  // Strap 118·50·20 less the slot (30·11 + π/4·11²)·20 and the top chamfer; heel 64·50·36 less three treads
  // 16·50·(24 + 16 + 8); stud π/4·10²·80 less two end chamfers π·c²(R − c/3); T-nut 18·20·14 less two shoulders
  // 3.15·20·7 and the M10 tap-drill bore D1 = 10 − 1.082532·1.5 = 8.376 through 14 with a 0.5 chamfer.
  it("has every part's volume worked out by hand", () => {
    expect(partVolumeMm3(part(e, "strap"))).toBeCloseTo(118 * 50 * 20 - (30 * 11 + disc(11)) * 20 - faceChamferMm3(0.5, 118, 50), 6);
    expect(partVolumeMm3(part(e, "heel-block"))).toBeCloseTo(64 * 50 * 36 - 16 * 50 * (24 + 16 + 8), 6);
    expect(partVolumeMm3(part(e, "stud"))).toBeCloseTo(disc(10) * 80 - 2 * Math.PI * 0.25 * (5 - 0.5 / 3), 6);
    const bore = d1(10, 1.5);
    expect(partVolumeMm3(part(e, "t-nut"))).toBeCloseTo(18 * 20 * 14 - 2 * 3.15 * 20 * 7 - disc(bore) * 14 - holeChamferMm3(bore, 0.5), 6);
  });
});

describe("strap clamp, other parameter sets", () => {
  // 14 mm slot, M12 on a 200 mm spanner pulled with 200 N: 40 N·m → F = 40 000/(0.2·12) = 16 666.7 N.
  // a 40, b 60: work 10 000 N; M = 400 000; strap 50 × 25 free-cutting steel, slot 13.5 (M12 medium):
  // Z = 36.5·625/6 = 3 802.1 → 105.2 MPa ≤ 375/2. Work 40 high: steps 12…36 are all below it — the strap would
  // tip toward the heel (error); with five steps the top is 44: index ⌈28/8⌉ = 4, 4 above the work.
  it("14 mm slot and M12, a tall work piece", () => {
    const p = { tSlot: "14", stud: "M12", spannerForce: 200, spannerLength: 200, studToWork: 40, studToHeel: 60, strapThickness: 25, strapMaterial: "free-cutting-steel", workHeight: 40 };
    const four = evaluate(T, p);
    expect(passed(four, "strap-level")).toBe(false);
    expect(four.ok).toBe(false);
    const five = evaluate(T, { ...p, heelSteps: 5 });
    expect(failedAny(five)).toEqual([]);
    expect(five.derived.heelStepIndex).toBe(4);
    const c = analysis<Record<string, number>>(five, "clamp");
    expect(c.studForceN).toBeCloseTo(40000 / 2.4, 6);
    expect(c.workForceN).toBeCloseTo(10000, 6);
    expect(c.bendingStressMpa).toBeCloseTo(400000 / ((36.5 * 625) / 6), 6);
    expect(c.tiltDeg).toBeCloseTo((Math.atan(4 / 100) * 180) / Math.PI, 9);
    // ISO 299 14 mm slot → M12; DIN 508 nut 22 wide, 16 high.
    expect(part(five, "t-nut").features[0]).toMatchObject({ size: { x: 22, y: 25, z: 16 } });
  });

  // An M8 (one size down) suits the 12 slot; in class 4.6 a 200 N pull on 150 mm (30 N·m → 18 750 N,
  // As 36.6 mm² → 512 MPa) is far past its 225 MPa proof stress.
  it("M8 class 4.6 in a 12 mm slot: suits the slot, but over-stressed", () => {
    const e = evaluate(T, { stud: "M8", studClass: "4.6", spannerForce: 200, spannerLength: 150 });
    expect(passed(e, "bolt-suits-slot")).toBe(true);
    expect(analysis<Record<string, string>>(e, "tslot").boltVerdict).toBe("reduced");
    expect(passed(e, "stud-strength")).toBe(false);
    expect(analysis<Record<string, number>>(e, "clamp").studProofFraction).toBeCloseTo(18750 / 36.6 / 225, 6);
  });
});

describe("strap clamp checks pass and fail at their boundaries", () => {
  const at = (p: Record<string, unknown>, id: string) => passed(evaluate(T, p), id);

  it("bolt-suits-slot: M10 and M8 suit a 12 mm slot, M12 and M6 do not (ISO 299)", () => {
    expect(at({ stud: "M10" }, "bolt-suits-slot")).toBe(true);
    expect(at({ stud: "M8" }, "bolt-suits-slot")).toBe(true);
    expect(at({ stud: "M12" }, "bolt-suits-slot")).toBe(false);
    expect(at({ stud: "M6" }, "bolt-suits-slot")).toBe(false);
  });

  it("stud-nearer-work: a < b", () => {
    expect(at({ studToWork: 69, studToHeel: 70 }, "stud-nearer-work")).toBe(true);
    expect(at({ studToWork: 70, studToHeel: 70 }, "stud-nearer-work")).toBe(false);
  });

  // Top step 12 + 3·8 = 36.
  it("strap-level: the work no higher than the top step", () => {
    expect(at({ workHeight: 36 }, "strap-level")).toBe(true);
    expect(at({ workHeight: 36.5 }, "strap-level")).toBe(false);
  });

  // Rise 10: work 12.5 → heel 22, 9.5 above over 105: 5.17°; work 12.9 → 9.1: 4.95°.
  it("strap-tilt at 5°", () => {
    expect(at({ stepRise: 10, workHeight: 12.9 }, "strap-tilt")).toBe(true);
    expect(at({ stepRise: 10, workHeight: 12.5 }, "strap-tilt")).toBe(false);
  });

  // σ = (P·170/(0.2·10))·(70/105)·35 / 2 600 = 0.762 82·P MPa ≤ 117.5 ⇔ P ≤ 154.03 N.
  it("strap-stress at a 154 N pull", () => {
    expect(at({ spannerForce: 154 }, "strap-stress")).toBe(true);
    expect(at({ spannerForce: 154.5 }, "strap-stress")).toBe(false);
  });

  // F ≤ 0.75 × 580 × 58 = 25 230 N ⇔ P·170/2 ≤ 25 230 ⇔ P ≤ 296.8 N.
  it("stud-strength at 75 % of the M10 8.8 proof load", () => {
    expect(at({ spannerForce: 296 }, "stud-strength")).toBe(true);
    expect(at({ spannerForce: 298 }, "stud-strength")).toBe(false);
  });
});
