/**
 * Analytic volumes against independent computations: polygon areas by the shoelace formula and Pappus's
 * centroid theorem for solids of revolution (any mechanics or calculus text), the Steinmetz bicylinder
 * (V = 16r³/3, a classical result), and brute-force point counting on a grid of the finished part.
 */
import { describe, expect, it } from "vitest";
import type { ResolvedFeature, ResolvedPart } from "./features";
import { baseVolumeMm3, partBoundingBox, partMassKg, partStockEnvelope, partVolumeMm3, radialVolume, removedVolumeMm3 } from "./analytic";
import { baseGeometry } from "./frame";
import { metricThread } from "./threads";

type P2 = [number, number];
/** Shoelace area and centroid of a simple polygon. */
function polygon(points: P2[]): { area: number; cx: number; cy: number } {
  let a = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i]!;
    const [x1, y1] = points[(i + 1) % points.length]!;
    const cross = x0 * y1 - x1 * y0;
    a += cross;
    cx += (x0 + x1) * cross;
    cy += (y0 + y1) * cross;
  }
  a /= 2;
  return { area: Math.abs(a), cx: cx / (6 * a), cy: cy / (6 * a) };
}
/** Volume swept by revolving a half-section (radius, depth) about the axis: Pappus, V = 2π·x̄·A. */
function pappus(profile: P2[]): number {
  const { area, cx } = polygon(profile);
  return 2 * Math.PI * cx * area;
}

const block = (x: number, y: number, z: number): ResolvedFeature => ({ kind: "block", size: { x, y, z } });
const part = (features: ResolvedFeature[], material = "mild-steel"): ResolvedPart => ({ id: "p", name: "P", material, features });
const removed = (base: ResolvedFeature, f: ResolvedFeature) => removedVolumeMm3(f, baseGeometry(part([base, f])));

describe("holes", () => {
  const base = block(40, 40, 30);
  it("plain blind hole: π/4·d²·depth", () => {
    expect(removed(base, { kind: "hole", at: { x: 20, y: 20, z: 30 }, direction: "-z", diameter: 6, depth: 12 })).toBeCloseTo((Math.PI / 4) * 36 * 12, 9);
  });

  it("through hole runs to the far side of the box", () => {
    expect(removed(base, { kind: "hole", at: { x: 0, y: 20, z: 15 }, direction: "+x", diameter: 5, through: true })).toBeCloseTo((Math.PI / 4) * 25 * 40, 9);
  });

  it("counterbore Ø12×2 on a Ø8 hole with a 0.5 chamfer matches the revolved profile (Pappus)", () => {
    const v = removed(base, { kind: "hole", at: { x: 20, y: 20, z: 30 }, direction: "-z", diameter: 8, depth: 10, counterbore: { diameter: 12, depth: 2 }, chamfer: 0.5 });
    // Half-section (radius, depth) of the cut, closed along the axis.
    const profile: P2[] = [[0, 0], [6.5, 0], [6, 0.5], [6, 2], [4, 2], [4, 10], [0, 10]];
    expect(v).toBeCloseTo(pappus(profile), 9);
  });

  it("90° countersink Ø10 on a Ø5 hole matches the revolved profile", () => {
    const v = removed(base, { kind: "hole", at: { x: 20, y: 20, z: 30 }, direction: "-z", diameter: 5, depth: 8, countersink: { diameter: 10 } });
    const profile: P2[] = [[0, 0], [5, 0], [2.5, 2.5], [2.5, 8], [0, 8]];
    expect(v).toBeCloseTo(pappus(profile), 9);
  });

  it("60° countersink uses its own cone depth", () => {
    const v = removed(base, { kind: "hole", at: { x: 20, y: 20, z: 30 }, direction: "-z", diameter: 4, depth: 8, countersink: { diameter: 8, angleDeg: 60 } });
    const t = 2 / Math.tan(Math.PI / 6);
    const profile: P2[] = [[0, 0], [4, 0], [2, t], [2, 8], [0, 8]];
    expect(v).toBeCloseTo(pappus(profile), 9);
  });
});

