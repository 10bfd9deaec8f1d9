/**
 * Golden tests of the cam-lock vise stop: the built-in template at its defaults and at two other settings,
 * with every expected value worked out by hand in the comments (formulas from the template, the cam model's
 * moment balance, beam and fit formulas), and the sources named.
 *
 * Cam (circular, D = 2R, eccentricity e, pivot Ø d, friction μc at the jaw, μp in the pivot), see
 * src/engine/calculators/eccentric-cam/model.ts — textbook statics (Meriam & Kraige, friction, from memory):
 *   engagement φe = acos(1 − g/e); reach at engagement = R − e·cos φe;
 *   pivot friction-circle radius ρ = (d/2)·μp/√(1 + μp²), acting with √(1 + μc²): ρ·√(1 + μc²);
 *   lock margin = (μc·(R − e·cos φe) + ρ·√(1 + μc²)) / (e·sin φe) − 1;
 *   clamp force N = F·L / (e·sin φe + μc·(R − e·cos φe) + ρ·√(1 + μc²)).
 * Cantilever rod: δ = F·L³/(3EI), I = πd⁴/64; bending stress σ = 32·F·L/(πd³) (Roark, Table 8.1, from memory).
 */
import { beforeAll, describe, expect, it } from "vitest";
import { evaluateTemplate, type CompiledTemplate, type Evaluation } from "@/engine";
import { materials } from "@/engine/materials";
import { loadTemplateStore } from "@server/templates";

let stop: CompiledTemplate;
beforeAll(() => {
  stop = loadTemplateStore().get("cam-vise-stop")!;
});
const check = (e: Evaluation, id: string) => {
  const c = e.checks.find((x) => x.id === id);
  if (!c) throw new Error(`no check ${id}`);
  return c;
};
const cam = (e: Evaluation) => e.analyses.cam as Record<string, number | boolean>;
const E_TOOL = materials["tool-steel"].elasticModulusMpa; // 210 000 MPa in the catalogue

