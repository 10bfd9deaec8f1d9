/**
 * STEP and STL as the exporters and download routes get them from the kernel tasks.
 * - STEP: ISO 10303-21 (the file starts with `ISO-10303-21;`), AP242 schema, lengths in millimetres
 *   (SI_UNIT(.MILLI.,.METRE.)), and it reads back into the kernel with the same volume.
 * - STL: the binary layout (80-byte header, uint32 count, 50 bytes per triangle), and a closed surface:
 *   every edge is shared by exactly two triangles, once in each direction (a consistently oriented
 *   2-manifold, which slicers require).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { ResolvedPart } from "@/engine/parts/features";
import { createInProcessKernel, type KernelPool, type ModelTaskOutput, type StepTaskOutput, type StlTaskOutput } from "@server/kernel";
import { loadKernel } from "@server/kernel/oc";
import { stepVolumeMm3 } from "@server/kernel/step";

const body: ResolvedPart = {
  id: "stop-body",
  name: "Stop body",
  material: "mild-steel",
  features: [
    { kind: "block", size: { x: 50, y: 25, z: 16 } },
    { kind: "hole", at: { x: 12, y: 12.5, z: 16 }, direction: "-z", diameter: 5, through: true, chamfer: 0.5 },
    { kind: "thread", form: "internal", at: { x: 0, y: 12.5, z: 8 }, direction: "+x", designation: "M6", depth: 10 },
    { kind: "slot", at: { x: 25, y: 12.5, z: 16 }, direction: "-z", along: "x", length: 12, width: 6, depth: 4 },
    { kind: "chamfer", size: 0.5, faces: ["+z"] },
  ],
  placement: { position: { x: 0, y: 0, z: 30 }, rotations: [{ axis: "z", angleDeg: 90 }] },
};
const cam: ResolvedPart = {
  id: "cam",
  name: "Cam",
  material: "mild-steel",
  features: [
    { kind: "turned", steps: [{ diameter: 20, length: 8 }] },
    { kind: "eccentric-bore", eccentricity: 1, diameter: 8, through: true },
  ],
  placement: { position: { x: 40, y: 0, z: 0 } },
};

function parseStl(bytes: Uint8Array) {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  const tris: number[][] = [];
  for (let t = 0; t < count; t++) {
    const o = 84 + t * 50 + 12;
    tris.push(Array.from({ length: 9 }, (_, k) => view.getFloat32(o + k * 4, true)));
  }
  return { count, tris };
}

/** Directed edge counts keyed by quantised vertex positions (1 µm). */
function edgeBalance(tris: number[][]) {
  const key = (t: number[], i: number) => `${Math.round(t[i * 3]! * 1000)},${Math.round(t[i * 3 + 1]! * 1000)},${Math.round(t[i * 3 + 2]! * 1000)}`;
  const directed = new Map<string, number>();
  let degenerate = 0;
  for (const t of tris) {
    const v = [key(t, 0), key(t, 1), key(t, 2)];
    if (v[0] === v[1] || v[1] === v[2] || v[0] === v[2]) {
      degenerate++;
      continue;
    }
    for (let i = 0; i < 3; i++) {
      const k = `${v[i]}>${v[(i + 1) % 3]}`;
      directed.set(k, (directed.get(k) ?? 0) + 1);
    }
  }
  let unmatched = 0;
  let doubled = 0;
  for (const [k, n] of directed) {
    const [a, b] = k.split(">");
    if (n > 1) doubled++;
    if ((directed.get(`${b}>${a}`) ?? 0) !== n) unmatched++;
  }
  return { edges: directed.size, unmatched, doubled, degenerate };
}

