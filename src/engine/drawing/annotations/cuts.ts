/**
 * Annotators for prismatic cuts: slots, pockets, steps, V-grooves and edge chamfers. Sizes and locations
 * come from the feature's own numbers, measured from the datum faces (ISO 129-1 coordinate style); depths
 * go in the callout on the view that looks into the cut, so no dimension is drawn to a hidden line.
 */
import type { Axis, ChamferFeature, Direction, PocketFeature, SlotFeature, StepFeature, VGrooveFeature } from "../../parts/features";
import type { SignedAxis } from "../projection";
import { formatAngle } from "../format";
import { countPrefix } from "./callouts";
import { addAlong, axisOf, entryViews, locationFromDatum, otherAxes, signOf, sizeBetween, spanRegion, travel, AXES3 } from "./helpers";
import { throughLength, type AnnotateExtra } from "./holes";
import type { AnnotateContext, AnnotationRequest, OriginRegion } from "./types";

const TOL = 1e-6;

/** The conventional view looking along each axis (front, top, right of a block; front and end of a turned part). */
function conventionalView(ctx: AnnotateContext, axis: Axis): SignedAxis {
  if (ctx.baseKind === "turned") return axis === "z" ? "+z" : axis === "y" ? "+y" : "+x";
  return axis === "y" ? "-y" : axis === "z" ? "+z" : "+x";
}

function bothSides(ctx: AnnotateContext, axis: Axis): SignedAxis[] {
  const v = conventionalView(ctx, axis);
  return [v, `${v[0] === "+" ? "-" : "+"}${axis}` as SignedAxis];
}

function depthText(ctx: AnnotateContext, through: boolean | undefined, depth: number | undefined): string {
  return through || depth === undefined ? "through" : `× ${ctx.fmt.length(depth)} deep`;
}

export function annotateSlot(f: SlotFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  const h = axisOf(f.direction);
  const a = f.along;
  const p = AXES3.find((x) => x !== h && x !== a)!;
  const prefer = entryViews(f.direction);
  const depth = f.through || f.depth === undefined ? throughLength(ctx, f.at, f.direction) : f.depth;
  const w2 = f.width / 2;
  const end1 = f.at;
  const end2 = addAlong(f.at, a, f.length);
  const centreLine = (e: typeof end1) => spanRegion(e, travel(e, f.direction, depth), w2);
  return [
    ...locationFromDatum(ctx, extra.name, a, end1[a], centreLine(end1), prefer),
    ...locationFromDatum(ctx, extra.name, p, end1[p], spanRegion(end1, end2, w2), prefer),
    sizeBetween(extra.name, a, end1[a], end2[a], centreLine(end1), centreLine(end2), ctx.fmt.length(f.length), prefer),
    {
      kind: "callout",
      feature: extra.name,
      anchor: addAlong(addAlong(f.at, a, f.length / 2), p, w2),
      lines: [`${countPrefix(extra.count)}slot ${ctx.fmt.length(f.width)} wide ${depthText(ctx, f.through, f.depth)}`],
      prefer,
    },
  ];
}

/** Edges of a cut along one axis that lie inside the part (an edge on or past the outside needs no size). */
function insideEdges(ctx: AnnotateContext, axis: Axis, lo: number, hi: number): { lo: boolean; hi: boolean } {
  return { lo: lo > ctx.bbox.min[axis] + TOL, hi: hi < ctx.bbox.max[axis] - TOL };
}

/** Location and size along one axis of a cut spanning [lo, hi], from the datum. */
function extentDims(ctx: AnnotateContext, name: string, axis: Axis, lo: number, hi: number, edge: (c: number) => OriginRegion, prefer: SignedAxis[]): AnnotationRequest[] {
  const inside = insideEdges(ctx, axis, lo, hi);
  if (inside.lo && inside.hi) {
    const near = Math.abs(ctx.datum(axis) - lo) <= Math.abs(ctx.datum(axis) - hi) ? lo : hi;
    return [...locationFromDatum(ctx, name, axis, near, edge(near), prefer), sizeBetween(name, axis, lo, hi, edge(lo), edge(hi), ctx.fmt.length(hi - lo), prefer)];
  }
  if (inside.hi) return sizeFromFace(ctx, name, axis, ctx.bbox.min[axis], hi, edge, prefer);
  if (inside.lo) return sizeFromFace(ctx, name, axis, ctx.bbox.max[axis], lo, edge, prefer);
  return [];
}

