/**
 * Cleans the raw output of the hidden-line algorithm into what a draughtsman would draw:
 *  - a hidden edge lying under a visible one is not drawn (ISO 128-2: the visible line takes precedence),
 *    so on every straight carrier line and every circle the visible intervals are subtracted from the
 *    hidden ones;
 *  - edges repeated on the same carrier (the back outline repeats the front one) are merged, and touching
 *    collinear pieces join into one line, so each drawn line is one entity in SVG/DXF;
 *  - a piece lying wholly on one visible edge of another kind (a short chord on a visible circle, a curve
 *    on its visible twin) is dropped too, hidden or visible: it would be drawn twice.
 * Pure geometry on the view's 2D frame.
 */
import type { ViewCurve, ViewEdge, ViewPoint } from "@/engine/drawing/projection";
import { distanceToSegment, norm360 } from "./classify";

/** Same-carrier and coincidence tolerance, mm. */
export const CLEANUP_TOLERANCE_MM = 1e-3;
/** Pieces shorter than this are dropped after subtraction, mm. */
export const MIN_PIECE_MM = 0.01;

type Interval = [number, number];

interface LineCarrier {
  /** Unit direction, canonical (x > 0, or x = 0 and y > 0). */
  ux: number;
  uy: number;
  /** Signed distance of the line from the origin along the normal (−uy, ux). */
  offset: number;
}

interface CircleCarrier {
  centre: ViewPoint;
  radius: number;
}

interface Group<C> {
  carrier: C;
  visible: Interval[];
  hidden: Interval[];
}

function lineCarrier(from: ViewPoint, to: ViewPoint): LineCarrier | undefined {
  let ux = to.x - from.x;
  let uy = to.y - from.y;
  const len = Math.hypot(ux, uy);
  if (len < MIN_PIECE_MM) return undefined;
  ux /= len;
  uy /= len;
  if (ux < -1e-12 || (Math.abs(ux) <= 1e-12 && uy < 0)) {
    ux = -ux;
    uy = -uy;
  }
  const offset = -uy * from.x + ux * from.y;
  return { ux, uy, offset };
}

/** Distance of a point from a carrier line. */
function offLine(c: LineCarrier, p: ViewPoint): number {
  return Math.abs(-c.uy * p.x + c.ux * p.y - c.offset);
}

/**
 * A segment lies on a carrier when both its ends are within tol of the carrier line (so it is parallel
 * to within 2·tol over its own length — segments shorter than MIN_PIECE_MM never get here).
 */
function onLine(c: LineCarrier, from: ViewPoint, to: ViewPoint, tol: number): boolean {
  return offLine(c, from) < tol && offLine(c, to) < tol;
}

function sameCircle(a: CircleCarrier, b: CircleCarrier, tol: number): boolean {
  return Math.hypot(a.centre.x - b.centre.x, a.centre.y - b.centre.y) < tol && Math.abs(a.radius - b.radius) < tol;
}

/** Union of intervals, joining those that overlap or touch within tol. */
export function unionIntervals(intervals: Interval[], tol: number): Interval[] {
  const sorted = [...intervals].sort((a, b) => a[0] - b[0]);
  const out: Interval[] = [];
  for (const [s, e] of sorted) {
    const lastI = out[out.length - 1];
    if (lastI && s <= lastI[1] + tol) lastI[1] = Math.max(lastI[1], e);
    else out.push([s, e]);
  }
  return out;
}

/** `a` minus the union `b` (both unions of disjoint sorted intervals). */
export function subtractIntervals(a: Interval[], b: Interval[], tol: number): Interval[] {
  const out: Interval[] = [];
  for (const [s0, e0] of a) {
    let pieces: Interval[] = [[s0, e0]];
    for (const [bs, be] of b) {
      const next: Interval[] = [];
      for (const [s, e] of pieces) {
        if (be <= s + tol || bs >= e - tol) {
          next.push([s, e]);
          continue;
        }
        if (bs > s + tol) next.push([s, bs]);
        if (be < e - tol) next.push([be, e]);
      }
      pieces = next;
    }
    out.push(...pieces);
  }
  return out;
}

/** Angular intervals of a curve on its circle, degrees within [0, 360], split at 0°. */
function angularIntervals(curve: ViewCurve): Interval[] {
  if (curve.type === "circle") return [[0, 360]];
  if (curve.type !== "arc") return [];
  const s = norm360(curve.startDeg);
  const span = Math.min(360, curve.endDeg - curve.startDeg);
  const e = s + span;
  return e <= 360 ? [[s, e]] : [
    [s, 360],
    [0, e - 360],
  ];
}

