import type { Axis, Direction, Point3 } from "@/engine/parts/features";

/** Small vector helpers for the builders (part-local millimetres). */
export type Vec3 = [number, number, number];

export const toVec = (p: Point3): Vec3 => [p.x, p.y, p.z];
export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];

const AXIS_INDEX: Record<Axis, 0 | 1 | 2> = { x: 0, y: 1, z: 2 };
export const axisIndex = (a: Axis): 0 | 1 | 2 => AXIS_INDEX[a];

export function axisVector(a: Axis): Vec3 {
  const v: Vec3 = [0, 0, 0];
  v[AXIS_INDEX[a]] = 1;
  return v;
}

/** The unit vector of a direction such as "-z". */
export function directionVector(d: Direction): Vec3 {
  const v = axisVector(d[1] as Axis);
  return d[0] === "-" ? (v.map((c) => (c === 0 ? 0 : -c)) as Vec3) : v;
}

export const directionAxis = (d: Direction): Axis => d[1] as Axis;

/**
 * A right-handed frame for a cutting tool: `w` is the way the tool travels into the material, `u` and `v`
 * span the entry face. When `along` is given it becomes `u` (slots, grooves); otherwise `u` and `v` are the
 * face's two axes in x, y, z order, as the vocabulary defines for pockets.
 */
export interface ToolFrame {
  origin: Vec3;
  u: Vec3;
  v: Vec3;
  w: Vec3;
}

export function toolFrame(at: Point3, direction: Direction, along?: Axis): ToolFrame {
  const w = directionVector(direction);
  const normalAxis = directionAxis(direction);
  const faceAxes = (["x", "y", "z"] as const).filter((a) => a !== normalAxis);
  const uAxis = along ?? faceAxes[0]!;
  const u = axisVector(uAxis);
  const v = cross(w, u);
  return { origin: toVec(at), u, v, w };
}

/** The point origin + a·u + b·v + c·w. */
export function inFrame(f: ToolFrame, a: number, b: number, c: number): Vec3 {
  return add(add(add(f.origin, scale(f.u, a)), scale(f.v, b)), scale(f.w, c));
}

/** Rotates a point about an axis through `centre` by `angleDeg` (right-hand rule). */
export function rotateAbout(p: Vec3, centre: Vec3, axis: Axis, angleDeg: number): Vec3 {
  const a = (angleDeg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const [x, y, z] = sub(p, centre);
  let q: Vec3;
  if (axis === "x") q = [x, y * c - z * s, y * s + z * c];
  else if (axis === "y") q = [x * c + z * s, y, -x * s + z * c];
  else q = [x * c - y * s, x * s + y * c, z];
  return add(q, centre);
}
