/**
 * Golden tests for templates/clamps/cam-edge-clamp.yaml. Cam figures are checked by a moment balance about
 * the pivot written out here (statics with the friction circle, Meriam & Kraige, from memory): at rotation φ
 * the cam's reach is R − e·cos φ, the lift e·(1 − cos φ), and a torque T balances N·(e·sin φ + μc·(R − e·cos φ)
 * + ρ·√(1 + μc²)) with the friction-circle radius ρ = r·sin(atan μp). Holding: T = K·F·d with K = 0.2
 * (Shigley, from memory; common practice) and Coulomb friction μ·F. T-slot: ISO 299 (from memory).
 */
import { describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine";
import { analysis, builtIn, d1, evaluate, faceChamferMm3, failedAny, holeChamferMm3, part, passed } from "./catalogue-helpers";

const T = builtIn("clamps/cam-edge-clamp.yaml");
const disc = (d: number) => (Math.PI / 4) * d * d;
const rad = (deg: number) => (deg * Math.PI) / 180;

/** Composite Simpson's rule on [a, b] with n (even) intervals: an independent check of the radial-hole volumes. */
function simpson(f: (x: number) => number, a: number, b: number, n = 20000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}
/** Blind radial hole of radius r, depth d at its axis, into a round of radius R (axis through the centre). */
const radialBlind = (R: number, r: number, d: number) => simpson((y) => 2 * Math.sqrt(Math.max(0, r * r - y * y)) * (Math.sqrt(R * R - y * y) - (R - d)), -r, r);
/** Through radial hole of radius r across a round of radius R. */
const radialThrough = (R: number, r: number) => simpson((y) => 2 * Math.sqrt(Math.max(0, r * r - y * y)) * 2 * Math.sqrt(R * R - y * y), -r, r);
/** Chamfer of leg c on the end of a round of radius R (Pappus): π·c²·(R − c/3). */
const endChamfer = (R: number, c: number) => Math.PI * c * c * (R - c / 3);

describe("cam edge clamp at its defaults (12 mm slot, M10, Ø32 × 1.6 cam, 80 mm lever, 40 N)", () => {
  const e = evaluate(T);

  it("passes every check", () => {
    expect(failedAny(e)).toEqual([]);
    expect(e.ok).toBe(true);
    expect(e.buildable).toBe(true);
  });

  // Gap 1.6 = e: cos φe = 1 − g/e = 0 → φe = 90°. Arms at 90°: e·sin 90 = 1.6; μc·(R − e·cos 90) = 0.1·16 = 1.6;
  // ρ√(1 + μc²) = 5·sin(atan 0.1)·√1.01 = 0.5000. T = 40 × 80 = 3 200 N·mm → N = 3 200 / 3.7 = 864.9 N.
  // Lock ratio (1.6 + 0.5)/1.6 = 1.3125 → 31 % margin.
  it("locks the cam, by a moment balance about the pivot", () => {
    const cam = analysis<Record<string, number>>(e, "cam");
    const rho = 5 * Math.sin(Math.atan(0.1)) * Math.sqrt(1.01);
    expect(cam.engageAngleDeg).toBeCloseTo(90, 9);
    expect(cam.throwMm).toBeCloseTo(3.2, 12);
    expect(cam.torqueNm).toBeCloseTo(3.2, 12);
    expect(cam.clampForceN).toBeCloseTo(3200 / (1.6 + 1.6 + rho), 6);
    expect(cam.selfLockMargin).toBeCloseTo((1.6 + rho) / 1.6 - 1, 9);
  });

  // 150 N × 0.170 m = 25.5 N·m → F = 25 500 / (0.2 × 10) = 12 750 N; friction 0.15 × 12 750 = 1 912.5 N;
  // against the cam's 864.9 N: 2.21. Stud stress 12 750 / 58 = 219.8 MPa, 37.9 % of 8.8's 580 MPa.
  it("holds the base by the stud's preload and friction", () => {
    const hold = analysis<Record<string, number>>(e, "hold");
    const cam = analysis<Record<string, number>>(e, "cam");
    expect(hold.preloadN).toBeCloseTo(12750, 6);
    expect(hold.holdingForceN).toBeCloseTo(1912.5, 6);
    expect(hold.safetyFactor).toBeCloseTo(1912.5 / cam.clampForceN!, 9);
    expect(hold.preloadFractionOfProof).toBeCloseTo(12750 / (580 * 58), 9);
  });

  // Pivot 90 − 12 = 78 from the back; cam low point reach 16 − 1.6 = 14.4 → 2.4 beyond the front edge;
  // the work's edge at 78 + 14.4 + 1.6 = 94. Slot from 10 + 2 = 12 to 78 − 17.6 − 10 − 2 = 48.4.
  it("lays out the base", () => {
    expect(e.derived.pivotY).toBe(78);
    expect(e.derived.camProud).toBeCloseTo(2.4, 9);
    expect(e.derived.faceY).toBeCloseTo(94, 9);
    expect(e.derived.slotBack).toBe(12);
    expect(e.derived.slotFront).toBeCloseTo(48.4, 9);
    expect(part(e, "base").features[1]).toMatchObject({ kind: "slot", width: 11, length: 48.4 - 12 });
  });

  // The cam's placement, by plane geometry: its disc centre C lies e from the pivot P at φe from the low point,
  // so the rim touches the work: faceY − C.y = R. Its bore (at angle β in the part, turned by the placement)
  // lands back on the pivot.
  it("places the cam touching the work with its bore on the pivot", () => {
    const cam = part(e, "cam");
    const C = cam.placement!.position;
    expect(94 - C.y).toBeCloseTo(16, 9);
    const bore = cam.features[1] as { angleDeg: number; eccentricity: number };
    const turn = cam.placement!.rotations![0]!.angleDeg;
    const bx = C.x + 1.6 * Math.cos(rad(bore.angleDeg + turn));
    const by = C.y + 1.6 * Math.sin(rad(bore.angleDeg + turn));
    expect(bx).toBeCloseTo(20, 9);
    expect(by).toBeCloseTo(78, 9);
  });

  it("has every part's volume worked out by hand", () => {
    // Base: 40·90·12, less the slot (36.4·11 + π/4·11²)·12, the M8 tap-drill bore D1 = 6.647 through 12 with a
    // 0.5 chamfer, and the top-face chamfer.
    const b8 = d1(8, 1.25);
    expect(partVolumeMm3(part(e, "base"))).toBeCloseTo(43200 - (36.4 * 11 + disc(11)) * 12 - disc(b8) * 12 - holeChamferMm3(b8, 0.5) - faceChamferMm3(0.5, 40, 90), 6);
    // Cam: π/4·32²·12 less the Ø10 bore, the Ø6 lever hole 8 deep (Simpson's rule over its section) and two end chamfers.
    expect(partVolumeMm3(part(e, "cam"))).toBeCloseTo(disc(32) * 12 - disc(10) * 12 - radialBlind(16, 3, 8) - 2 * endChamfer(16, 0.5), 3);
    // Pivot pin: Ø8 × 11 + Ø10 × 12.05 + Ø18 × 8, less the Ø4 tommy-bar hole across the head and two end chamfers.
    expect(partVolumeMm3(part(e, "pivot-pin"))).toBeCloseTo(disc(8) * 11 + disc(10) * 12.05 + disc(18) * 8 - radialThrough(9, 2) - endChamfer(4, 0.5) - endChamfer(9, 0.5), 3);
    // Lever: Ø6 × (80 − 16 + 8 + 5 = 77) with end chamfers; stud Ø10 × 45 (11 + 7 + 12 + 2 + 8 + 3 = 43 → 45).
    expect(partVolumeMm3(part(e, "lever"))).toBeCloseTo(disc(6) * 77 - 2 * endChamfer(3, 0.5), 6);
    expect(partVolumeMm3(part(e, "stud"))).toBeCloseTo(disc(10) * 45 - 2 * endChamfer(5, 0.5), 6);
  });
});

describe("cam edge clamp, other parameter sets", () => {
  // 14 mm slot with M12, a Ø40 × 2 cam on a Ø12 boss and M10 pivot, gap 1.2 (φe = acos(1 − 0.6) = 66.42°),
  // 100 mm lever of Ø8 rod, 50 N: T = 5 000 N·mm. Arms: 2·sin 66.42 = 1.8330; 0.1·(20 − 2·0.4) = 1.92; ρ' = 6·sin(atan 0.1)·√1.01 = 0.6.
  // N = 5 000/4.353 = 1 148.6 N. Stud 200 N × 0.2 m = 40 N·m → 16 666.7 N, μ 0.15 → 2 500 N: 2.18 times.
  it("a larger clamp on a 14 mm slot", () => {
    const p = { tSlot: "14", bolt: "M12", camDiameter: 40, camEccentricity: 2, bossDiameter: 12, pivotThread: "M10", gap: 1.2, leverLength: 100, leverRod: 8, handForce: 50, spannerForce: 200, spannerLength: 200, baseLength: 110, baseWidth: 50, pivotInset: 15, camThickness: 14, baseThickness: 14, workMinHeight: 20 };
    const e = evaluate(T, p);
    expect(failedAny(e)).toEqual([]);
    const phi = Math.acos(0.4);
    const arm = 2 * Math.sin(phi) + 0.1 * (20 - 2 * Math.cos(phi)) + 6 * Math.sin(Math.atan(0.1)) * Math.sqrt(1.01);
    const cam = analysis<Record<string, number>>(e, "cam");
    expect(cam.engageAngleDeg).toBeCloseTo((phi * 180) / Math.PI, 9);
    expect(cam.clampForceN).toBeCloseTo(5000 / arm, 6);
    const hold = analysis<Record<string, number>>(e, "hold");
    expect(hold.preloadN).toBeCloseTo(40000 / 2.4, 6);
    expect(hold.safetyFactor).toBeCloseTo((0.15 * 40000) / 2.4 / (5000 / arm), 9);
    expect(part(e, "t-nut").features[0]).toMatchObject({ size: { x: 25, y: 22, z: 16 } });
  });

  // An 8 mm slot with an M6 stud, pulled with 60 N on 100 mm: 6 N·m → 6 000/(0.2·6) = 5 000 N → 750 N of friction:
  // less than twice the cam's 865 N push, so the base does not hold (error).
  it("a small table slot cannot hold the default cam", () => {
    const e = evaluate(T, { tSlot: "8", bolt: "M6", spannerForce: 60, spannerLength: 100 });
    expect(passed(e, "bolt-suits-slot")).toBe(true);
    expect(analysis<Record<string, number>>(e, "hold").holdingForceN).toBeCloseTo(750, 6);
    expect(passed(e, "base-holds")).toBe(false);
    expect(e.ok).toBe(false);
  });
});

describe("cam edge clamp checks pass and fail at their boundaries", () => {
  const at = (p: Record<string, unknown>, id: string) => passed(evaluate(T, p), id);

  it("bolt-suits-slot: M10 suits 12 mm, M12 does not pass its throat", () => {
    expect(at({ bolt: "M10" }, "bolt-suits-slot")).toBe(true);
    expect(at({ bolt: "M12" }, "bolt-suits-slot")).toBe(false);
  });

  // With the gap = e (φe = 90°) the lock ratio is (μc·R + ρ')/e = 2.1/e ≥ 1 ⇔ e ≤ 2.1.
  it("cam-self-locks at e = 2.1 (gap = e)", () => {
    expect(at({ camEccentricity: 2.09, gap: 2.09 }, "cam-self-locks")).toBe(true);
    expect(at({ camEccentricity: 2.11, gap: 2.11 }, "cam-self-locks")).toBe(false);
  });

  // Over the zone the ratio is least at φ = 90° − atan μc: e ≤ 2.1 / (sin 84.29° + 0.1·cos 84.29°) = 2.1/1.004988 = 2.0896.
  it("cam-locks-over-zone at e = 2.0896", () => {
    expect(at({ camEccentricity: 2.08 }, "cam-locks-over-zone")).toBe(true);
    expect(at({ camEccentricity: 2.1 }, "cam-locks-over-zone")).toBe(false);
  });

  // φe = acos(1 − g/e) ≥ 45° ⇔ g ≥ e(1 − cos 45°) = 1.6 × 0.29289 = 0.4686.
  it("engagement-in-zone at a 0.4686 gap", () => {
    expect(at({ gap: 0.47 }, "engagement-in-zone")).toBe(true);
    expect(at({ gap: 0.46 }, "engagement-in-zone")).toBe(false);
  });

  // Handbook rule of thumb (from memory): D/e ≥ 14 ⇔ e ≤ 32/14 = 2.2857.
  it("cam-ratio at D/e = 14", () => {
    expect(at({ camEccentricity: 2.28 }, "cam-ratio")).toBe(true);
    expect(at({ camEccentricity: 2.3 }, "cam-ratio")).toBe(false);
  });

  // 0.15·P·170/2 ≥ 2·864.86 ⇔ P ≥ 135.66 N.
  it("base-holds at a 135.7 N pull on the spanner", () => {
    expect(at({ spannerForce: 136 }, "base-holds")).toBe(true);
    expect(at({ spannerForce: 135 }, "base-holds")).toBe(false);
  });

  // P·85·12 ≥ 2·864.86·18 ⇔ P ≥ 30.52 N.
  it("base-tipping at a 30.5 N pull", () => {
    expect(at({ spannerForce: 31 }, "base-tipping")).toBe(true);
    expect(at({ spannerForce: 30 }, "base-tipping")).toBe(false);
  });

  // P·85 ≤ 0.75·580·58 = 25 230 ⇔ P ≤ 296.8 N.
  it("bolt-strength at 75 % of the proof load", () => {
    expect(at({ spannerForce: 296 }, "bolt-strength")).toBe(true);
    expect(at({ spannerForce: 298 }, "bolt-strength")).toBe(false);
  });

  // 16 − 1.6 − inset ≥ 1 ⇔ inset ≤ 13.4.
  it("cam-proud-of-base at a 13.4 inset", () => {
    expect(at({ pivotInset: 13.4 }, "cam-proud-of-base")).toBe(true);
    expect(at({ pivotInset: 13.5 }, "cam-proud-of-base")).toBe(false);
  });

  // Travel = L − 12 − 17.6 − 12 − 12 ≥ 5 ⇔ L ≥ 58.6.
  it("slot-travel at a 58.6 long base", () => {
    expect(at({ baseLength: 58.6 }, "slot-travel")).toBe(true);
    expect(at({ baseLength: 58 }, "slot-travel")).toBe(false);
  });

  it("cam-meets-work: the thinnest work 3 mm above the base", () => {
    expect(at({ workMinHeight: 15 }, "cam-meets-work")).toBe(true);
    expect(at({ workMinHeight: 14.5 }, "cam-meets-work")).toBe(false);
  });

  // Lever 18 above the table; clearance 16 + 80·sin A − 3 ≥ 2 ⇔ A ≥ asin(−11/80) = −7.90°; work under 14 never meets it.
  it("lever-clears-work at −7.9°", () => {
    expect(at({ leverEndAngle: -7.5 }, "lever-clears-work")).toBe(true);
    expect(at({ leverEndAngle: -8.5 }, "lever-clears-work")).toBe(false);
    expect(at({ leverEndAngle: -8.5, workMaxHeight: 14, workMinHeight: 14 }, "lever-clears-work")).toBe(true);
  });

  it("boss-proud between 0 and 0.1 (common practice: a few hundredths)", () => {
    expect(at({ bossProud: 0 }, "boss-proud")).toBe(false);
    expect(at({ bossProud: 0.01 }, "boss-proud")).toBe(true);
    expect(at({ bossProud: 0.1 }, "boss-proud")).toBe(true);
    expect(at({ bossProud: 0.11 }, "boss-proud")).toBe(false);
  });

  it("pivot-shoulder: the boss 1.5 over the thread", () => {
    expect(at({ bossDiameter: 9.5 }, "pivot-shoulder")).toBe(true);
    expect(at({ bossDiameter: 9.4 }, "pivot-shoulder")).toBe(false);
  });

  // σ = 32·F·(80 − 16)/(π·6³) ≤ 235/1.5 ⇔ F ≤ 51.91 N (mild steel yield 235 MPa, EN 10025-2, from memory).
  it("lever-strength at a 51.9 N push", () => {
    expect(at({ handForce: 51.5 }, "lever-strength")).toBe(true);
    expect(at({ handForce: 52.5 }, "lever-strength")).toBe(false);
  });
});
