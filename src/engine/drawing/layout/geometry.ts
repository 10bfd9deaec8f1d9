/**
 * 2D helpers for laying out annotations: segment crossings against a view's edges, and boxes.
 */
import type { ViewCurve, ViewEdge, ViewPoint } from "../projection";

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export const emptyBox = (): Box => ({ minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity });

export function growBox(b: Box, x: number, y: number): void {
  b.minX = Math.min(b.minX, x);
  b.minY = Math.min(b.minY, y);
  b.maxX = Math.max(b.maxX, x);
  b.maxY = Math.max(b.maxY, y);
}

export function unionBox(a: Box, b: Box): Box {
  return { minX: Math.min(a.minX, b.minX), minY: Math.min(a.minY, b.minY), maxX: Math.max(a.maxX, b.maxX), maxY: Math.max(a.maxY, b.maxY) };
}

export function boxesOverlap(a: Box, b: Box, pad = 0): boolean {
  return a.minX < b.maxX + pad && b.minX < a.maxX + pad && a.minY < b.maxY + pad && b.minY < a.maxY + pad;
}

/** Parameters t in (0, 1] along p→q where it meets segment a→b (collinear overlaps ignored). */
function segmentHits(p: ViewPoint, q: ViewPoint, a: ViewPoint, b: ViewPoint): number[] {
  const rx = q.x - p.x;
  const ry = q.y - p.y;
  const sx = b.x - a.x;
  const sy = b.y - a.y;
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-12) return [];
  const t = ((a.x - p.x) * sy - (a.y - p.y) * sx) / den;
  const u = ((a.x - p.x) * ry - (a.y - p.y) * rx) / den;
  return u >= -1e-9 && u <= 1 + 1e-9 ? [t] : [];
}

function circleHits(p: ViewPoint, q: ViewPoint, c: ViewPoint, r: number, arc?: { startDeg: number; endDeg: number }): number[] {
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  const fx = p.x - c.x;
  const fy = p.y - c.y;
  const A = dx * dx + dy * dy;
  const B = 2 * (fx * dx + fy * dy);
  const C = fx * fx + fy * fy - r * r;
  const disc = B * B - 4 * A * C;
  if (A < 1e-18 || disc < 0) return [];
  const sq = Math.sqrt(disc);
  const ts = [(-B - sq) / (2 * A), (-B + sq) / (2 * A)];
  if (!arc) return ts;
  return ts.filter((t) => {
    let ang = (Math.atan2(p.y + t * dy - c.y, p.x + t * dx - c.x) * 180) / Math.PI;
    while (ang < arc.startDeg) ang += 360;
    return ang <= arc.endDeg + 1e-6;
  });
}

function curveHits(p: ViewPoint, q: ViewPoint, c: ViewCurve): number[] {
  switch (c.type) {
    case "line":
      return segmentHits(p, q, c.from, c.to);
    case "polyline":
      return c.points.slice(1).flatMap((pt, i) => segmentHits(p, q, c.points[i]!, pt));
    case "circle":
      return circleHits(p, q, c.centre, c.radius);
    case "arc":
      return circleHits(p, q, c.centre, c.radius, c);
  }
}

/**
 * How many visible edges the segment p→q meets after leaving p (hits within `startTol` of p are the edge
 * the segment starts on and do not count; a hit at q does: the segment then runs into material).
 */
export function crossings(p: ViewPoint, q: ViewPoint, edges: ViewEdge[], startTol = 1e-3): number {
  const len = Math.hypot(q.x - p.x, q.y - p.y);
  if (len < startTol) return 0;
  const tMin = startTol / len;
  let n = 0;
  for (const e of edges) {
    if (e.visibility !== "visible") continue;
    for (const t of curveHits(p, q, e.curve)) if (t > tMin && t <= 1 + 1e-9) n++;
  }
  return n;
}

/** Does segment p→q pass through box b? (Liang–Barsky clip.) */
export function segmentHitsBox(p: { x: number; y: number }, q: { x: number; y: number }, b: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  const checks: [number, number][] = [
    [-dx, p.x - b.minX],
    [dx, b.maxX - p.x],
    [-dy, p.y - b.minY],
    [dy, b.maxY - p.y],
  ];
  for (const [pp, qq] of checks) {
    if (Math.abs(pp) < 1e-12) {
      if (qq < 0) return false;
    } else {
      const r = qq / pp;
      if (pp < 0) t0 = Math.max(t0, r);
      else t1 = Math.min(t1, r);
      if (t0 > t1) return false;
    }
  }
  return true;
}