/** The size of an open cut, measured from the outside face it breaks through to its inner edge. */
function sizeFromFace(ctx: AnnotateContext, name: string, axis: Axis, face: number, c: number, edge: (c: number) => OriginRegion, prefer: SignedAxis[]): AnnotationRequest[] {
  const faceRegion: OriginRegion = { min: { ...ctx.bbox.min, [axis]: face }, max: { ...ctx.bbox.max, [axis]: face } };
  return [sizeBetween(name, axis, Math.min(face, c), Math.max(face, c), face < c ? faceRegion : edge(c), face < c ? edge(c) : faceRegion, ctx.fmt.length(Math.abs(c - face)), prefer)];
}

export function annotatePocket(f: PocketFeature, ctx: AnnotateContext, extra: AnnotateExtra): AnnotationRequest[] {
  const h = axisOf(f.direction);
  const [u, v] = otherAxes(h);
  const prefer = entryViews(f.direction);
  const bottom = travel(f.at, f.direction, f.depth);
  if (f.shape.kind === "round") {
    const r = f.shape.diameter / 2;
    const axisRegion = spanRegion(f.at, bottom, r);
    return [
      ...locationFromDatum(ctx, extra.name, u, f.at[u], axisRegion, prefer),
      ...locationFromDatum(ctx, extra.name, v, f.at[v], axisRegion, prefer),
      {
        kind: "callout",
        feature: extra.name,
        anchor: addAlong(f.at, u, r),
        round: { centre: f.at, axis: h, radiusMm: r },
        lines: [`${countPrefix(extra.count)}${ctx.fmt.diameter(f.shape.diameter)} recess × ${ctx.fmt.length(f.depth)} deep`],
        prefer,
      },
    ];
  }
  const half = { [u]: f.shape.u / 2, [v]: f.shape.v / 2 } as Record<Axis, number>;
  const out: AnnotationRequest[] = [];
  for (const [axis, other] of [
    [u, v],
    [v, u],
  ] as const) {
    const lo = f.at[axis] - half[axis];
    const hi = f.at[axis] + half[axis];
    const edge = (c: number): OriginRegion =>
      spanRegion(
        { ...f.at, [axis]: c, [other]: f.at[other] - half[other] },
        { ...bottom, [axis]: c, [other]: f.at[other] + half[other] },
      );
    out.push(...extentDims(ctx, extra.name, axis, lo, hi, edge, prefer));
  }
  const corner = f.shape.cornerRadius ? `, corners R${ctx.fmt.length(f.shape.cornerRadius)}` : "";
  out.push({
    kind: "callout",
    feature: extra.name,
    anchor: addAlong(f.at, u, -half[u]),
    lines: [`${countPrefix(extra.count)}pocket ${ctx.fmt.length(f.depth)} deep${corner}`],
    prefer,
  });
  return out;
}

/**
 * Is this step a tread of a staircase along `axis`: does another step begin where this one ends (or end
 * where it begins)? Steps over the same range (a pair of side grooves) are not.
 */
function sharesEdge(ctx: AnnotateContext, f: StepFeature, axis: Axis, lo: number, hi: number): boolean {
  const near = (a: number, b: number) => Math.abs(a - b) < TOL;
  return ctx.part.features.some((g) => {
    if (g === f || g.kind !== "step" || g.when === false) return false;
    const glo = Math.min(g.from[axis], g.to[axis]);
    const ghi = Math.max(g.from[axis], g.to[axis]);
    return near(ghi, lo) || near(glo, hi);
  });
}

export function annotateStep(f: StepFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const lo = { x: Math.min(f.from.x, f.to.x), y: Math.min(f.from.y, f.to.y), z: Math.min(f.from.z, f.to.z) };
  const hi = { x: Math.max(f.from.x, f.to.x), y: Math.max(f.from.y, f.to.y), z: Math.max(f.from.z, f.to.z) };
  const partial = AXES3.filter((a) => {
    const inside = insideEdges(ctx, a, lo[a], hi[a]);
    return inside.lo || inside.hi;
  });
  const full = AXES3.filter((a) => !partial.includes(a));
  const out: AnnotationRequest[] = [];
  for (const axis of partial) {
    // Best: the view looking along an axis the step runs right through (it shows the step's profile).
    const prefer = [...full, ...partial.filter((a) => a !== axis)].filter((a) => a !== axis).flatMap((a) => bothSides(ctx, a));
    const edge = (c: number): OriginRegion => spanRegion({ ...lo, [axis]: c }, { ...hi, [axis]: c });
    const inside = insideEdges(ctx, axis, lo[axis], hi[axis]);
    // A tread of a staircase shares an edge with its neighbour: both edges from the datum (parallel
    // dimensioning, ISO 129-1) give each edge once, where location + width would repeat the shared edge
    // as a chain and over-dimension the part. A step sharing no edge keeps its width as a size (often
    // the functional one: an opening that fits another part).
    if (inside.lo && inside.hi && sharesEdge(ctx, f, axis, lo[axis], hi[axis])) {
      for (const c of [lo[axis], hi[axis]]) out.push(...locationFromDatum(ctx, name, axis, c, edge(c), prefer));
    } else out.push(...extentDims(ctx, name, axis, lo[axis], hi[axis], edge, prefer));
  }
  return out;
}