describe("radial cross holes in turned parts", () => {
  // Steinmetz bicylinder: two cylinders of radius r crossing at right angles share 16r³/3.
  it("a through hole as large as the rod removes the Steinmetz solid", () => {
    expect(radialVolume(5, 5, 0, undefined)).toBeCloseTo((16 / 3) * 125, 9);
    const rod: ResolvedFeature = { kind: "turned", steps: [{ diameter: 10, length: 40 }] };
    expect(removed(rod, { kind: "hole", at: { x: 0, y: 0, z: 20 }, direction: "+x", diameter: 10, through: true })).toBeCloseTo((16 / 3) * 125, 6);
  });

  it("blind and offset cross holes agree with point counting", () => {
    const R = 10;
    const r = 2.5;
    for (const [o, depth] of [[0, 5], [3, 6], [-2, undefined]] as const) {
      const exact = radialVolume(R, r, o, depth);
      // Count points in the hole's section (y, z) × along x, inside the rod and inside the hole's depth.
      const n = 400;
      let hits = 0;
      const xEntry = -Math.sqrt(R * R - o * o);
      const xEnd = depth === undefined ? R : xEntry + depth;
      const hy = (2 * r) / n;
      const hx = (2 * R) / n;
      for (let i = 0; i < n; i++) {
        const y = o - r + (i + 0.5) * hy;
        for (let k = 0; k < n; k++) {
          const zz = -r + (k + 0.5) * hy;
          if ((y - o) ** 2 + zz * zz > r * r) continue;
          for (let j = 0; j < n; j++) {
            const x = -R + (j + 0.5) * hx;
            if (x * x + y * y <= R * R && x <= xEnd) hits++;
          }
        }
      }
      const counted = hits * hy * hy * hx;
      expect(Math.abs(counted - exact) / exact).toBeLessThan(0.005);
    }
  });
});

describe("slots, pockets, steps, grooves", () => {
  const base = block(60, 30, 20);
  it("slot = obround area × depth", () => {
    const v = removed(base, { kind: "slot", at: { x: 20, y: 15, z: 20 }, direction: "-z", along: "x", length: 12, width: 4, depth: 5 });
    const pts: P2[] = [];
    for (let i = 0; i <= 2000; i++) pts.push([12 + 2 * Math.cos(-Math.PI / 2 + (Math.PI * i) / 2000), 2 * Math.sin(-Math.PI / 2 + (Math.PI * i) / 2000)]);
    for (let i = 0; i <= 2000; i++) pts.push([2 * Math.cos(Math.PI / 2 + (Math.PI * i) / 2000), 2 * Math.sin(Math.PI / 2 + (Math.PI * i) / 2000)]);
    expect(v).toBeCloseTo(polygon(pts).area * 5, 3);
  });

  it("through slot takes the depth of the box", () => {
    expect(removed(base, { kind: "slot", at: { x: 20, y: 15, z: 20 }, direction: "-z", along: "x", length: 10, width: 4, through: true })).toBeCloseTo((40 + Math.PI * 4) * 20, 9);
  });

  it("rectangular pocket with corner radius = rounded-rectangle area × depth", () => {
    const v = removed(base, { kind: "pocket", at: { x: 30, y: 15, z: 20 }, direction: "-z", shape: { kind: "rect", u: 20, v: 10, cornerRadius: 3 }, depth: 4 });
    const pts: P2[] = [];
    const corners: Array<[number, number, number]> = [[7, 2, 0], [-7, 2, 90], [-7, -2, 180], [7, -2, 270]];
    for (const [cx, cy, start] of corners) for (let i = 0; i <= 500; i++) {
      const a = ((start + (90 * i) / 500) * Math.PI) / 180;
      pts.push([cx + 3 * Math.cos(a), cy + 3 * Math.sin(a)]);
    }
    expect(v).toBeCloseTo(polygon(pts).area * 4, 3);
    expect(removed(base, { kind: "pocket", at: { x: 30, y: 15, z: 20 }, direction: "-z", shape: { kind: "round", diameter: 10 }, depth: 4 })).toBeCloseTo(25 * Math.PI * 4, 9);
  });

  it("step = the box between its corners", () => {
    expect(removed(base, { kind: "step", from: { x: 0, y: 20, z: 10 }, to: { x: 60, y: 30, z: 20 } })).toBe(60 * 10 * 10);
  });

  it("90° V-groove 5 deep along a 60 block = triangle area × length", () => {
    const v = removed(base, { kind: "v-groove", at: { x: 30, y: 15, z: 20 }, direction: "-z", along: "x", angleDeg: 90, depth: 5 });
    expect(v).toBeCloseTo(polygon([[-5, 0], [5, 0], [0, -5]]).area * 60, 9);
  });
});

