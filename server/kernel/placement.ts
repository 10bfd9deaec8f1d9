import type { Point3, ResolvedPart } from "@/engine/parts/features";

/** A 4 × 4 affine matrix, column-major (the layout of three.js `Matrix4.fromArray` and of WebGL). */
export type Matrix4 = number[];

const IDENTITY: Matrix4 = [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];

/** a · b for column-major 4 × 4 matrices. */
export function multiply(a: Matrix4, b: Matrix4): Matrix4 {
  const out = new Array<number>(16).fill(0);
  for (let col = 0; col < 4; col++)
    for (let row = 0; row < 4; row++) {
      let s = 0;
      for (let k = 0; k < 4; k++) s += a[k * 4 + row]! * b[col * 4 + k]!;
      out[col * 4 + row] = s;
    }
  return out;
}

function rotation(axis: "x" | "y" | "z", angleDeg: number): Matrix4 {
  const a = (angleDeg * Math.PI) / 180;
  // Snap the sine and cosine of quarter turns so placements stay exact.
  const snap = (v: number) => (Math.abs(v) < 1e-12 ? 0 : Math.abs(Math.abs(v) - 1) < 1e-12 ? Math.sign(v) : v);
  const c = snap(Math.cos(a));
  const s = snap(Math.sin(a));
  if (axis === "x") return [1, 0, 0, 0, 0, c, s, 0, 0, -s, c, 0, 0, 0, 0, 1];
  if (axis === "y") return [c, 0, -s, 0, 0, 1, 0, 0, s, 0, c, 0, 0, 0, 0, 1];
  return [c, s, 0, 0, -s, c, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1];
}

const translation = (p: Point3): Matrix4 => [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, p.x, p.y, p.z, 1];

/**
 * The assembly transform of a part: its rotations applied in the order listed, each about the assembly's
 * fixed x, y or z axis through the part's origin (right-hand rule), then the translation to `position`:
 * M = T(position) · Rₙ · … · R₁. No placement is the identity.
 */
export function assemblyMatrix(part: Pick<ResolvedPart, "placement">): Matrix4 {
  const p = part.placement;
  if (!p) return [...IDENTITY];
  let m = [...IDENTITY];
  for (const r of p.rotations ?? []) m = multiply(rotation(r.axis, r.angleDeg), m);
  return multiply(translation(p.position), m);
}

/** The exploded-view transform: the assembly transform moved on by the part's `explode` offset (assembly axes). */
export function explodedMatrix(part: Pick<ResolvedPart, "placement" | "explode">): Matrix4 {
  const m = assemblyMatrix(part);
  const e = part.explode ?? { x: 0, y: 0, z: 0 };
  return multiply(translation(e), m);
}

/** Applies a column-major matrix to a point. */
export function transformPoint(m: Matrix4, x: number, y: number, z: number): [number, number, number] {
  return [m[0]! * x + m[4]! * y + m[8]! * z + m[12]!, m[1]! * x + m[5]! * y + m[9]! * z + m[13]!, m[2]! * x + m[6]! * y + m[10]! * z + m[14]!];
}

/** Applies the rotation part of a column-major matrix to a direction. */
export function transformDirection(m: Matrix4, x: number, y: number, z: number): [number, number, number] {
  return [m[0]! * x + m[4]! * y + m[8]! * z, m[1]! * x + m[5]! * y + m[9]! * z, m[2]! * x + m[6]! * y + m[10]! * z];
}