function findOrAdd<C>(groups: Group<C>[], carrier: C, same: (existing: C) => boolean): Group<C> {
  let g = groups.find((x) => same(x.carrier));
  if (!g) {
    g = { carrier, visible: [], hidden: [] };
    groups.push(g);
  }
  return g;
}

function lineEdges(g: Group<LineCarrier>, visibility: "visible" | "hidden", intervals: Interval[]): ViewEdge[] {
  const { ux, uy, offset } = g.carrier;
  const nx = -uy;
  const ny = ux;
  return intervals
    .filter(([s, e]) => e - s >= MIN_PIECE_MM)
    .map(([s, e]) => ({
      visibility,
      curve: {
        type: "line" as const,
        from: { x: nx * offset + ux * s, y: ny * offset + uy * s },
        to: { x: nx * offset + ux * e, y: ny * offset + uy * e },
      },
    }));
}

function circleEdges(g: Group<CircleCarrier>, visibility: "visible" | "hidden", intervals: Interval[], angTol: number): ViewEdge[] {
  const { centre, radius } = g.carrier;
  const list = intervals.filter(([s, e]) => ((e - s) * Math.PI * radius) / 180 >= MIN_PIECE_MM);
  if (list.length === 1 && list[0]![0] <= angTol && list[0]![1] >= 360 - angTol) {
    return [{ visibility, curve: { type: "circle", centre, radius } }];
  }
  // Join the piece ending at 360° with the one starting at 0° into one arc across 0°.
  const first = list[0];
  const lastI = list[list.length - 1];
  if (list.length > 1 && first && lastI && first[0] <= angTol && lastI[1] >= 360 - angTol) {
    list.shift();
    list[list.length - 1] = [lastI[0], 360 + first[1]];
  }
  return list.map(([s, e]) => ({ visibility, curve: { type: "arc" as const, centre, radius, startDeg: s, endDeg: e } }));
}

/** The cleaned edge list: visible first, then the hidden remainder, polylines passed through. */
export function cleanEdges(raw: ViewEdge[], tol = CLEANUP_TOLERANCE_MM): ViewEdge[] {
  const lines: Group<LineCarrier>[] = [];
  const circles: Group<CircleCarrier>[] = [];
  const polylines: ViewEdge[] = [];
  for (const edge of raw) {
    const c = edge.curve;
    if (c.type === "line") {
      const lc = lineCarrier(c.from, c.to);
      if (!lc) continue;
      const g = findOrAdd(lines, lc, (x) => onLine(x, c.from, c.to, tol));
      // Measured along the group's own carrier: a nearly vertical segment may point the other way.
      const t0 = g.carrier.ux * c.from.x + g.carrier.uy * c.from.y;
      const t1 = g.carrier.ux * c.to.x + g.carrier.uy * c.to.y;
      g[edge.visibility].push([Math.min(t0, t1), Math.max(t0, t1)]);
    } else if (c.type === "circle" || c.type === "arc") {
      const carrier = { centre: c.centre, radius: c.radius };
      const g = findOrAdd(circles, carrier, (x) => sameCircle(x, carrier, tol));
      g[edge.visibility].push(...angularIntervals(c));
    } else {
      polylines.push(edge);
    }
  }
  const out: ViewEdge[] = [];
  const hiddenOut: ViewEdge[] = [];
  for (const g of lines) {
    const vis = unionIntervals(g.visible, tol);
    const hid = subtractIntervals(unionIntervals(g.hidden, tol), vis, tol);
    out.push(...lineEdges(g, "visible", vis));
    hiddenOut.push(...lineEdges(g, "hidden", hid));
  }
  for (const g of circles) {
    const angTol = ((tol / Math.max(g.carrier.radius, tol)) * 180) / Math.PI;
    const vis = unionIntervals(g.visible, angTol);
    const hid = subtractIntervals(unionIntervals(g.hidden, angTol), vis, angTol);
    out.push(...circleEdges(g, "visible", vis, angTol));
    hiddenOut.push(...circleEdges(g, "hidden", hid, angTol));
  }
  // Longest first, so that of two copies of a line the longer (or first) stays.
  const visible: ViewEdge[] = [];
  for (const v of [...out, ...polylines.filter((p) => p.visibility === "visible")].sort((a, b) => curveLength(b.curve) - curveLength(a.curve))) {
    if (!coveredByOne(v.curve, visible, 2 * tol)) visible.push(v);
  }
  const hidden = [...hiddenOut, ...polylines.filter((p) => p.visibility === "hidden")];
  return [...visible, ...hidden.filter((h) => !coveredByOne(h.curve, visible, 2 * tol))];
}