describe("chamfers", () => {
  it("a turned end ring matches the revolved triangle (Pappus)", () => {
    const rod: ResolvedFeature = { kind: "turned", steps: [{ diameter: 20, length: 10 }] };
    const v = removed(rod, { kind: "chamfer", size: 1, faces: ["+z", "-z"] });
    expect(v).toBeCloseTo(2 * pappus([[10, 0], [9, 0], [10, 1]]), 9);
  });

  it("every edge of a block, corners included, agrees with point counting", () => {
    const b = block(10, 12, 14);
    const c = 3;
    const v = removed(b, { kind: "chamfer", size: c, faces: ["+x", "-x", "+y", "-y", "+z", "-z"] });
    const n = 140;
    let left = 0;
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) for (let k = 0; k < n; k++) {
      const p = [((i + 0.5) * 10) / n, ((j + 0.5) * 12) / n, ((k + 0.5) * 14) / n];
      const d = [Math.min(p[0]!, 10 - p[0]!), Math.min(p[1]!, 12 - p[1]!), Math.min(p[2]!, 14 - p[2]!)];
      if (d[0]! + d[1]! >= c && d[0]! + d[2]! >= c && d[1]! + d[2]! >= c) left++;
    }
    const counted = 10 * 12 * 14 * (1 - left / n ** 3);
    expect(Math.abs(counted - v) / v).toBeLessThan(0.01);
  });

  it("one face's four edges: two chamfered edges meet at each corner", () => {
    const v = removed(block(10, 10, 10), { kind: "chamfer", size: 1, faces: ["+z"] });
    expect(v).toBeCloseTo(4 * 0.5 * 10 - 4 / 3, 9);
  });
});

describe("bores, threads and patterns", () => {
  const cam: ResolvedFeature = { kind: "turned", steps: [{ diameter: 20, length: 10 }] };
  it("eccentric bore with counterbore", () => {
    const v = removed(cam, { kind: "eccentric-bore", eccentricity: 1, diameter: 8, through: true, counterbore: { diameter: 12, depth: 2 } });
    expect(v).toBeCloseTo(pappus([[0, 0], [6, 0], [6, 2], [4, 2], [4, 10], [0, 10]]), 9);
  });

  // ISO 724 (from memory): M4 basic minor diameter of the nut thread D1 = 3.242 mm; M6 D1 = 4.917 mm;
  // d3 (bolt root) M6 = 4.773 mm. ISO 261 coarse pitches: M4 0.7, M6 1, M8 1.25, M10 1.5, M12 1.75.
  it("models an internal thread as its ISO 724 minor diameter to the drill depth", () => {
    expect(metricThread("M4")!.internalMinorDiameterMm).toBeCloseTo(3.242, 3);
    expect(metricThread("M6")!.internalMinorDiameterMm).toBeCloseTo(4.917, 3);
    expect(metricThread("M6")!.externalMinorDiameterMm).toBeCloseTo(4.773, 3);
    expect([4, 6, 8, 10, 12].map((d) => metricThread(`M${d}`)!.pitchMm)).toEqual([0.7, 1, 1.25, 1.5, 1.75]);
    expect(metricThread("M6x0.75")!.pitchMm).toBe(0.75);
    expect(metricThread("M7.3")).toBeUndefined();
    const base = block(20, 20, 20);
    const v = removed(base, { kind: "thread", form: "internal", at: { x: 10, y: 10, z: 20 }, direction: "-z", designation: "M4", depth: 8 });
    expect(v).toBeCloseTo((Math.PI / 4) * (4 - 1.0825317547 * 0.7) ** 2 * (8 + 3 * 0.7), 9);
  });

  it("patterns are the sum of their copies", () => {
    const base = block(100, 20, 10);
    const hole: ResolvedFeature = { kind: "hole", at: { x: 10, y: 10, z: 10 }, direction: "-z", diameter: 5, through: true };
    const one = removed(base, hole);
    expect(removed(base, { kind: "pattern-linear", count: 4, spacing: { x: 20, y: 0, z: 0 }, feature: hole as never })).toBeCloseTo(4 * one, 9);
    const plate = block(60, 60, 10);
    expect(removed(plate, { kind: "pattern-circular", count: 6, centre: { x: 30, y: 30, z: 10 }, axis: "z", feature: { ...hole, at: { x: 50, y: 30, z: 10 } } as never })).toBeCloseTo(6 * one, 9);
  });
});

