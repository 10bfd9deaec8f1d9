/**
 * Golden tests for templates/parallels/matched-parallels.yaml. Volumes and masses by hand (catalogue
 * densities: tool steel 7800, mild steel 7850, 6082 aluminium 2700 kg/m³, from memory); bridging deflection
 * by the simply supported beam with a centre load, δ = F·L³/(48·E·I), I = b·h³/12 (Roark's Table 8.1, from
 * memory; any mechanics of materials text), E 210 GPa for steel; allowances are the common-practice figures
 * the template states.
 */
import { describe, expect, it } from "vitest";
import { partVolumeMm3 } from "@/engine";
import { formatter } from "@/engine/drawing/format";
import { renderNote } from "@/engine/drawing/sheet/noteText";
import { analysis, builtIn, evaluate, faceChamferMm3, failedAny, part, passed, summary } from "./catalogue-helpers";

/** A part's notes as a sheet in these units prints them (lengths without a unit symbol, ISO 129-1). */
const shown = (notes: string[] | undefined, units: "mm" | "in" = "mm") => (notes ?? []).map((n) => renderNote(n, formatter(units))).join(" ");

const T = builtIn("parallels/matched-parallels.yaml");
const disc = (d: number) => (Math.PI / 4) * d * d;
/** One parallel L × t × h with n through holes Ø d and 0.2 edge breaks on its top and bottom faces. */
const parallelVolume = (L: number, t: number, h: number, n: number, d: number) => L * t * h - n * disc(d) * t - 2 * faceChamferMm3(0.2, L, t);

describe("matched parallels at their defaults (4 pairs 16–28 × 8 × 150, tool steel, 4 × Ø6 relief holes)", () => {
  const e = evaluate(T);

  it("passes every check and makes four pairs", () => {
    expect(failedAny(e)).toEqual([]);
    expect(e.parts.map((p) => p.id)).toEqual(["pair-1", "pair-2", "pair-3", "pair-4"]);
    expect(e.partSummaries.map((s) => s.quantity)).toEqual([2, 2, 2, 2]);
    expect(e.partSummaries.map((s) => s.bboxMm.z)).toEqual([16, 20, 24, 28]);
  });

  // Each: 150·8·h − 4·π/4·6²·8 − 2·(0.2²/2·2(150 + 8) − 4·0.2³/3); mass at 7800 kg/m³.
  it("has each parallel's volume and weight worked out by hand", () => {
    [16, 20, 24, 28].forEach((h, i) => {
      const v = parallelVolume(150, 8, h, 4, 6);
      expect(partVolumeMm3(part(e, `pair-${i + 1}`))).toBeCloseTo(v, 6);
      expect(summary(e, `pair-${i + 1}`).massKg).toBeCloseTo(v * 7800e-9, 9);
    });
    // The whole set, eight parallels: 2·Σ.
    const set = e.partSummaries.reduce((s, p) => s + p.quantity * (p.massKg ?? NaN), 0);
    expect(set).toBeCloseTo(2 * [16, 20, 24, 28].reduce((s, h) => s + parallelVolume(150, 8, h, 4, 6), 0) * 7800e-9, 9);
  });

  // Tool steel: 0.3 per face to grind off after hardening → stock 8.6 thick, 16.6–28.6 wide, 150.6 long.
  it("gives the stock with its grinding allowance", () => {
    expect([e.derived.stockThickness, e.derived.stockLowest, e.derived.stockTallest, e.derived.stockLength]).toEqual([8.6, 16.6, 28.6, 150.6]);
    expect(summary(e, "pair-1").stock).toMatchObject({ form: "flat", thicknessMm: 8.6, widthMm: 16.6, lengthMm: 150.6 });
    expect(part(e, "pair-1").heatTreatment).toMatch(/Harden and temper/);
  });

  // δ = 500·60³/(48·210 000·8·16³/12) = 1.08e8 / 2.7525e10 = 0.003924 mm; σ = (F·L/4)·(h/2)/I = 7 500·8/2 730.7 = 21.97 MPa.
  it("works out how far the lowest parallel bends over a 60 gap under 500 N", () => {
    const b = analysis<Record<string, number>>(e, "bridging");
    const I = (8 * 16 ** 3) / 12;
    expect(b.deflectionMm).toBeCloseTo((500 * 60 ** 3) / (48 * 210000 * I), 12);
    expect(b.stressMpa).toBeCloseTo((((500 * 60) / 4) * 8) / I, 9);
  });

  it("states the matched-pair tolerance, parallelism and flatness on every drawing", () => {
    for (const p of e.parts) {
      const notes = shown(p.drawing?.notes);
      expect(notes).toMatch(/equal in height within 0\.005 over/);
      expect(notes).toMatch(/parallel within 0\.005 and each flat within 0\.003\./);
      // On an inch drawing (1 in = 25.4 mm): 0.005 mm = .0002, 0.003 mm = .0001, 0.02 mm = .0008.
      const inch = shown(p.drawing?.notes, "in");
      expect(inch).toMatch(/equal in height within \.0002 over/);
      expect(inch).toMatch(/parallel within \.0002 and each flat within \.0001\./);
      expect(inch).toContain("within ±.0008;");
    }
  });
});