describe("defaults (a 100 mm hobby vise: 20 mm jaw; Ø20 cam, e = 1, Ø8 boss, 60 mm lever, 30 N)", () => {
  let e: Evaluation;
  beforeAll(() => {
    e = evaluateTemplate(stop, {});
  });

  it("passes every error check", () => {
    expect(e.ok).toBe(true);
    expect(e.buildable).toBe(true);
    expect(e.checks.filter((c) => c.severity === "error" && !c.passed)).toEqual([]);
  });

  it("sizes the body and the carrier slot", () => {
    // frontDepth = 2·8 + 3 = 19; pivotToFace = R − e + g = 10 − 1 + 1 = 10.
    // slotStart = max(lip + 10 + 10, 19 + 14/2 + 1) = max(26, 27) = 27; slotEnd = 55 − 18/2 − 2 = 44.
    // Jaws covered: 27 − 6 − 10 = 11 to 44 − 6 − 10 = 28 mm.
    expect(e.derived).toMatchObject({ pivotToFace: 10, slotStart: 27, slotEnd: 44, slotLength: 17, jawMinCovered: 11, jawMaxCovered: 28, bodyHeight: 46, bossLength: 8.05 });
    expect(check(e, "slot-covers-jaw").message).toBe("The carrier slot suits jaws 11 mm to 28 mm thick; your jaw is 20 mm.");
  });

  it("locks the cam by hand (common practice: Ø20 with 1 mm eccentricity, D/e = 20, locks well)", () => {
    const c = cam(e);
    expect(c.throwMm).toBe(2); // throw = 2e
    expect(c.engageAngleDeg).toBeCloseTo(90, 9); // acos(1 − 1/1)
    expect(c.riseAngleDeg).toBeCloseTo((Math.atan(1 / 10) * 180) / Math.PI, 9); // atan(e·sin φ/(R − e·cos φ)) = 5.711°
    expect(c.maxRiseAngleDeg).toBeCloseTo((Math.asin(0.1) * 180) / Math.PI, 9); // asin(e/R) = 5.739°
    // ρ·√(1 + μc²) = 4·0.1/√1.01·√1.01 = 0.4; resisting 0.1·10 + 0.4 = 1.4 against driving 1 → +40 %.
    expect(c.selfLockMargin).toBeCloseTo(0.4, 9);
    expect(c.selfLocking).toBe(true);
    expect(c.torqueNm).toBeCloseTo(1.8, 9); // 30 N × 0.06 m
    expect(c.clampForceN).toBeCloseTo(750, 6); // 1800 N·mm / (1 + 1.4) mm
    expect(check(e, "cam-self-locks").message).toBe("The cam holds by friction where it meets the jaw, with 40 % to spare (friction 0.1 at the jaw, 0.1 on the boss).");
    expect(check(e, "clamp-force").message).toBe("A 30 N push on the 60 mm lever gives about 1.8 N·m and presses the jaw with about 750 N when the cam locks.");
    expect(check(e, "engagement-in-zone").passed).toBe(true); // 90° inside 45°–135° (common practice)
    expect(check(e, "cam-ratio").passed).toBe(true); // D/e = 20 (handbook rule of thumb 14–20, from memory)
  });

  it("keeps the stop rod stiff and the lever strong", () => {
    // δ = 20·40³/(3·E·π·8⁴/64) = 1 280 000/(3·210 000·201.06) = 0.0101 mm ≤ 0.02.
    const I = (Math.PI * 8 ** 4) / 64;
    expect((e.analyses.rod as { deflectionMm: number }).deflectionMm).toBeCloseTo((20 * 40 ** 3) / (3 * E_TOOL * I), 9);
    expect(check(e, "rod-deflection").message).toBe("A 20 N bump at the tip bends the Ø8 mm rod, standing 40 mm out, by about 0.01 mm; your limit is 0.02 mm.");
    // Lever: M = 30·(60 − 10) = 1500 N·mm; σ = 32·1500/(π·5³) = 122.2 MPa; mild steel 235 MPa → 1.9×.
    expect((e.analyses.lever as { stressMpa: number }).stressMpa).toBeCloseTo((32 * 1500) / (Math.PI * 125), 9);
    expect(check(e, "lever-strength").message).toBe("A 30 N push stresses the Ø5 mm lever to about 122 MPa at the cam, 1.9 times below its yield strength.");
  });

  it("runs the cam on the boss and slides the rod in its holes (ISO 286-2)", () => {
    // ISO 286-2 (from memory), 6–10 mm: H7 +15/0 µm, g6 −5/−14 µm, h6 0/−9 µm.
    expect(e.analyses.bossFit).toMatchObject({ clearanceMin: expect.closeTo(0.005, 9) as unknown as number, clearanceMax: expect.closeTo(0.029, 9) as unknown as number });
    expect(check(e, "engine.fit.bossFit").message).toBe("Cam on the boss (H7/g6): clearance 0.005 mm to 0.029 mm (negative = interference) suits a running fit.");
    expect(check(e, "engine.fit.rodFit").message).toBe("Stop rod in its hole (H7/h6): clearance 0 mm to 0.024 mm (negative = interference) suits a sliding fit.");
  });

  it("stands the boss 0.05 proud and notes that ISO 2768-m allows more on its length", () => {
    // Common practice: the boss stands very slightly proud of the cam so the carrier clamps and the cam turns.
    expect(check(e, "boss-proud").passed).toBe(true);
    // ISO 2768-1 class m, over 6 up to 30 mm: ±0.2 mm (from memory) > 0.05 → a note to fit on assembly.
    expect(check(e, "boss-length-tolerance")).toMatchObject({ severity: "note", passed: false });
    expect(check(e, "boss-length-tolerance").message).toMatch(/±0.2 mm, ISO 2768-m/);
  });

  it("keeps the lever clear of the jaw", () => {
    // Released at 15 + 90 = 105°; clearance 10 + 60·min(sin 15°, sin 105°) − 2.5 = 23.0 mm ≥ 2.
    expect(cam(e).leverReleasedAngleDeg).toBeCloseTo(105, 9);
    expect(check(e, "lever-clears-jaw").message).toBe("The cam lever swings from 105° to 15° off the jaw's back face and stays clear of the jaw.");
  });

  it("has the hand-worked volumes and masses", () => {
    const vol = Object.fromEntries(e.partSummaries.map((p) => [p.id, p.volumeMm3]));
    // Body: 40·55·46 = 101 200, less recess 40·49·8 = 15 680, rear cut 40·36·28 = 40 320,
    // slot (17·4.5 + π·4.5²/4)·10 = 924.04, six Ø8 × 16 holes with 0.5 chamfers 6·(804.25 + 3.27) = 4845.12,
    // front-face chamfers 0.5²/2·(2·40 + 2·46) − 4·0.5³/3 = 21.33  →  39 409.5 mm³.
    expect(vol.body).toBeCloseTo(39409.5, 0);
    // Cam: π/4·20²·10 = 3141.59, less bore π/4·8²·10 = 502.65, counterbore π/4·(12² − 8²)·2 = 125.66,
    // lever hole ≈ 5·π·2.5² − π·2.5⁴/(4·20) = 96.63 (series of the chord), end chamfers 2π·0.5²·(10 − 0.5/3) = 15.45
    // → 2401.2 mm³.
    expect(vol.cam).toBeCloseTo(2401.2, 0);
    // Carrier: π/4·(12²·2 + 8²·8.05 + 4²·23.5) = 926.13, less end chamfers π·0.3²·(6 − 0.1) + π·0.3²·(2 − 0.1) = 2.21 → 923.9.
    expect(vol.carrier).toBeCloseTo(923.9, 0);
    // Washer: π/4·(14² − 4.3²)·1.5 = 209.1 mm³.
    expect(vol.washer).toBeCloseTo(209.1, 1);
    // Mass = density × volume: mild steel 7850 kg/m³ (EN 1993-1-1, from memory) → 0.309 kg.
    expect(e.partSummaries.find((p) => p.id === "body")!.massKg).toBeCloseTo(7850 * 39409.5e-9, 4);
    expect(e.partSummaries.map((p) => p.id)).toEqual(["body", "stop-rod", "carrier", "cam", "cam-lever", "washer", "lock-nut", "nut-lever"]);
  });

  it("places the parts on the ghost jaw", () => {
    expect(e.assembly.fixtures[0]).toEqual({ id: "fixed-jaw", label: "Fixed jaw (your vise)", positionMm: { x: 0, y: 0, z: -30 }, sizeMm: { x: 100, y: 20, z: 30 } });
    const body = e.parts.find((p) => p.id === "body")!;
    expect(body.placement?.position).toEqual({ x: 60, y: -6, z: -8 });
    // The carrier's axis is the pivot: jaw rear face (20) + pivot to face (10) = 30 behind the jaw front.
    expect(e.parts.find((p) => p.id === "carrier")!.placement?.position).toMatchObject({ x: 80, y: 30 });
  });
});

