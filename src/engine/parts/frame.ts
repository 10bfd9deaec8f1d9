/**
 * Part-local geometry helpers shared by the degenerate-geometry guard, the analytic volume and the engine's
 * wall checks. All lengths in mm; frames as documented in features.ts.
 */
import type { Axis, BlockFeature, Direction, Point3, ResolvedPart, TurnedFeature } from "./features";

export interface TurnedStepSpan {
  index: number;
  diameter: number;
  zStart: number;
  zEnd: number;
}

export type BaseGeometry =
  | { kind: "block"; feature: BlockFeature; min: Point3; max: Point3 }
  | { kind: "turned"; feature: TurnedFeature; min: Point3; max: Point3; steps: TurnedStepSpan[]; lengthMm: number; maxDiameter: number };

export const AXIS_LIST: readonly Axis[] = ["x", "y", "z"];

export const axisOf = (d: Direction): Axis => d[1] as Axis;
export const signOf = (d: Direction): 1 | -1 => (d[0] === "-" ? -1 : 1);
export const coord = (p: Point3, a: Axis): number => p[a];

/** The two axes of the face a tool enters, in x, y, z order (u, v of a pocket). */
export function faceAxes(d: Direction): [Axis, Axis] {
  const n = axisOf(d);
  const others = AXIS_LIST.filter((a) => a !== n);
  return [others[0]!, others[1]!];
}

/** The base of a part (its first feature) as a box or a stack of turned steps. */
export function baseGeometry(part: ResolvedPart): BaseGeometry {
  const base = part.features[0];
  if (!base) throw new Error(`Part "${part.id}" has no features.`);
  if (base.kind === "block") {
    return { kind: "block", feature: base, min: { x: 0, y: 0, z: 0 }, max: { ...base.size } };
  }
  if (base.kind === "turned") {
    let z = 0;
    const steps: TurnedStepSpan[] = base.steps.map((s, index) => {
      const span = { index, diameter: s.diameter, zStart: z, zEnd: z + s.length };
      z += s.length;
      return span;
    });
    const maxDiameter = Math.max(...base.steps.map((s) => s.diameter));
    const r = maxDiameter / 2;
    return { kind: "turned", feature: base, steps, lengthMm: z, maxDiameter, min: { x: -r, y: -r, z: 0 }, max: { x: r, y: r, z } };
  }
  throw new Error(`Part "${part.id}" must start with a block or turned base, not ${base.kind}.`);
}

/** Material available from `at` along `direction` to the far side of the base's box (≥ 0). */
export function availableDepth(base: BaseGeometry, at: Point3, direction: Direction): number {
  const a = axisOf(direction);
  return signOf(direction) > 0 ? base.max[a] - at[a] : at[a] - base.min[a];
}

/** The turned step that contains height z (the lower step at a shoulder), or undefined outside the part. */
export function stepAt(base: Extract<BaseGeometry, { kind: "turned" }>, z: number): TurnedStepSpan | undefined {
  return base.steps.find((s) => z >= s.zStart - 1e-9 && z <= s.zEnd + 1e-9);
}

/** Steps whose z-range overlaps [z0, z1]. */
export function stepsBetween(base: Extract<BaseGeometry, { kind: "turned" }>, z0: number, z1: number): TurnedStepSpan[] {
  const lo = Math.min(z0, z1);
  const hi = Math.max(z0, z1);
  return base.steps.filter((s) => s.zEnd > lo + 1e-9 && s.zStart < hi - 1e-9);
}

export function add(p: Point3, q: Point3, k = 1): Point3 {
  return { x: p.x + k * q.x, y: p.y + k * q.y, z: p.z + k * q.z };
}

/** Rotates p about the axis through `centre` parallel to `axis` by `angleDeg` (right-hand rule). */
export function rotateAbout(p: Point3, centre: Point3, axis: Axis, angleDeg: number): Point3 {
  const a = (angleDeg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  const x = p.x - centre.x;
  const y = p.y - centre.y;
  const z = p.z - centre.z;
  let q: Point3;
  if (axis === "x") q = { x, y: y * c - z * s, z: y * s + z * c };
  else if (axis === "y") q = { x: x * c + z * s, y, z: -x * s + z * c };
  else q = { x: x * c - y * s, y: x * s + y * c, z };
  return add(q, centre);
}
