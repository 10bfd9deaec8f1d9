/**
 * Golden tests of the solid builders: each feature kind alone on a plain base, built by OpenCascade, must
 * agree with the engine's analytic volume and bounding box (src/engine/parts/analytic.ts) within 0.5 %,
 * the tolerance the product brief sets. Where a closed form is short, the expected value is also written
 * out by hand with its textbook formula (volume of a cylinder, prism, frustum; Pappus for rings).
 */
import { beforeAll, describe, expect, it } from "vitest";
import type { ResolvedFeature, ResolvedPart } from "@/engine/parts/features";
import { partBoundingBox, partVolumeMm3 } from "@/engine/parts/analytic";
import { buildPart, type BuiltPart } from "@server/kernel/build-part";
import { KernelError } from "@server/kernel/errors";
import { loadKernel, type LoadedKernel } from "@server/kernel/oc";
import { validatePartForKernel } from "@server/kernel/validate";

let kernel: LoadedKernel;
beforeAll(async () => {
  kernel = await loadKernel();
});

const PI = Math.PI;
const BLOCK: ResolvedFeature = { kind: "block", size: { x: 60, y: 30, z: 20 } };
const DISC: ResolvedFeature = { kind: "turned", steps: [{ diameter: 20, length: 10 }] };
const SHAFT: ResolvedFeature = { kind: "turned", steps: [{ diameter: 16, length: 12 }, { diameter: 10, length: 20 }] };

const part = (...features: ResolvedFeature[]): ResolvedPart => ({ id: "test-part", name: "Test part", material: "mild-steel", features });

function build(p: ResolvedPart): BuiltPart {
  return buildPart(kernel, p);
}

/** Kernel volume and box against the engine's analytic ones, within 0.5 %; returns the built part (caller deletes). */
function expectAnalytic(p: ResolvedPart, handVolumeMm3?: number): BuiltPart {
  const built = build(p);
  const analytic = partVolumeMm3(p);
  expect(built.volumeMm3).toBeGreaterThan(0);
  expect(Math.abs(built.volumeMm3 - analytic) / analytic).toBeLessThan(0.005);
  if (handVolumeMm3 !== undefined) expect(Math.abs(built.volumeMm3 - handVolumeMm3) / handVolumeMm3).toBeLessThan(0.005);
  const box = partBoundingBox(p);
  const axes = ["x", "y", "z"] as const;
  axes.forEach((a, i) => {
    const tol = 0.005 * box.size[a];
    expect(Math.abs(built.bbox.min[i]! - box.min[a])).toBeLessThanOrEqual(tol);
    expect(Math.abs(built.bbox.max[i]! - box.max[a])).toBeLessThanOrEqual(tol);
  });
  return built;
}

function golden(name: string, p: ResolvedPart, hand?: number) {
  it(name, () => {
    expectAnalytic(p, hand).shape.delete();
  });
}

describe("base builders", () => {
  // V = x·y·z.
  golden("block 60 × 30 × 20", part(BLOCK), 60 * 30 * 20);
  // V = Σ π/4·D²·L over the steps.
  golden("turned two-step shaft", part(SHAFT), (PI / 4) * (16 * 16 * 12 + 10 * 10 * 20));
  it("turned steps are exact cylinders (the drawings take centre lines from them)", () => {
    const b = build(part(SHAFT));
    const types = b.shape.faces.map((f) => f.geomType);
    expect(types.filter((t) => t === "CYLINDRE")).toHaveLength(2);
    b.shape.delete();
  });
});

