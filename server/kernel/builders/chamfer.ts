import type { Axis, ChamferFeature, Direction } from "@/engine/parts/features";
import { axisIndex, directionAxis } from "../frame";
import type { BaseInfo, BaseModifierBuilder } from "./types";

/**
 * 45° chamfers of leg `size` on the outside edges of the listed faces of the base (a block's four edges
 * around each face; a turned part's outer circle at an end face).
 *
 * Every other feature only removes material, and a chamfer only removes material within `size` of the
 * base's outside edges, so the order does not matter: (B − C) − A = (B − A) − C. Chamfers are therefore
 * built into the base itself — a turned profile gets its corners cut; a block becomes the intersection of
 * one prism per edge direction with chamfered corners — exactly the region {s + t ≥ c} for each chamfered
 * edge (s, t the depths below its two faces), mitred corners included. That costs one planar intersection
 * instead of a Boolean of long thin prisms against the finished part (measured: ~5× faster).
 */
export const chamferBuilder: BaseModifierBuilder<"chamfer"> = {
  kind: "chamfer",
  role: "base-modifier",
};

/** A corner of a rectangle in the plane of two axes, chamfered by `c`. */
interface CornerCut {
  /** The two axes of the plane, in x, y, z order, and the side (min/max) of the corner on each. */
  p: Axis;
  q: Axis;
  pSide: "min" | "max";
  qSide: "min" | "max";
  c: number;
}

/**
 * For a block: the corner cuts grouped by the axis their edge runs along. An edge of face ±n running along
 * `a` sits at the face's side of n and at one side of the third axis b.
 */
export function blockChamferCuts(chamfers: ChamferFeature[]): Map<Axis, CornerCut[]> {
  const byAxis = new Map<Axis, Map<string, CornerCut>>();
  for (const ch of chamfers) {
    for (const face of new Set<Direction>(ch.faces)) {
      const n = directionAxis(face);
      const nSide = face[0] === "+" ? "max" : "min";
      for (const along of (["x", "y", "z"] as const).filter((a) => a !== n)) {
        const b = (["x", "y", "z"] as const).find((a) => a !== n && a !== along)!;
        for (const bSide of ["min", "max"] as const) {
          const [p, q] = axisIndex(n) < axisIndex(b) ? [n, b] : [b, n];
          const pSide = p === n ? nSide : bSide;
          const qSide = q === n ? nSide : bSide;
          const key = `${p}${pSide}${q}${qSide}`;
          const cuts = byAxis.get(along) ?? new Map<string, CornerCut>();
          const prev = cuts.get(key);
          cuts.set(key, { p, q, pSide, qSide, c: Math.max(prev?.c ?? 0, ch.size) });
          byAxis.set(along, cuts);
        }
      }
    }
  }
  return new Map([...byAxis].map(([a, m]) => [a, [...m.values()]]));
}

/**
 * The outline, in the (p, q) plane, of the block's section with the listed corners cut at 45°,
 * counter-clockwise from (min, min).
 */
export function chamferedRectangle(base: BaseInfo, p: Axis, q: Axis, cuts: CornerCut[]): [number, number][] {
  const P0 = base.min[axisIndex(p)]!, P1 = base.max[axisIndex(p)]!;
  const Q0 = base.min[axisIndex(q)]!, Q1 = base.max[axisIndex(q)]!;
  const cut = (ps: "min" | "max", qs: "min" | "max") => cuts.find((k) => k.pSide === ps && k.qSide === qs)?.c ?? 0;
  const pts: [number, number][] = [];
  const corner = (ps: "min" | "max", qs: "min" | "max", incoming: [number, number], outgoing: [number, number]) => {
    const c = cut(ps, qs);
    const at: [number, number] = [ps === "min" ? P0 : P1, qs === "min" ? Q0 : Q1];
    if (c <= 0) pts.push(at);
    else pts.push([at[0] - incoming[0] * c, at[1] - incoming[1] * c], [at[0] + outgoing[0] * c, at[1] + outgoing[1] * c]);
  };
  // Going round counter-clockwise: (P0,Q0) → (P1,Q0) → (P1,Q1) → (P0,Q1); direction vectors of the sides.
  corner("min", "min", [0, -1], [1, 0]);
  corner("max", "min", [1, 0], [0, 1]);
  corner("max", "max", [0, 1], [-1, 0]);
  corner("min", "max", [-1, 0], [0, -1]);
  return pts;
}

/** Checks the chamfers fit the base (a leg must leave the face it cuts). */
export function chamferFits(f: ChamferFeature, base: BaseInfo): string | null {
  if (base.kind === "turned") {
    if (f.faces.some((x) => x !== "+z" && x !== "-z")) return "on a turned part only the end faces (+z, -z) can be chamfered";
    for (const face of f.faces) {
      const step = face === "+z" ? base.steps[base.steps.length - 1]! : base.steps[0]!;
      if (!(f.size < step.diameter / 2 && f.size < step.length)) return `a ${f.size} mm chamfer does not fit the Ø${step.diameter} × ${step.length} end step`;
    }
    return null;
  }
  const ext = [0, 1, 2].map((i) => base.max[i]! - base.min[i]!);
  if (!(f.size * 2 < Math.min(...ext))) return `a ${f.size} mm chamfer is more than half the block's smallest side (${Math.min(...ext)} mm)`;
  return null;
}
