/**
 * Turns sampled projected curves back into exact drawing primitives.
 *
 * The hidden-line algorithm returns some edges as B-splines even when they are straight (a circle seen
 * edge-on) or circular; drawn as they are they become many short segments in SVG/DXF and break dimensioning.
 * Plain geometry decides: points all within `tolMm` of their chord are a line; points all within `tolMm`
 * of the circle through the first, middle and last points are an arc; anything else stays a polyline.
 */
import type { ViewCurve, ViewPoint } from "@/engine/drawing/projection";

export const CLASSIFY_TOLERANCE_MM = 1e-3;

const dist = (a: ViewPoint, b: ViewPoint) => Math.hypot(a.x - b.x, a.y - b.y);

/** Distance of p from the infinite line through a and b (a ≠ b). */
function distanceToLine(p: ViewPoint, a: ViewPoint, b: ViewPoint): number {
  const len = dist(a, b);
  return Math.abs((b.x - a.x) * (a.y - p.y) - (a.x - p.x) * (b.y - a.y)) / len;
}

/** Distance of p from the segment ab. */
export function distanceToSegment(p: ViewPoint, a: ViewPoint, b: ViewPoint): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const f = len2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2)) : 0;
  return Math.hypot(p.x - a.x - f * dx, p.y - a.y - f * dy);
}

/** Circumcentre of three points, or undefined when they are (nearly) collinear. */
export function circumcentre(a: ViewPoint, b: ViewPoint, c: ViewPoint): ViewPoint | undefined {
  const d = 2 * (a.x * (b.y - c.y) + b.x * (c.y - a.y) + c.x * (a.y - b.y));
  if (Math.abs(d) < 1e-12) return undefined;
  const a2 = a.x * a.x + a.y * a.y;
  const b2 = b.x * b.x + b.y * b.y;
  const c2 = c.x * c.x + c.y * c.y;
  return {
    x: (a2 * (b.y - c.y) + b2 * (c.y - a.y) + c2 * (a.y - b.y)) / d,
    y: (a2 * (c.x - b.x) + b2 * (a.x - c.x) + c2 * (b.x - a.x)) / d,
  };
}

/** Angle of p around c in degrees, in [0, 360). */
export function angleDeg(c: ViewPoint, p: ViewPoint): number {
  const a = (Math.atan2(p.y - c.y, p.x - c.x) * 180) / Math.PI;
  // A point a hair below the +x axis is at 0°, not 359.99999°.
  return a < -1e-7 ? a + 360 : Math.max(a, 0);
}

/** Normalises an angle to [0, 360). */
export function norm360(a: number): number {
  const r = a % 360;
  return r < 0 ? r + 360 : r;
}

/**
 * An arc from `start` to `end` passing through `mid`, as a counter-clockwise arc (startDeg < endDeg).
 * Returns a circle when start and end coincide.
 */
export function arcThrough(centre: ViewPoint, radius: number, start: ViewPoint, mid: ViewPoint, end: ViewPoint, tolMm = CLASSIFY_TOLERANCE_MM): ViewCurve {
  if (dist(start, end) < tolMm) return { type: "circle", centre, radius };
  const a0 = angleDeg(centre, start);
  const am = angleDeg(centre, mid);
  const a1 = angleDeg(centre, end);
  const ccwSpan = norm360(a1 - a0);
  const ccwToMid = norm360(am - a0);
  // Counter-clockwise from start reaches mid before end: the arc runs start → end CCW; else end → start.
  const [s, e] = ccwToMid <= ccwSpan ? [a0, a0 + ccwSpan] : [a1, a1 + norm360(a0 - a1)];
  return { type: "arc", centre, radius, startDeg: s, endDeg: e };
}

/**
 * The line covered by the points when they are all collinear within `tolMm`, from one extreme to the
 * other (a circle seen edge-on can come back as a spline that runs out and back along the same line).
 */
function asLine(points: ViewPoint[], tolMm: number): ViewCurve | undefined {
  const first = points[0]!;
  let far = first;
  for (const p of points) if (dist(first, p) > dist(first, far)) far = p;
  if (dist(first, far) <= tolMm) return undefined;
  if (!points.every((p) => distanceToLine(p, first, far) <= tolMm)) return undefined;
  const len = dist(first, far);
  const ux = (far.x - first.x) / len;
  const uy = (far.y - first.y) / len;
  let tMin = 0;
  let tMax = 0;
  for (const p of points) {
    const t = (p.x - first.x) * ux + (p.y - first.y) * uy;
    tMin = Math.min(tMin, t);
    tMax = Math.max(tMax, t);
  }
  return {
    type: "line",
    from: { x: first.x + ux * tMin, y: first.y + uy * tMin },
    to: { x: first.x + ux * tMax, y: first.y + uy * tMax },
  };
}

/** Classifies an ordered run of sample points (at least two) along one projected edge. */
export function classifySamples(points: ViewPoint[], tolMm = CLASSIFY_TOLERANCE_MM): ViewCurve {
  if (points.length < 2) throw new Error("A projected edge needs at least two sample points.");
  const first = points[0]!;
  const last = points[points.length - 1]!;
  const mid = points[Math.floor(points.length / 2)]!;
  const chord = dist(first, last);
  const straight = asLine(points, tolMm);
  if (straight) return straight;
  if (chord <= tolMm) return classifyClosed(points, tolMm);
  const centre = circumcentre(first, mid, last);
  if (centre) {
    const radius = dist(centre, first);
    if (points.every((pt) => Math.abs(dist(centre, pt) - radius) <= tolMm)) return arcThrough(centre, radius, first, mid, last, tolMm);
  }
  return { type: "polyline", points };
}

/**
 * A run that ends where it starts: once around a circle, or out along a curve and back over it (a cross
 * hole's edge on a round face, seen along that face's axis, doubles back over an arc of the face's
 * outline); that one is drawn as the part out to the turning point.
 */
function classifyClosed(points: ViewPoint[], tolMm: number): ViewCurve {
  const first = points[0]!;
  const third = points[Math.floor(points.length / 3)]!;
  const twoThirds = points[Math.floor((2 * points.length) / 3)]!;
  const centre = circumcentre(first, third, twoThirds);
  if (centre) {
    const radius = dist(centre, first);
    if (Math.abs(sweepDeg(centre, points)) >= 350 && points.every((pt) => Math.abs(dist(centre, pt) - radius) <= tolMm)) return { type: "circle", centre, radius };
  }
  const turn = points.reduce((far, pt) => (dist(first, pt) > dist(first, far) ? pt : far), first);
  const out = points.slice(0, points.indexOf(turn) + 1);
  // Only when the way back retraces the way out: a closed loop (an ellipse) is not halved.
  const retraced = points.slice(out.length).every((pt) => out.some((q, i) => i > 0 && distanceToSegment(pt, out[i - 1]!, q) <= 10 * tolMm));
  if (out.length >= 2 && out.length < points.length && dist(first, turn) > tolMm && retraced) return classifySamples(out, tolMm);
  return { type: "polyline", points };
}

/** The signed angle the points turn through about `centre`, degrees (±360 once around). */
function sweepDeg(centre: ViewPoint, points: ViewPoint[]): number {
  let sweep = 0;
  for (let i = 1; i < points.length; i++) {
    let d = angleDeg(centre, points[i]!) - angleDeg(centre, points[i - 1]!);
    if (d > 180) d -= 360;
    if (d < -180) d += 360;
    sweep += d;
  }
  return sweep;
}