describe("whole parts", () => {
  it("base minus features, bounding box, stock and mass", () => {
    const p = part([block(60, 30, 20), { kind: "hole", at: { x: 15, y: 15, z: 20 }, direction: "-z", diameter: 5, through: true }]);
    expect(baseVolumeMm3(p)).toBe(36_000);
    expect(partVolumeMm3(p)).toBeCloseTo(36_000 - (Math.PI / 4) * 25 * 20, 9);
    expect(partBoundingBox(p).size).toEqual({ x: 60, y: 30, z: 20 });
    expect(partStockEnvelope({ ...p, stock: { form: "flat", allowance: 2 } })).toEqual({ form: "flat", lengthMm: 62, widthMm: 32, thicknessMm: 22, allowanceMm: 2 });
    // EN 1993-1-1 (from memory): steel 7850 kg/m³; 1 mm³ = 1e-9 m³.
    expect(partMassKg(p)).toBeCloseTo(7850 * partVolumeMm3(p) * 1e-9, 12);
    const rod = part([{ kind: "turned", steps: [{ diameter: 12, length: 2 }, { diameter: 8, length: 8 }] }]);
    expect(partBoundingBox(rod).size).toEqual({ x: 12, y: 12, z: 10 });
    expect(partStockEnvelope(rod)).toEqual({ form: "round", diameterMm: 12, lengthMm: 10, allowanceMm: 0 });
  });

  it("a body with steps, a slot, cross holes and a chamfer agrees with point counting", () => {
    const features: ResolvedFeature[] = [
      block(40, 55, 46),
      { kind: "step", from: { x: 0, y: 6, z: 0 }, to: { x: 40, y: 55, z: 8 } },
      { kind: "step", from: { x: 0, y: 19, z: 18 }, to: { x: 40, y: 55, z: 46 } },
      { kind: "slot", at: { x: 20, y: 27, z: 18 }, direction: "-z", along: "y", length: 17, width: 4.5, depth: 10 },
      { kind: "hole", at: { x: 8, y: 0, z: 15 }, direction: "+y", diameter: 8, depth: 16, chamfer: 0.5 },
      { kind: "hole", at: { x: 32, y: 0, z: 27 }, direction: "+y", diameter: 8, depth: 16, chamfer: 0.5 },
      { kind: "chamfer", size: 0.5, faces: ["-y"] },
    ];
    const p = part(features);
    const v = partVolumeMm3(p);
    const inside = (x: number, y: number, z: number): boolean => {
      if (y > 6 && z < 8) return false;
      if (y > 19 && z > 18) return false;
      if (z > 8 && z < 18) {
        const ya = Math.min(Math.max(y, 27), 44);
        if ((x - 20) ** 2 + (y - ya) ** 2 <= 2.25 ** 2) return false;
      }
      for (const [hx, hz] of [[8, 15], [32, 27]] as const) {
        const rho = Math.hypot(x - hx, z - hz);
        if (y <= 16 && (rho <= 4 || (y < 0.5 && rho <= 4.5 - y))) return false;
      }
      const dx = Math.min(x, 40 - x);
      const dz = Math.min(z, 46 - z);
      if (y + dx < 0.5 || y + dz < 0.5) return false;
      return true;
    };
    const n = [160, 220, 184];
    let hits = 0;
    for (let i = 0; i < n[0]!; i++) for (let j = 0; j < n[1]!; j++) for (let k = 0; k < n[2]!; k++) {
      if (inside(((i + 0.5) * 40) / n[0]!, ((j + 0.5) * 55) / n[1]!, ((k + 0.5) * 46) / n[2]!)) hits++;
    }
    const counted = (hits / (n[0]! * n[1]! * n[2]!)) * 40 * 55 * 46;
    expect(Math.abs(counted - v) / v).toBeLessThan(0.005);
  });
});
