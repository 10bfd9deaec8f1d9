/**
 * The kernel's pure helpers: canonical JSON and the model cache key (must be identical on every process,
 * so it is pinned to an explicit text form and Node's SHA-256), and the assembly matrices (right-hand
 * rotations about fixed axes, column-major as three.js `Matrix4.fromArray` reads them).
 */
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalHash, canonicalJson, partShapeHash } from "./canonical";
import { MODEL_FORMAT_VERSION, modelCacheKey } from "./model-cache";
import { assemblyMatrix, explodedMatrix, transformPoint } from "./placement";
import { validatePartForKernel } from "./validate";
import { KernelError } from "./errors";

describe("canonical JSON", () => {
  it("sorts keys at every level, drops undefined members and writes -0 as 0", () => {
    expect(canonicalJson({ b: [2, { y: 1, x: -0 }], a: 1, c: undefined })).toBe('{"a":1,"b":[2,{"x":0,"y":1}]}');
  });
  it("gives the same text whatever order the keys were written in", () => {
    expect(canonicalJson({ jawWidth: 100, jawThickness: 20.5 })).toBe(canonicalJson({ jawThickness: 20.5, jawWidth: 100 }));
  });
  it("refuses non-finite numbers rather than writing null", () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(TypeError);
  });
  it("hashes with SHA-256 of that text (node:crypto)", () => {
    expect(canonicalHash({ b: 2, a: "x" })).toBe(createHash("sha256").update('{"a":"x","b":2}').digest("hex"));
  });
  it("the model cache key covers format, template, version and parameters", () => {
    const key = modelCacheKey("cam-vise-stop", "1.0.0", { jawWidth: 100, gap: 3 });
    const text = `{"format":${MODEL_FORMAT_VERSION},"parameters":{"gap":3,"jawWidth":100},"template":"cam-vise-stop","version":"1.0.0"}`;
    expect(key).toBe(createHash("sha256").update(text).digest("hex"));
    expect(modelCacheKey("cam-vise-stop", "1.0.1", { jawWidth: 100, gap: 3 })).not.toBe(key);
  });
  it("keys a part's solid and views on its shape, not on where the assembly puts it", () => {
    const cam = { id: "cam", name: "Cam", material: "tool-steel", features: [{ kind: "turned", steps: [{ diameter: 20, length: 8 }] }] };
    const placed = { ...cam, placement: { position: { x: 0, y: 12, z: 30 } }, explode: { x: 0, y: 0, z: 20 } };
    const moved = { ...cam, placement: { position: { x: 0, y: 19, z: 30 } } };
    expect(partShapeHash(placed)).toBe(partShapeHash(moved));
    expect(partShapeHash(placed)).toBe(canonicalHash(cam));
    const larger = { ...moved, features: [{ kind: "turned", steps: [{ diameter: 24, length: 8 }] }] };
    expect(partShapeHash(larger)).not.toBe(partShapeHash(moved));
  });
});

describe("assembly matrices", () => {
  const close = (a: number[], b: number[]) => a.forEach((v, i) => expect(v).toBeCloseTo(b[i]!, 12));

  it("no placement is the identity", () => {
    expect(assemblyMatrix({})).toEqual([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1]);
  });
  it("a quarter turn about z takes +x to +y (right-hand rule), then the translation applies", () => {
    const m = assemblyMatrix({ placement: { position: { x: 10, y: 0, z: 5 }, rotations: [{ axis: "z", angleDeg: 90 }] } });
    close(transformPoint(m, 1, 0, 0), [10, 1, 5]);
    close(transformPoint(m, 0, 1, 0), [9, 0, 5]);
    // Column-major: the translation sits in elements 12–14.
    expect(m.slice(12, 15)).toEqual([10, 0, 5]);
  });
  it("rotations apply in the order listed, about the fixed axes", () => {
    // A turned part's axis (+z) turned 90° about y points along +x; then 90° about z it points along +y.
    const m = assemblyMatrix({ placement: { position: { x: 0, y: 0, z: 0 }, rotations: [{ axis: "y", angleDeg: 90 }, { axis: "z", angleDeg: 90 }] } });
    close(transformPoint(m, 0, 0, 1), [0, 1, 0]);
  });
  it("the exploded matrix adds the explode offset in assembly axes", () => {
    const part = { placement: { position: { x: 1, y: 2, z: 3 }, rotations: [{ axis: "x" as const, angleDeg: 90 }] }, explode: { x: 0, y: 0, z: 40 } };
    close(transformPoint(explodedMatrix(part), 0, 0, 0), [1, 2, 43]);
  });
});

describe("pre-kernel guard", () => {
  const base = { id: "p", name: "P", material: "mild-steel" };
  it("refuses an eccentric bore on a block, an external thread on a missing step, and a slot on a turned part", () => {
    expect(() => validatePartForKernel({ ...base, features: [{ kind: "block", size: { x: 10, y: 10, z: 10 } }, { kind: "eccentric-bore", eccentricity: 1, diameter: 3, through: true }] })).toThrow(/eccentric bore needs a turned base/);
    expect(() => validatePartForKernel({ ...base, features: [{ kind: "turned", steps: [{ diameter: 10, length: 10 }] }, { kind: "thread", form: "external", step: 2, designation: "M10", length: 5 }] })).toThrow(KernelError);
    expect(() => validatePartForKernel({ ...base, features: [{ kind: "turned", steps: [{ diameter: 10, length: 10 }] }, { kind: "slot", at: { x: 0, y: 0, z: 10 }, direction: "-z", along: "x", length: 2, width: 2, depth: 1 }] })).toThrow(/for blocks/);
  });
  it("refuses a pattern with a fractional or huge count", () => {
    const hole = { kind: "hole" as const, at: { x: 5, y: 5, z: 10 }, direction: "-z" as const, diameter: 2, depth: 3 };
    expect(() => validatePartForKernel({ ...base, features: [{ kind: "block", size: { x: 10, y: 10, z: 10 } }, { kind: "pattern-linear", count: 2.5, spacing: { x: 1, y: 0, z: 0 }, feature: hole }] })).toThrow(/whole number/);
    expect(() => validatePartForKernel({ ...base, features: [{ kind: "block", size: { x: 10, y: 10, z: 10 } }, { kind: "pattern-circular", count: 100000, centre: { x: 5, y: 5, z: 10 }, axis: "z", feature: hole }] })).toThrow(/whole number/);
  });
  it("accepts a sound part and returns its base extent", () => {
    const info = validatePartForKernel({ ...base, features: [{ kind: "turned", steps: [{ diameter: 20, length: 8 }, { diameter: 12, length: 4 }] }] });
    expect(info.min).toEqual([-10, -10, 0]);
    expect(info.max).toEqual([10, 10, 12]);
  });
});