describe("hole", () => {
  // Through: π/4·d²·h.
  golden("through Ø5", part(BLOCK, { kind: "hole", at: { x: 15, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true }), 36000 - (PI / 4) * 25 * 20);
  golden("blind Ø6 × 12 from below", part(BLOCK, { kind: "hole", at: { x: 30, y: 15, z: 0 }, direction: "+z", diameter: 6, depth: 12 }), 36000 - (PI / 4) * 36 * 12);
  golden("from a side face (+x) with a 0.5 chamfer", part(BLOCK, { kind: "hole", at: { x: 60, y: 15, z: 10 }, direction: "-x", diameter: 4, depth: 15, chamfer: 0.5 }));
  // Counterbore Ø12 × 2 over Ø6.6 through (common practice: the counterbore takes a Ø12 flange).
  golden(
    "counterbore Ø12 × 2 over a Ø6.6 through hole",
    part(BLOCK, { kind: "hole", at: { x: 20, y: 15, z: 20 }, direction: "-z", diameter: 6.6, through: true, counterbore: { diameter: 12, depth: 2 } }),
    36000 - (PI / 4) * (6.6 * 6.6 * 20 + (144 - 6.6 * 6.6) * 2),
  );
  golden("counterbore with its edge chamfered", part(BLOCK, { kind: "hole", at: { x: 20, y: 15, z: 20 }, direction: "-z", diameter: 5.5, depth: 15, counterbore: { diameter: 10, depth: 5 }, chamfer: 0.5 }));
  // Countersink 90°, Ø10 over Ø5.5: cone depth (10 − 5.5)/2 = 2.25; frustum V = π·t/12·(D² + Dd + d²).
  golden(
    "countersink Ø10 × 90° over Ø5.5 through",
    part(BLOCK, { kind: "hole", at: { x: 40, y: 15, z: 20 }, direction: "-z", diameter: 5.5, through: true, countersink: { diameter: 10 } }),
    36000 - ((PI / 4) * 5.5 * 5.5 * (20 - 2.25) + ((PI * 2.25) / 12) * (100 + 55 + 5.5 * 5.5)),
  );
  golden("axial hole in a turned part", part(SHAFT, { kind: "hole", at: { x: 0, y: 0, z: 32 }, direction: "-z", diameter: 4, depth: 10, chamfer: 0.3 }));
  golden("radial cross hole through a shaft", part(SHAFT, { kind: "hole", at: { x: 0, y: 0, z: 22 }, direction: "-x", diameter: 3, through: true }));
  golden("radial cross hole, blind, off centre", part(SHAFT, { kind: "hole", at: { x: 0, y: 1, z: 6 }, direction: "+x", diameter: 4, depth: 9 }));
  it("hole faces are exact cylinders and cones", () => {
    const b = build(part(BLOCK, { kind: "hole", at: { x: 40, y: 15, z: 20 }, direction: "-z", diameter: 5.5, depth: 10, chamfer: 1 }));
    const types = b.shape.faces.map((f) => f.geomType);
    expect(types).toContain("CYLINDRE");
    expect(types).toContain("CONE");
    b.shape.delete();
  });
});

describe("thread", () => {
  it("internal M6 × 10: tap-drill hole of the minor diameter and a cosmetic record", () => {
    const p = part(BLOCK, { kind: "thread", form: "internal", at: { x: 30, y: 15, z: 20 }, direction: "-z", designation: "M6", depth: 10 });
    const b = expectAnalytic(p);
    expect(b.threads).toHaveLength(1);
    const t = b.threads[0]!;
    // ISO 261: M6 coarse pitch 1 mm; ISO 724: D1 = 4.917 mm (from memory); drill 3 pitches deeper (common practice).
    expect(t.designation).toBe("M6");
    expect(t.pitchMm).toBe(1);
    expect(t.nominalDiameterMm).toBe(6);
    expect(t.minorDiameterMm).toBeCloseTo(4.917, 3);
    expect(t.lengthMm).toBe(10);
    expect(t.form).toBe("internal");
    expect(t.direction).toEqual({ x: 0, y: 0, z: -1 });
    expect(t.origin).toEqual({ x: 30, y: 15, z: 20 });
    // Removed: a Ø4.917 bore 13 deep (π/4·d²·h).
    expect(b.volumeMm3).toBeCloseTo(36000 - (PI / 4) * 4.9174682 ** 2 * 13, 0);
    b.shape.delete();
  });
  golden("internal M4 through with a 0.3 chamfer", part(BLOCK, { kind: "thread", form: "internal", at: { x: 10, y: 0, z: 10 }, direction: "+y", designation: "M4", through: true, chamfer: 0.3 }));
  golden("internal fine M8x0.75, drill depth given", part(BLOCK, { kind: "thread", form: "internal", at: { x: 30, y: 15, z: 0 }, direction: "+z", designation: "M8x0.75", depth: 8, drillDepth: 11 }));
  it("external M10 on a shaft step: the step stays at Ø10, the thread is recorded", () => {
    const p = part(SHAFT, { kind: "thread", form: "external", step: 1, designation: "M10", length: 15, from: "end" });
    const b = expectAnalytic(p, (PI / 4) * (16 * 16 * 12 + 10 * 10 * 20));
    const t = b.threads[0]!;
    // ISO 261: M10 coarse pitch 1.5; ISO 724: d3 = 8.160 mm (from memory).
    expect(t.pitchMm).toBe(1.5);
    expect(t.minorDiameterMm).toBeCloseTo(8.16, 2);
    expect(t.origin).toEqual({ x: 0, y: 0, z: 32 });
    expect(t.direction).toEqual({ x: 0, y: 0, z: -1 });
    expect(t.lengthMm).toBe(15);
    b.shape.delete();
  });
});

describe("slot, pocket, step, v-groove", () => {
  // Obround: (ℓ·w + π/4·w²)·depth.
  golden("slot 20 c/c × 6 wide × 4 deep along x", part(BLOCK, { kind: "slot", at: { x: 20, y: 15, z: 20 }, direction: "-z", along: "x", length: 20, width: 6, depth: 4 }), 36000 - (20 * 6 + (PI / 4) * 36) * 4);
  golden("through slot from the front face along z", part(BLOCK, { kind: "slot", at: { x: 30, y: 0, z: 6 }, direction: "+y", along: "z", length: 8, width: 5, through: true }));
  // Rounded rectangle: (u·v − (4 − π)·r²)·depth.
  golden("rect pocket 20 × 10, r2, 3 deep", part(BLOCK, { kind: "pocket", at: { x: 30, y: 15, z: 0 }, direction: "+z", shape: { kind: "rect", u: 20, v: 10, cornerRadius: 2 }, depth: 3 }), 36000 - (200 - (4 - PI) * 4) * 3);
  golden("sharp rect pocket on a side face", part(BLOCK, { kind: "pocket", at: { x: 0, y: 15, z: 10 }, direction: "+x", shape: { kind: "rect", u: 12, v: 8 }, depth: 2 }), 36000 - 12 * 8 * 2);
  golden("round recess Ø12 × 2", part(BLOCK, { kind: "pocket", at: { x: 30, y: 15, z: 20 }, direction: "-z", shape: { kind: "round", diameter: 12 }, depth: 2 }), 36000 - (PI / 4) * 144 * 2);
  golden("step 10 × 30 × 5 off one end", part(BLOCK, { kind: "step", from: { x: 50, y: 0, z: 15 }, to: { x: 60, y: 30, z: 20 } }), 36000 - 10 * 30 * 5);
  // V of included angle θ, depth h, length ℓ: h²·tan(θ/2)·ℓ.
  golden("90° v-groove 3 deep along x", part(BLOCK, { kind: "v-groove", at: { x: 30, y: 15, z: 20 }, direction: "-z", along: "x", angleDeg: 90, depth: 3 }), 36000 - 9 * 60);
  golden("60° v-groove on a side face along z", part(BLOCK, { kind: "v-groove", at: { x: 30, y: 30, z: 10 }, direction: "-y", along: "z", angleDeg: 60, depth: 2 }));
});

describe("chamfer", () => {
  // Four edges of the top face: Σ c²/2·ℓ − 4·c³/3 at the mitred corners.
  golden("1 mm on the top face of a block", part(BLOCK, { kind: "chamfer", size: 1, faces: ["+z"] }), 36000 - (0.5 * (60 + 60 + 30 + 30) - (4 * 1) / 3));
  golden("0.5 mm on top and one end", part(BLOCK, { kind: "chamfer", size: 0.5, faces: ["+z", "+x"] }));
  // Pappus: ring of triangle c²/2 at centroid radius R − c/3.
  golden("0.5 mm on both ends of a disc", part(DISC, { kind: "chamfer", size: 0.5, faces: ["+z", "-z"] }), (PI / 4) * 400 * 10 - 2 * 2 * PI * (10 - 0.5 / 3) * 0.125);
});

describe("eccentric bore", () => {
  // Common practice: a Ø20 cam with 1 mm eccentricity and an 8 mm bore.
  golden("Ø8 through, e = 1", part(DISC, { kind: "eccentric-bore", eccentricity: 1, diameter: 8, through: true }), (PI / 4) * (400 - 64) * 10);
  golden("Ø8 with a Ø12 × 2 counterbore from the bottom, e = 1.5 at 30°", part(DISC, { kind: "eccentric-bore", eccentricity: 1.5, angleDeg: 30, diameter: 8, through: true, counterbore: { diameter: 12, depth: 2 }, from: "bottom" }));
  golden("blind Ø5 × 6 from the top", part(DISC, { kind: "eccentric-bore", eccentricity: 2, diameter: 5, depth: 6 }));
});

describe("patterns", () => {
  golden("3 × Ø4 holes, 15 apart", part(BLOCK, { kind: "pattern-linear", count: 3, spacing: { x: 15, y: 0, z: 0 }, feature: { kind: "hole", at: { x: 15, y: 15, z: 20 }, direction: "-z", diameter: 4, depth: 8 } }), 36000 - 3 * (PI / 4) * 16 * 8);
  golden("4 × M3 on a Ø14 circle", part(BLOCK, { kind: "pattern-circular", count: 4, centre: { x: 30, y: 15, z: 20 }, axis: "z", feature: { kind: "thread", form: "internal", at: { x: 37, y: 15, z: 20 }, direction: "-z", designation: "M3", depth: 6 } }));
  golden("6 holes on a disc, 60° apart", part(DISC, { kind: "pattern-circular", count: 6, centre: { x: 0, y: 0, z: 10 }, axis: "z", feature: { kind: "hole", at: { x: 6, y: 0, z: 10 }, direction: "-z", diameter: 2, through: true } }));
  it("a pattern of threads records one thread per copy, each at its own place", () => {
    const b = build(part(BLOCK, { kind: "pattern-circular", count: 4, centre: { x: 30, y: 15, z: 20 }, axis: "z", feature: { kind: "thread", form: "internal", at: { x: 37, y: 15, z: 20 }, direction: "-z", designation: "M3", depth: 6 } }));
    expect(b.threads.map((t) => [Math.round(t.origin.x), Math.round(t.origin.y)])).toEqual([[37, 15], [30, 22], [23, 15], [30, 8]]);
    b.shape.delete();
  });
});

describe("a whole part: every kind together", () => {
  it("a stop body with holes, thread, slot, recess, groove and chamfer matches the analytic volume", () => {
    const p = part(
      BLOCK,
      { kind: "hole", at: { x: 10, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true, chamfer: 0.5, fit: "H7", finish: "reamed" },
      { kind: "thread", form: "internal", at: { x: 0, y: 15, z: 10 }, direction: "+x", designation: "M6", depth: 10 },
      { kind: "slot", at: { x: 24, y: 15, z: 20 }, direction: "-z", along: "x", length: 12, width: 6, depth: 4 },
      { kind: "pocket", at: { x: 30, y: 15, z: 0 }, direction: "+z", shape: { kind: "rect", u: 16, v: 10, cornerRadius: 2 }, depth: 3 },
      { kind: "v-groove", at: { x: 30, y: 30, z: 10 }, direction: "-y", along: "x", angleDeg: 90, depth: 2 },
      { kind: "chamfer", size: 0.5, faces: ["+z"] },
    );
    const b = expectAnalytic(p);
    expect(b.shape.solids).toHaveLength(1);
    b.shape.delete();
  });
  it("features switched off with when: false are not built", () => {
    const p = part(BLOCK, { kind: "hole", when: false, at: { x: 10, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true });
    const b = build(p);
    expect(b.volumeMm3).toBeCloseTo(36000, 3);
    b.shape.delete();
  });
});

describe("refused and failed parts name the part, the feature and its values", () => {
  const refused = (p: ResolvedPart): KernelError => {
    try {
      validatePartForKernel(p);
    } catch (err) {
      return err as KernelError;
    }
    throw new Error("expected the guard to refuse the part");
  };

  it("a zero-size block is refused before any kernel call", () => {
    const err = refused(part({ kind: "block", size: { x: 0, y: 30, z: 20 } }));
    expect(err).toBeInstanceOf(KernelError);
    expect(err.code).toBe("kernel_input");
    expect(err.message).toContain('Part "test-part"');
    expect(err.message).toContain("feature 0 (block)");
    expect(err.message).toContain("size.x");
    expect(err.details.featureIndex).toBe(0);
  });
  it("a NaN diameter is refused", () => {
    const err = refused(part(BLOCK, { kind: "hole", at: { x: 10, y: 15, z: 20 }, direction: "-z", diameter: Number.NaN, through: true }));
    expect(err.code).toBe("kernel_input");
  });
  it("a blind hole without a depth, and a counterbore narrower than its hole, are refused", () => {
    expect(refused(part(BLOCK, { kind: "hole", at: { x: 10, y: 15, z: 20 }, direction: "-z", diameter: 5 })).message).toMatch(/depth/);
    expect(refused(part(BLOCK, { kind: "hole", at: { x: 10, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true, counterbore: { diameter: 4, depth: 2 } })).message).toMatch(/counterbore diameter/);
  });
  it("an unknown thread designation is refused", () => {
    expect(refused(part(BLOCK, { kind: "thread", form: "internal", at: { x: 30, y: 15, z: 20 }, direction: "-z", designation: "1/4-20 UNC", depth: 8 })).message).toMatch(/ISO metric/);
  });
  it("a hole larger than the block leaves pieces: kernel_invalid names the hole", () => {
    const p = part(BLOCK, { kind: "hole", id: "big-hole", at: { x: 30, y: 15, z: 20 }, direction: "-z", diameter: 40, through: true });
    expect(() => build(p)).toThrowError(KernelError);
    try {
      build(p);
    } catch (err) {
      const e = err as KernelError;
      expect(e.code).toBe("kernel_invalid");
      expect(e.message).toContain('feature 1 (hole "big-hole")');
      expect(e.message).toContain("separate pieces");
      expect(e.message).toContain("diameter=40");
      expect(e.details).toMatchObject({ partId: "test-part", featureIndex: 1, featureKind: "hole", featureId: "big-hole" });
    }
  });
  it("a bore larger than the disc leaves nothing: kernel_invalid", () => {
    const p = part(DISC, { kind: "eccentric-bore", eccentricity: 0, diameter: 30, through: true });
    let e: KernelError | undefined;
    try {
      build(p);
    } catch (err) {
      e = err as KernelError;
    }
    expect(e?.code).toBe("kernel_invalid");
    expect(e?.message).toMatch(/feature 1 \(eccentric-bore\).*nothing solid is left/);
  });
});