export function annotateVGroove(f: VGrooveFeature, ctx: AnnotateContext, name: string): AnnotationRequest[] {
  const h = axisOf(f.direction);
  const p = AXES3.find((x) => x !== h && x !== f.along)!;
  const prefer = bothSides(ctx, f.along);
  const halfWidth = f.depth * Math.tan((f.angleDeg * Math.PI) / 360);
  const line = spanRegion({ ...f.at, [f.along]: ctx.bbox.min[f.along] }, { ...f.at, [f.along]: ctx.bbox.max[f.along] }, halfWidth);
  const mid = { ...f.at, [f.along]: (ctx.bbox.min[f.along] + ctx.bbox.max[f.along]) / 2 };
  return [
    ...locationFromDatum(ctx, name, p, f.at[p], line, prefer),
    {
      kind: "callout",
      feature: name,
      anchor: addAlong(travel(mid, f.direction, f.depth / 2), p, halfWidth / 2),
      lines: [`${formatAngle(f.angleDeg)} V-groove × ${ctx.fmt.length(f.depth)} deep`],
      prefer,
    },
  ];
}

const BLOCK_FACE_WORDS: Record<Direction, string> = {
  "+z": "top face",
  "-z": "bottom face",
  "-y": "front face",
  "+y": "back face",
  "+x": "right-hand face",
  "-x": "left-hand face",
};
const TURNED_FACE_WORDS: Partial<Record<Direction, string>> = { "+z": "right-hand end", "-z": "left-hand end" };

/** "top face", "top and front faces", "both ends". */
function faceWords(ctx: AnnotateContext, faces: Direction[]): string {
  if (ctx.baseKind === "turned") {
    const ends = faces.filter((f) => f === "+z" || f === "-z");
    if (ends.length === 2) return "both ends";
    return TURNED_FACE_WORDS[ends[0] ?? "+z"] ?? "end";
  }
  const names = faces.map((f) => BLOCK_FACE_WORDS[f].replace(/ face$/, ""));
  return names.length === 1 ? `${names[0]} face` : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]} faces`;
}

/** One callout per chamfer feature, its leader on the first listed face where it is seen edge-on. */
export function annotateChamfer(f: ChamferFeature, ctx: AnnotateContext, name: string, endRadius: (face: Direction) => number | undefined): AnnotationRequest[] {
  const face = f.faces[0]!;
  const fa = axisOf(face);
  const faceCoord = signOf(face) > 0 ? ctx.bbox.max[fa] : ctx.bbox.min[fa];
  // Seen edge-on from the front (or from above for the front and back faces).
  const view: SignedAxis = ctx.baseKind === "turned" ? "+y" : fa === "y" ? "+z" : "-y";
  const q = AXES3.find((a) => a !== fa && a !== axisOf(view))!;
  const qEdge = ctx.baseKind === "turned" && fa === "z" ? (endRadius(face) ?? ctx.bbox.max[q]) : ctx.bbox.max[q];
  const mid = { x: (ctx.bbox.min.x + ctx.bbox.max.x) / 2, y: (ctx.bbox.min.y + ctx.bbox.max.y) / 2, z: (ctx.bbox.min.z + ctx.bbox.max.z) / 2 };
  const anchor = { ...mid, [fa]: faceCoord - signOf(face) * (f.size / 2), [q]: qEdge - f.size / 2 };
  const edges = ctx.baseKind === "turned" ? faceWords(ctx, f.faces) : `all edges of ${faceWords(ctx, f.faces)}`;
  return [
    {
      kind: "callout" as const,
      feature: name,
      anchor,
      lines: [`chamfer ${ctx.fmt.length(f.size)} × 45°, ${edges}`],
      prefer: [view, ...bothSides(ctx, axisOf(view))],
    },
  ];
}