describe("a thick jaw and a large eccentricity (fails)", () => {
  // jawThickness 35 > 28 covered; e = 1.5, g = 1.5: φe = acos(0) = 90°, pivotToFace = 10 − 1.5 + 1.5 = 10.
  // Margin (0.1·10 + 0.4)/(1.5·1) − 1 = −0.0667 → the cam does not lock. D/e = 13.3 < 14.
  // Clamp force 1800/(1.5 + 1.4) = 620.7 N.
  let e: Evaluation;
  beforeAll(() => {
    e = evaluateTemplate(stop, { parameters: { jawThickness: 35, camEccentricity: 1.5, gap: 1.5 } });
  });

  it("reports the failures in shop language", () => {
    expect(e.ok).toBe(false);
    expect(check(e, "slot-covers-jaw")).toMatchObject({ passed: false });
    expect(check(e, "slot-covers-jaw").message).toBe("The carrier slot only suits jaws 11 mm to 28 mm thick, and your jaw is 35 mm. Make the body deeper.");
    expect(cam(e).selfLockMargin).toBeCloseTo(1.4 / 1.5 - 1, 9);
    expect(check(e, "cam-self-locks")).toMatchObject({ passed: false, severity: "error" });
    expect(check(e, "cam-self-locks").message).toBe(
      "The cam does not lock where it meets the jaw (margin -7 %): it can spring open. Use less eccentricity or a larger cam; D/e is 13.3.",
    );
    expect(check(e, "cam-ratio").passed).toBe(false);
    expect(cam(e).clampForceN).toBeCloseTo(1800 / 2.9, 6);
  });
});