describe("matched parallels, other parameter sets", () => {
  // Mild steel, 3 pairs 20/25/30 × 10 × 100, no holes: 0.2 per face → allowance 0.4.
  // Deflection over 80 under 1 000 N: I = 10·20³/12 = 6 666.7; δ = 1 000·80³/(48·210 000·6 666.7) = 0.007619.
  it("mild steel, three pairs without holes", () => {
    const e = evaluate(T, { material: "mild-steel", pairCount: 3, parallelThickness: 10, firstHeight: 20, heightStep: 5, parallelLength: 100, reliefHoles: false, supportSpan: 80, downForce: 1000, pairTolerance: "0.01" });
    expect(failedAny(e)).toEqual([]);
    [20, 25, 30].forEach((h, i) => {
      const v = 100 * 10 * h - 2 * faceChamferMm3(0.2, 100, 10);
      expect(partVolumeMm3(part(e, `pair-${i + 1}`))).toBeCloseTo(v, 6);
      expect(summary(e, `pair-${i + 1}`).massKg).toBeCloseTo(v * 7850e-9, 9);
    });
    expect(e.derived.stockThickness).toBeCloseTo(10.4, 9);
    expect(analysis<Record<string, number>>(e, "bridging").deflectionMm).toBeCloseTo((1000 * 80 ** 3) / (48 * 210000 * ((10 * 20 ** 3) / 12)), 12);
    expect(part(e, "pair-1").heatTreatment).toBe("None.");
    expect(e.checks.some((c) => c.id === "length-slenderness")).toBe(false);
  });

  // Aluminium, 6 pairs 10–20 × 6 × 100, 3 × Ø4 holes, least web 3: web (10 − 4)/2 = 3. E 70 GPa (6082, from memory).
  // A 0.005 tolerance is finer than milled aluminium holds (0.01): warning.
  it("aluminium, six pairs, fine tolerance refused", () => {
    const e = evaluate(T, { material: "aluminium-6082", pairCount: 6, parallelThickness: 6, firstHeight: 10, heightStep: 2, parallelLength: 100, holeCount: 3, holeDiameter: 4, minWeb: 3, downForce: 100, supportSpan: 40 });
    expect(e.parts).toHaveLength(6);
    expect(e.derived.h6).toBe(20);
    expect(passed(e, "relief-web")).toBe(true);
    expect(passed(e, "tolerance-suits-finish")).toBe(false);
    expect(e.ok).toBe(true); // a warning, not an error
    expect(partVolumeMm3(part(e, "pair-6"))).toBeCloseTo(parallelVolume(100, 6, 20, 3, 4), 6);
    expect(summary(e, "pair-6").massKg).toBeCloseTo(parallelVolume(100, 6, 20, 3, 4) * 2700e-9, 9);
    expect(analysis<Record<string, number>>(e, "bridging").deflectionMm).toBeCloseTo((100 * 40 ** 3) / (48 * 70000 * ((6 * 10 ** 3) / 12)), 12);
    expect(e.derived.stockThickness).toBe(7);
    expect(part(e, "pair-1").finish).toMatch(/Fly-cut/);
  });
});

describe("matched parallel checks pass and fail at their boundaries", () => {
  const at = (p: Record<string, unknown>, id: string) => passed(evaluate(T, p), id);

  // Tallest = first + 3·4; tallest/8 ≤ 8 ⇔ first ≤ 52.
  it("slenderness at 8 × the thickness", () => {
    expect(at({ firstHeight: 52 }, "slenderness")).toBe(true);
    expect(at({ firstHeight: 52.5 }, "slenderness")).toBe(false);
  });

  it("length-slenderness at 30 × the thickness (tool steel)", () => {
    expect(at({ parallelThickness: 5, parallelLength: 150 }, "length-slenderness")).toBe(true);
    expect(at({ parallelThickness: 5, parallelLength: 151 }, "length-slenderness")).toBe(false);
  });

  // (16 − d)/2 ≥ 4 ⇔ d ≤ 8.
  it("relief-web at Ø8 in the 16 high pair", () => {
    expect(at({ holeDiameter: 8 }, "relief-web")).toBe(true);
    expect(at({ holeDiameter: 8.5 }, "relief-web")).toBe(false);
  });

  // Ten Ø6 holes: (L/10 − 6)/2 ≥ 4 ⇔ L ≥ 140.
  it("relief-spacing at a 14 pitch", () => {
    expect(at({ holeCount: 10, parallelLength: 140 }, "relief-spacing")).toBe(true);
    expect(at({ holeCount: 10, parallelLength: 139 }, "relief-spacing")).toBe(false);
  });

  // δ ≤ 0.005 ⇔ F ≤ 0.005·48·210 000·2 730.67/60³ = 637.2 N.
  it("bridging-deflection at 637 N over 60", () => {
    expect(at({ downForce: 630 }, "bridging-deflection")).toBe(true);
    expect(at({ downForce: 645 }, "bridging-deflection")).toBe(false);
  });

  it("tolerance-suits-finish: aluminium holds 0.01, steel 0.002", () => {
    expect(at({ material: "aluminium-6082", pairTolerance: "0.01" }, "tolerance-suits-finish")).toBe(true);
    expect(at({ material: "aluminium-6082", pairTolerance: "0.005" }, "tolerance-suits-finish")).toBe(false);
    expect(at({ pairTolerance: "0.002" }, "tolerance-suits-finish")).toBe(true);
  });

  it.each([
    ["0.002", "0.001"],
    ["0.01", "0.005"],
    ["0.02", "0.01"],
  ])("the drawing notes follow a %s mm pair tolerance", (tol, flat) => {
    const notes = shown(evaluate(T, { pairTolerance: tol }).parts[0]!.drawing?.notes);
    expect(notes).toContain(`equal in height within ${tol} over`);
    expect(notes).toContain(`parallel within ${tol} and each flat within ${flat}.`);
  });

  it("drops the holes when they are not wanted", () => {
    const e = evaluate(T, { reliefHoles: false, holeDiameter: 15 });
    expect(part(e, "pair-1").features.map((f) => f.kind)).toEqual(["block", "chamfer"]);
    expect(e.checks.some((c) => c.id === "relief-web")).toBe(false);
  });
});