/** Length of a drawn curve, mm. */
function curveLength(c: ViewCurve): number {
  if (c.type === "line") return Math.hypot(c.to.x - c.from.x, c.to.y - c.from.y);
  if (c.type === "polyline") return c.points.reduce((sum, p, i) => (i === 0 ? 0 : sum + Math.hypot(p.x - c.points[i - 1]!.x, p.y - c.points[i - 1]!.y)), 0);
  return ((c.type === "circle" ? 360 : c.endDeg - c.startDeg) * Math.PI * c.radius) / 180;
}

/**
 * Whether a piece lies wholly on one of the visible edges (a short chord on a visible circle, a curve on
 * its visible twin): the carriers above only compare like with like.
 */
function coveredByOne(curve: ViewCurve, visible: ViewEdge[], tol: number): boolean {
  const probe = probePoints(curve);
  return visible.some((v) => probe.every((p) => distanceToCurve(p, v.curve) <= tol));
}

/** A few points along a curve: its ends and three between. */
function probePoints(c: ViewCurve): ViewPoint[] {
  const fractions = [0, 0.25, 0.5, 0.75, 1];
  if (c.type === "line") return fractions.map((f) => ({ x: c.from.x + (c.to.x - c.from.x) * f, y: c.from.y + (c.to.y - c.from.y) * f }));
  if (c.type === "polyline") return fractions.map((f) => c.points[Math.round(f * (c.points.length - 1))]!);
  const s = c.type === "arc" ? c.startDeg : 0;
  const e = c.type === "arc" ? c.endDeg : 360;
  return fractions.map((f) => {
    const a = ((s + (e - s) * f) * Math.PI) / 180;
    return { x: c.centre.x + c.radius * Math.cos(a), y: c.centre.y + c.radius * Math.sin(a) };
  });
}

/** Distance from a point to a drawn curve, mm. */
export function distanceToCurve(p: ViewPoint, c: ViewCurve): number {
  if (c.type === "line") return distanceToSegment(p, c.from, c.to);
  if (c.type === "polyline") {
    let best = Infinity;
    for (let i = 1; i < c.points.length; i++) best = Math.min(best, distanceToSegment(p, c.points[i - 1]!, c.points[i]!));
    return best;
  }
  const r = Math.hypot(p.x - c.centre.x, p.y - c.centre.y);
  if (c.type === "circle") return Math.abs(r - c.radius);
  const span = norm360(c.endDeg - c.startDeg) || 360;
  const along = norm360((Math.atan2(p.y - c.centre.y, p.x - c.centre.x) * 180) / Math.PI - c.startDeg);
  if (along <= span) return Math.abs(r - c.radius);
  const end = (deg: number) => ({ x: c.centre.x + c.radius * Math.cos((deg * Math.PI) / 180), y: c.centre.y + c.radius * Math.sin((deg * Math.PI) / 180) });
  return Math.min(Math.hypot(p.x - end(c.startDeg).x, p.y - end(c.startDeg).y), Math.hypot(p.x - end(c.endDeg).x, p.y - end(c.endDeg).y));
}

/** Bounding box of edges (arcs by their extreme points). */
export function edgeBounds(edges: ViewEdge[]): { minX: number; minY: number; maxX: number; maxY: number } {
  const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const add = (p: ViewPoint) => {
    b.minX = Math.min(b.minX, p.x);
    b.minY = Math.min(b.minY, p.y);
    b.maxX = Math.max(b.maxX, p.x);
    b.maxY = Math.max(b.maxY, p.y);
  };
  for (const { curve: c } of edges) {
    if (c.type === "line") {
      add(c.from);
      add(c.to);
    } else if (c.type === "polyline") {
      c.points.forEach(add);
    } else {
      const s = c.type === "arc" ? c.startDeg : 0;
      const e = c.type === "arc" ? c.endDeg : 360;
      const pt = (a: number) => ({ x: c.centre.x + c.radius * Math.cos((a * Math.PI) / 180), y: c.centre.y + c.radius * Math.sin((a * Math.PI) / 180) });
      add(pt(s));
      add(pt(e));
      for (let q = Math.ceil(s / 90) * 90; q <= e; q += 90) add(pt(q));
    }
  }
  if (!Number.isFinite(b.minX)) return { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  return b;
}