describe("a larger vise, entered in inches", () => {
  // 1 in jaw = 25.4 mm; Ø1 in cam (R = 12.7), e = g = 0.05 in = 1.27 mm: φe = 90°, pivotToFace = 12.7.
  // Margin (0.1·12.7 + 0.4)/1.27 − 1 = 0.31496; clamp force 40·76.2/(1.27 + 1.67) = 1036.7 N.
  // Rod Ø0.375 in = 9.525 mm, reach 2 in = 50.8 mm, 30 N: δ = 30·50.8³/(3·E·π·9.525⁴/64) = 0.0155 mm.
  // Slot: frontDepth = 2·9.525 + 3 = 22.05; slotStart = max(6 + 10 + 12.7, 22.05 + 8) = 30.05;
  // slotEnd = 63.5 − 11 = 52.5; jaws 11.35–33.8 mm = 0.447–1.331 in.
  // Lever: σ = 32·40·(76.2 − 12.7)/(π·125) = 207.0 MPa; mild steel 235 → 1.14×, below 1.5: a warning.
  let e: Evaluation;
  beforeAll(() => {
    e = evaluateTemplate(stop, {
      units: "in",
      parameters: { jawThickness: 1, camDiameter: 1, camEccentricity: 0.05, gap: 0.05, stopRodDiameter: 0.375, stopRodReach: 2, bumpLoad: 30, leverLength: 3, handForce: 40, bodyDepth: 2.5 },
    });
  });

  it("evaluates in mm inside and answers in inches", () => {
    expect(e.units).toBe("in");
    expect(e.parameters.jawThickness).toBe(1);
    expect(e.parametersMm.jawThickness).toBe(25.4);
    expect(e.parametersMm.stopRodDiameter).toBe(9.525);
    expect(e.derived.jawMaxCovered).toBeCloseTo(33.8 / 25.4, 9);
    expect(check(e, "slot-covers-jaw").message).toBe("The carrier slot suits jaws 0.447 in to 1.331 in thick; your jaw is 1 in.");
  });

  it("has the hand-worked cam, rod and lever figures", () => {
    expect(cam(e).selfLockMargin).toBeCloseTo(1.67 / 1.27 - 1, 9);
    expect(cam(e).clampForceN).toBeCloseTo(3048 / 2.94, 6);
    const I = (Math.PI * 9.525 ** 4) / 64;
    expect((e.analyses.rod as { deflectionMm: number }).deflectionMm).toBeCloseTo((30 * 50.8 ** 3) / (3 * E_TOOL * I), 9);
    expect(check(e, "rod-deflection").passed).toBe(true);
    expect(check(e, "clamp-force").message).toBe("A 40 N (9 lbf) push on the 3 in lever gives about 3.05 N·m and presses the jaw with about 1037 N (233.1 lbf) when the cam locks.");
    expect((e.analyses.lever as { stressMpa: number }).stressMpa).toBeCloseTo((32 * 40 * 63.5) / (Math.PI * 125), 9);
    expect(check(e, "lever-strength")).toMatchObject({ severity: "warning", passed: false });
    expect(e.ok).toBe(true); // only a warning fails
  });

  it("resolves the parts in mm", () => {
    const rod = e.parts.find((p) => p.id === "stop-rod")!;
    // Rod length = hole depth 2·9.525 + reach 50.8 = 69.85 mm.
    expect(rod.features[0]).toEqual({ kind: "turned", steps: [{ diameter: 9.525, length: 69.85, fit: "h6" }] });
    expect(e.partSummaries.find((p) => p.id === "cam")!.bboxMm).toEqual({ x: 25.4, y: 25.4, z: 10 });
  });
});
