/**
 * Annotators for round cutting features: plain holes, tapped holes and a turned part's eccentric bore.
 * Each gives the feature's size (a callout on the view that looks into it) and its location (linear
 * dimensions from the datum faces along the two axes across the hole, ISO 129-1 §9 coordinate style).
 */
import { formatAngle } from "../format";
import type { Direction, EccentricBoreFeature, HoleFeature, InternalThreadFeature, Point3 } from "../../parts/features";
import { chamferLine, counterboreLine, countersinkLine, countPrefix, depthWords, sizeWithFit, threadLabel } from "./callouts";
import { stepRanges } from "./base";
import { addAlong, axisOf, entryViews, locationFromDatum, otherAxes, signOf, spanRegion, travel } from "./helpers";
import type { AnnotateContext, AnnotationRequest } from "./types";

export interface AnnotateExtra {
  name: string;
  /** Copies in a pattern (the callout reads "4× …"). */
  count?: number;
}

/** Length from the entry point to the far face of the base along the direction. */
export function throughLength(ctx: AnnotateContext, at: Point3, d: Direction): number {
  const a = axisOf(d);
  return signOf(d) > 0 ? ctx.bbox.max[a] - at[a] : at[a] - ctx.bbox.min[a];
}

function roundFeatureRequests(
  ctx: AnnotateContext,
  extra: AnnotateExtra,
  at: Point3,
  d: Direction,
  radiusMm: number,
  outerRadiusMm: number,
  lengthMm: number,
  lines: string[],
): AnnotationRequest[] {
  const h = axisOf(d);
  const [p, q] = otherAxes(h);
  const prefer = entryViews(d);
  const axisRegion = spanRegion(at, travel(at, d, lengthMm), radiusMm);
  return [
    ...locationFromDatum(ctx, extra.name, p, at[p], axisRegion, prefer),
    ...locationFromDatum(ctx, extra.name, q, at[q], axisRegion, prefer),
    {
      kind: "callout",
      feature: extra.name,
      anchor: addAlong(travel(at, d, Math.min(lengthMm / 2, 2)), p, radiusMm),
      round: { centre: at, axis: h, radiusMm: outerRadiusMm },
      lines,
      prefer,
    },
  ];
}

/**
 * Where a hole really enters: on a turned part a radial (±x, ±y) hole enters at the outside diameter of
 * the step it crosses, whatever `at` says along its direction (features.ts).
 */
export function entryPoint(ctx: AnnotateContext, at: Point3, d: Direction): Point3 {
  const base = ctx.part.features[0];
  const h = axisOf(d);
  if (ctx.baseKind !== "turned" || h === "z" || base?.kind !== "turned") return at;
  const step = stepRanges(base).find((r) => at.z >= r.z0 - 1e-9 && at.z <= r.z1 + 1e-9) ?? stepRanges(base)[0]!;
  return { ...at, [h]: -signOf(d) * (step.diameter / 2) };
}

export function annotateHole(f: HoleFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  const fmt = ctx.fmt;
  f = { ...f, at: entryPoint(ctx, f.at, f.direction) };
  const length = f.through || f.depth === undefined ? throughLength(ctx, f.at, f.direction) : f.depth;
  const finish = f.finish && f.finish !== "drilled" ? ` ${f.finish}` : "";
  const lines = [`${countPrefix(extra.count)}${sizeWithFit(ctx, f.diameter, f.fit)}${finish} ${depthWords(fmt, f.through, f.depth)}`];
  if (f.counterbore) lines.push(counterboreLine(fmt, f.counterbore));
  if (f.countersink) lines.push(countersinkLine(fmt, f.countersink));
  if (f.chamfer) lines.push(chamferLine(fmt, f.chamfer));
  const outer = Math.max(f.diameter, f.counterbore?.diameter ?? 0, f.countersink?.diameter ?? 0) / 2;
  return roundFeatureRequests(ctx, extra, f.at, f.direction, f.diameter / 2, outer, length, lines);
}

export function annotateInternalThread(f: InternalThreadFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  const fmt = ctx.fmt;
  const info = ctx.threads(f.designation);
  const through = f.through || f.depth === undefined;
  const threadLength = through ? throughLength(ctx, f.at, f.direction) : f.depth!;
  const drillDepth = through ? undefined : f.drillDepth;
  const lines = [`${countPrefix(extra.count)}${threadLabel(f.designation)} ${depthWords(fmt, through, f.depth)}`];
  lines.push(`tap drill ${fmt.diameter(info.tapDrillMm)} ${drillDepth !== undefined ? depthWords(fmt, false, drillDepth) : through ? "through" : ""}`.trim());
  if (f.chamfer) lines.push(chamferLine(fmt, f.chamfer));
  return [
    ...roundFeatureRequests(ctx, extra, f.at, f.direction, info.nominalMm / 2, info.nominalMm / 2, threadLength, lines),
    {
      kind: "thread-mark",
      feature: extra.name,
      form: "internal",
      start: f.at,
      direction: f.direction,
      lengthMm: threadLength,
      majorMm: info.nominalMm,
      minorMm: info.internalMinorMm,
    },
  ];
}

export function annotateEccentricBore(f: EccentricBoreFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  const fmt = ctx.fmt;
  const angle = ((f.angleDeg ?? 0) * Math.PI) / 180;
  const fromTop = (f.from ?? "top") === "top";
  const z = fromTop ? ctx.bbox.max.z : ctx.bbox.min.z;
  const d: Direction = fromTop ? "-z" : "+z";
  const at = { x: round6(f.eccentricity * Math.cos(angle)), y: round6(f.eccentricity * Math.sin(angle)), z };
  const length = f.through || f.depth === undefined ? ctx.bbox.max.z - ctx.bbox.min.z : f.depth;
  const finish = f.finish && f.finish !== "drilled" ? ` ${f.finish}` : "";
  const lines = [`${countPrefix(extra.count)}${sizeWithFit(ctx, f.diameter, f.fit)}${finish} ${depthWords(fmt, f.through, f.depth)}`];
  if (f.counterbore) lines.push(counterboreLine(fmt, f.counterbore));
  lines.push(`offset ${fmt.length(f.eccentricity)} from the part axis`);
  const outer = Math.max(f.diameter, f.counterbore?.diameter ?? 0) / 2;
  const requests = roundFeatureRequests(ctx, extra, at, d, f.diameter / 2, outer, length, lines);
  const deg = ((((f.angleDeg ?? 0) % 360) + 360) % 360);
  if (Math.abs(deg % 90) < 1e-6 || Math.abs((deg % 90) - 90) < 1e-6) return requests;
  // Off a centre line: polar location, the offset (in the callout) and its angle as a real angular
  // dimension in the end view. Seen from the right-hand end (+z) the part's +x axis is the upper centre
  // line and +y points left; the words are only the fallback for a drawing without an end view.
  const cw = -(((deg + 180) % 360) - 180);
  const words = `${formatAngle(Math.abs(cw))} ${cw > 0 ? "clockwise" : "anticlockwise"} from the upper centre line (seen from the right-hand end)`;
  const outlineRadiusMm = Math.max(ctx.bbox.max.x, ctx.bbox.max.y);
  return [
    ...requests.filter((r) => !(r.kind === "linear" && r.role === "location")),
    { kind: "angular", feature: extra.name, vertex: { x: 0, y: 0, z }, axis: "z", through: at, outlineRadiusMm, fallbackLine: words, prefer: entryViews(d) },
  ];
}

/** Rounds away floating noise from cos/sin (cos 90° = 6e-17). */
function round6(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}