describe("kernel exports", () => {
  let kernel: KernelPool;
  beforeAll(async () => {
    kernel = createInProcessKernel();
    await kernel.ready();
  });
  afterAll(async () => {
    await kernel.close();
  });

  it("STEP of a part: ISO 10303-21 header, AP242, millimetres, and it re-imports with the same volume", async () => {
    const [model, step] = await Promise.all([
      kernel.run<ModelTaskOutput>("model", { parts: [body], mesh: false }),
      kernel.run<StepTaskOutput>("step", { parts: [body] }),
    ]);
    const text = new TextDecoder("latin1").decode(step.bytes);
    expect(text.startsWith("ISO-10303-21;")).toBe(true);
    expect(text).toMatch(/FILE_SCHEMA\(\s*\(\s*'AP242/);
    expect(text).toContain("SI_UNIT(.MILLI.,.METRE.)");
    expect(text).toContain("Stop body");
    expect(text.trimEnd().endsWith("END-ISO-10303-21;")).toBe(true);
    const back = await stepVolumeMm3(await loadKernel(), step.bytes);
    expect(back.solidCount).toBe(1);
    expect(Math.abs(back.volumeMm3 - model.parts[0]!.volumeMm3) / model.parts[0]!.volumeMm3).toBeLessThan(1e-6);
  });

  it("STEP of the assembly holds every part, placed, with the same total volume", async () => {
    const [model, step] = await Promise.all([
      kernel.run<ModelTaskOutput>("model", { parts: [body, cam], mesh: false }),
      kernel.run<StepTaskOutput>("step", { parts: [body, cam], assembly: true }),
    ]);
    const back = await stepVolumeMm3(await loadKernel(), step.bytes);
    expect(back.solidCount).toBe(2);
    const total = model.parts.reduce((s, p) => s + p.volumeMm3, 0);
    expect(Math.abs(back.volumeMm3 - total) / total).toBeLessThan(1e-6);
  });

  it("binary STL of a part: the triangle count matches the file and the mesh, and the surface is closed", async () => {
    const [model, stl] = await Promise.all([
      kernel.run<ModelTaskOutput>("model", { parts: [body] }),
      kernel.run<StlTaskOutput>("stl", { parts: [body] }),
    ]);
    const { count, tris } = parseStl(stl.bytes);
    expect(count).toBe(stl.triangleCount);
    expect(stl.bytes.length).toBe(84 + 50 * count);
    expect(count).toBe(model.parts[0]!.mesh!.indices.length / 3);
    const balance = edgeBalance(tris);
    expect(balance.degenerate).toBe(0);
    expect(balance.unmatched).toBe(0);
    expect(balance.doubled).toBe(0);
    // Every vertex lies inside the part's box (mm).
    for (const t of tris) for (let i = 0; i < 9; i += 3) {
      expect(t[i]!).toBeGreaterThanOrEqual(-1e-3);
      expect(t[i]!).toBeLessThanOrEqual(50 + 1e-3);
    }
  });

  it("binary STL of the assembly: both parts, placed, each closed", async () => {
    const stl = await kernel.run<StlTaskOutput>("stl", { parts: [body, cam], assembly: true });
    const { count, tris } = parseStl(stl.bytes);
    expect(count).toBe(stl.triangleCount);
    expect(edgeBalance(tris).unmatched).toBe(0);
    // The body is turned 90° about z (+x → +y, +y → −x) and lifted 30 mm: x spans −25…0, z spans 30…46.
    // The Ø20 cam is centred at x = 40, so it reaches x = 50.
    const zs = tris.flatMap((t) => [t[2]!, t[5]!, t[8]!]);
    expect(Math.max(...zs)).toBeCloseTo(46, 3);
    const xs = tris.flatMap((t) => [t[0]!, t[3]!, t[6]!]);
    expect(Math.min(...xs)).toBeCloseTo(-25, 3);
    expect(Math.max(...xs)).toBeCloseTo(50, 3);
  });

  it("mesh normals are unit vectors and point out of the solid (signed volume of the mesh is positive)", async () => {
    const model = await kernel.run<ModelTaskOutput>("model", { parts: [cam] });
    const m = model.parts[0]!.mesh!;
    for (let i = 0; i < m.normals.length; i += 3) expect(Math.hypot(m.normals[i]!, m.normals[i + 1]!, m.normals[i + 2]!)).toBeCloseTo(1, 3);
    // Divergence theorem: Σ (a · (b × c)) / 6 over outward-wound triangles is the enclosed volume.
    let v = 0;
    const p = m.positions;
    for (let t = 0; t < m.indices.length; t += 3) {
      const [a, b, c] = [m.indices[t]!, m.indices[t + 1]!, m.indices[t + 2]!].map((i) => [p[i * 3]!, p[i * 3 + 1]!, p[i * 3 + 2]!]) as [number[], number[], number[]];
      v += (a[0]! * (b[1]! * c[2]! - b[2]! * c[1]!) - a[1]! * (b[0]! * c[2]! - b[2]! * c[0]!) + a[2]! * (b[0]! * c[1]! - b[1]! * c[0]!)) / 6;
    }
    expect(Math.abs(v - model.parts[0]!.volumeMm3) / model.parts[0]!.volumeMm3).toBeLessThan(0.005);
  });
});
