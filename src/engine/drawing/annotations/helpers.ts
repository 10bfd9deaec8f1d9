/**
 * Small part-space helpers shared by the feature annotators.
 */
import type { Axis, Direction, Point3 } from "../../parts/features";
import type { SignedAxis } from "../projection";
import type { AnnotateContext, LinearRequest, OriginRegion } from "./types";

export const AXES3: readonly Axis[] = ["x", "y", "z"];
const TOL = 1e-6;

export const axisOf = (d: Direction | SignedAxis): Axis => d[1] as Axis;
export const signOf = (d: Direction | SignedAxis): 1 | -1 => (d[0] === "-" ? -1 : 1);
export const negate = (d: Direction | SignedAxis): SignedAxis => `${d[0] === "-" ? "+" : "-"}${d[1]}` as SignedAxis;
export const signed = (d: Direction): SignedAxis => d as SignedAxis;

/** The two axes perpendicular to `a`, in x, y, z order. */
export function otherAxes(a: Axis): [Axis, Axis] {
  const rest = AXES3.filter((x) => x !== a);
  return [rest[0]!, rest[1]!];
}

export function addAlong(p: Point3, axis: Axis, amount: number): Point3 {
  return { ...p, [axis]: p[axis] + amount };
}

/** p moved `lengthMm` in direction d. */
export function travel(p: Point3, d: Direction | SignedAxis, lengthMm: number): Point3 {
  return addAlong(p, axisOf(d), signOf(d) * lengthMm);
}

export const pointRegion = (p: Point3, clearanceMm = 0): OriginRegion => ({ min: p, max: p, clearanceMm });

/** The box spanned by two points. */
export function spanRegion(p: Point3, q: Point3, clearanceMm = 0): OriginRegion {
  const min = { x: Math.min(p.x, q.x), y: Math.min(p.y, q.y), z: Math.min(p.z, q.z) };
  const max = { x: Math.max(p.x, q.x), y: Math.max(p.y, q.y), z: Math.max(p.z, q.z) };
  return { min, max, clearanceMm };
}

/** The part's bounding face at coordinate `c` along `axis` (where an extension line from a datum starts). */
export function faceRegion(ctx: AnnotateContext, axis: Axis, c: number): OriginRegion {
  return { min: { ...ctx.bbox.min, [axis]: c }, max: { ...ctx.bbox.max, [axis]: c } };
}

/**
 * A location dimension from the datum plane along `axis` to coordinate `c` of a feature (whose extension
 * line starts in `origin`), or nothing when the feature sits on the datum (nothing to measure).
 */
export function locationFromDatum(ctx: AnnotateContext, feature: string, axis: Axis, c: number, origin: OriginRegion, prefer: SignedAxis[]): LinearRequest[] {
  const d = ctx.datum(axis);
  if (Math.abs(c - d) < TOL) return [];
  const datumOrigin =
    ctx.baseKind === "turned" && axis !== "z"
      ? // A turned part's radial datum is its axis: the extension line starts on the centre line.
        { min: { ...ctx.bbox.min, x: 0, y: 0 }, max: { ...ctx.bbox.max, x: 0, y: 0 } }
      : faceRegion(ctx, axis, d);
  return [
    {
      kind: "linear",
      feature,
      role: "location",
      axis,
      a: d,
      b: c,
      originA: datumOrigin,
      originB: origin,
      text: ctx.fmt.length(Math.abs(c - d)),
      prefer,
    },
  ];
}

/** A size dimension between two coordinates of one feature. */
export function sizeBetween(feature: string, axis: Axis, a: number, b: number, originA: OriginRegion, originB: OriginRegion, text: string, prefer: SignedAxis[], role: LinearRequest["role"] = "size"): LinearRequest {
  return { kind: "linear", feature, role, axis, a, b, originA, originB, text, prefer };
}

/** Human name of a feature for messages and coverage: its label, id, or kind and index. */
export function featureName(f: { kind: string; id?: string; label?: string }, index: number): string {
  return f.label ?? f.id ?? `${f.kind} ${index + 1}`;
}

/** Views in which a direction's entry face is seen (the viewer faces the tool), then the far side. */
export function entryViews(direction: Direction): SignedAxis[] {
  return [negate(direction), signed(direction)];
}
