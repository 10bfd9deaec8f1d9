/**
 * Hidden lines by sight lines: a second way to the same view as `projectEdges` (hlr.ts), for the shapes
 * where the exact algorithm is slow.
 *
 * Why: a cross hole through a turned part leaves intersection curves (B-splines of degree 8) whose front
 * and back halves fall exactly on top of each other in a side view, or on the part's outline in an end
 * view. `HLRBRep_Algo.Hide()` spends about a second per such view resolving those overlaps — most of a
 * drawing pack's time. Overlapping lines need no resolving for a drawing: either copy may be drawn.
 *
 * How: the drawn lines are the solid's sharp edges and its silhouettes (the outlines OpenCascade's
 * outliner finds for the view, in 3D, without the hiding pass). Each is sampled, projected, and cut where
 * its visibility can change: where its projection crosses another line's, where a line running on top of
 * it ends, and where it turns back on itself (a circle seen edge-on, at its ends). The middle of each
 * piece is then tested along the sight line toward the viewer against the solid's triangulation: hidden
 * when a face lies in front of it by more than the triangulation's deviation. Faces seen edge-on are left
 * out of that test (they cover nothing). Pieces keep their exact geometry: lines stay lines, circles in
 * the view's plane stay circles and arcs; other curves are sampled and classified as hlr.ts does.
 *
 * When: only views where a free-form edge falls on another line, on a circle or back over itself
 * (`planSightLines(…).pays`); everything else keeps the exact algorithm. Measured on the built-in parts:
 * such views took 0.2–1.4 s exact and take 30–250 ms here; the cam edge clamp's cold pack went from about
 * 2.0 s to 0.8 s.
 *
 * Tested against the exact algorithm view by view (tests/kernel/sightlines.test.ts).
 */
import type { OpenCascadeInstance, TopoDS_Shape } from "replicad-opencascadejs";
import type { ViewEdge, ViewPoint } from "@/engine/drawing/projection";
import { axisVector } from "@/engine/drawing/projection";
import type { ViewFrame } from "@/engine/drawing/views";
import { arcThrough, classifySamples } from "./classify";
import { distanceToCurve } from "./cleanup";
import { preparedAlgo, type Deletable } from "./hlr";

/**
 * The triangulation the sight lines are tested against: 0.01 mm chordal deviation (the angular limit is
 * loose on purpose: at 0.1 rad the mesh of an assembly took ten times as long for no better answer).
 */
export const SIGHT_MESH = { toleranceMm: 0.01, angularTolerance: 0.3 } as const;
/** A face must lie this far in front of a point to hide it (several times the triangulation's deviation), mm. */
const HIDE_MARGIN_MM = 0.03;
/** Pieces shorter than this are not tested on their own; they take the visibility of the run before, mm. */
const MIN_PIECE_MM = 0.02;

/** The shape's triangles (positions in the shape's coordinates, three indices per triangle). */
export interface SightMesh {
  positions: Float32Array;
  indices: Uint32Array;
}

interface Vec3 {
  x: number;
  y: number;
  z: number;
}

/** One drawn curve: its samples in 3D with their curve parameters, and how to write it exactly in 2D. */
interface SampledCurve {
  kind: "line" | "circle" | "other";
  params: number[];
  points: Vec3[];
  /** Evaluates the exact curve at a parameter. */
  at(u: number): Vec3;
  /** For a circle in the view's plane: its centre and radius. */
  circle?: { centre: Vec3; radius: number };
  /** A B-spline or other free-form curve (not a line, circle, ellipse…). */
  freeForm: boolean;
}

/** A projected point: x right, y up, d toward the viewer. */
interface Projected {
  x: number;
  y: number;
  d: number;
}

type Projector = (p: Vec3) => Projected;

const dot = (a: Vec3, b: Vec3) => a.x * b.x + a.y * b.y + a.z * b.z;

function projectorOf(frame: ViewFrame): { project: Projector; toward: Vec3 } {
  const t = axisVector(frame.towardViewer);
  const r = axisVector(frame.right);
  const u = axisVector(frame.up);
  return { project: (p) => ({ x: dot(p, r), y: dot(p, u), d: dot(p, t) }), toward: t };
}

/** Samples per curve: straight lines need their ends; circles every few degrees; other curves densely. */
function sampleCount(kind: SampledCurve["kind"], u0: number, u1: number, lengthMm: number): number {
  if (kind === "line") return 1;
  if (kind === "circle") return Math.max(8, Math.ceil(Math.abs(u1 - u0) / (Math.PI / 90)));
  return Math.min(200, Math.max(24, Math.ceil(lengthMm / 0.5)));
}

/** The drawable curves of one edge, or none for a degenerate edge. */
function sampleEdge(oc: OpenCascadeInstance, edge: unknown, toward: Vec3, trash: Deletable[]): SampledCurve | undefined {
  const adaptor = new oc.BRepAdaptor_Curve(edge as never);
  trash.push(adaptor);
  const u0 = adaptor.FirstParameter();
  const u1 = adaptor.LastParameter();
  if (!(u1 > u0)) return undefined;
  const at = (u: number): Vec3 => {
    const p = adaptor.Value(u);
    const v = { x: p.X(), y: p.Y(), z: p.Z() };
    p.delete();
    return v;
  };
  const type = adaptor.GetType();
  let kind: SampledCurve["kind"] = "other";
  let circle: SampledCurve["circle"];
  if (type === oc.GeomAbs_CurveType.GeomAbs_Line) kind = "line";
  else if (type === oc.GeomAbs_CurveType.GeomAbs_Circle) {
    kind = "circle";
    const c = adaptor.Circle();
    const loc = c.Location();
    const axis = c.Axis();
    const dir = axis.Direction();
    const normal = { x: dir.X(), y: dir.Y(), z: dir.Z() };
    if (Math.abs(Math.abs(dot(normal, toward)) - 1) < 1e-9) circle = { centre: { x: loc.X(), y: loc.Y(), z: loc.Z() }, radius: c.Radius() };
    else kind = "other";
    dir.delete();
    axis.delete();
    loc.delete();
    c.delete();
  }
  // Length estimate for the sample count of free-form curves: a coarse polygon.
  let length = 0;
  let prev = at(u0);
  for (let i = 1; i <= 8; i++) {
    const p = at(u0 + ((u1 - u0) * i) / 8);
    length += Math.hypot(p.x - prev.x, p.y - prev.y, p.z - prev.z);
    prev = p;
  }
  if (length < 1e-9) return undefined;
  const n = sampleCount(kind, u0, u1, length);
  const params: number[] = [];
  const points: Vec3[] = [];
  for (let i = 0; i <= n; i++) {
    const u = u0 + ((u1 - u0) * i) / n;
    params.push(u);
    points.push(at(u));
  }
  const freeForm = isFreeForm(oc, type);
  return { kind, params, points, at, freeForm, ...(circle ? { circle } : {}) };
}

/** Edges of a compound, each handed to `visit` (the explorer and the edges are deleted afterwards). */
function forEachEdge(oc: OpenCascadeInstance, shape: TopoDS_Shape, trash: Deletable[], visit: (edge: unknown) => void): void {
  const explorer = new oc.TopExp_Explorer(shape, oc.TopAbs_ShapeEnum.TopAbs_EDGE, oc.TopAbs_ShapeEnum.TopAbs_SHAPE);
  trash.push(explorer);
  for (; explorer.More(); explorer.Next()) {
    const edge = oc.TopoDS.Edge(explorer.Current());
    trash.push(edge);
    visit(edge);
  }
}

/**
 * The sharp edges of the shape, sampled in 3D: no seams of closed faces and no edges between tangent
 * faces (`encodeRegularity` marked those), as ISO 128 draws.
 */
function sharpCurves(oc: OpenCascadeInstance, shape: TopoDS_Shape, toward: Vec3, trash: Deletable[]): SampledCurve[] {
  const curves: SampledCurve[] = [];
  // Each edge is met once per face it bounds (a seam twice on its one face): grouped by where it runs.
  const byKey = new Map<string, { edge: unknown; faces: unknown[]; curve: SampledCurve }>();
  const faces = new oc.TopExp_Explorer(shape, oc.TopAbs_ShapeEnum.TopAbs_FACE, oc.TopAbs_ShapeEnum.TopAbs_SHAPE);
  trash.push(faces);
  for (; faces.More(); faces.Next()) {
    const face = oc.TopoDS.Face(faces.Current());
    trash.push(face);
    forEachEdge(oc, face, trash, (edge) => {
      if (oc.BRep_Tool.Degenerated(edge as never)) return;
      const c = sampleEdge(oc, edge, toward, trash);
      if (!c) return;
      const key = [c.points[0]!, c.points[c.points.length >> 1]!, c.points[c.points.length - 1]!].map((p) => `${p.x.toFixed(5)},${p.y.toFixed(5)},${p.z.toFixed(5)}`).join(";");
      const entry = byKey.get(key);
      if (entry) entry.faces.push(face);
      else byKey.set(key, { edge, faces: [face], curve: c });
    });
  }
  for (const { edge, faces: [f1, f2], curve } of byKey.values()) {
    if (f1 && f2) {
      if (f1 === f2 || oc.BRep_Tool.IsClosed(edge as never, f1 as never)) continue;
      if (oc.BRep_Tool.Continuity(edge as never, f1 as never, f2 as never) !== oc.GeomAbs_Shape.GeomAbs_C0) continue;
    }
    curves.push(curve);
  }
  return curves;
}

/** The silhouettes of the shape for this view (OpenCascade's outliner, without the hiding pass), in 3D. */
function outlineCurves(oc: OpenCascadeInstance, shape: TopoDS_Shape, frame: ViewFrame, toward: Vec3, trash: Deletable[]): SampledCurve[] {
  const curves: SampledCurve[] = [];
  const algo = preparedAlgo(oc, shape, frame, trash);
  algo.ShowAll();
  const toShape = new oc.HLRBRep_HLRToShape(algo);
  trash.push(toShape);
  const outlines = toShape.OutLineVCompound3d();
  trash.push(outlines);
  if (!outlines.IsNull()) {
    forEachEdge(oc, outlines, trash, (edge) => {
      const c = sampleEdge(oc, edge, toward, trash);
      if (c) curves.push(c);
    });
  }
  return curves;
}

/** A B-spline, Bézier or other curve without a closed form (an intersection curve of two cylinders). */
function isFreeForm(oc: OpenCascadeInstance, type: unknown): boolean {
  return type === oc.GeomAbs_CurveType.GeomAbs_BSplineCurve || type === oc.GeomAbs_CurveType.GeomAbs_BezierCurve || type === oc.GeomAbs_CurveType.GeomAbs_OtherCurve;
}

/** Whether any edge of the shape is a free-form curve (only those make the exact algorithm slow). */
export function hasFreeFormEdges(oc: OpenCascadeInstance, shape: TopoDS_Shape): boolean {
  const trash: Deletable[] = [];
  try {
    let found = false;
    forEachEdge(oc, shape, trash, (edge) => {
      if (found) return;
      const adaptor = new oc.BRepAdaptor_Curve(edge as never);
      const type = adaptor.GetType();
      adaptor.delete();
      found = isFreeForm(oc, type);
    });
    return found;
  } finally {
    for (const o of trash.reverse()) o.delete();
  }
}

/**
 * Whether the exact algorithm would be slow on this view: a free-form edge (a cross hole's intersection
 * curve) that falls on another edge in projection, on a circle (it lies on a cylinder seen end-on) or back
 * over itself. Measured on the built-in parts: such a view takes the exact algorithm 0.2–1.4 s and the
 * sight lines 60–400 ms; views without one are faster exact.
 */
function exactIsSlow(curves: SampledCurve[], projected: Projected[][]): boolean {
  if (!curves.some((c) => c.freeForm)) return false;
  const boxes = projected.map((pts) => {
    const xs = pts.map((q) => q.x);
    const ys = pts.map((q) => q.y);
    return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
  });
  const tol = 2e-3;
  return curves.some((c, i) => {
    if (!c.freeForm) return false;
    const pts = projected[i]!;
    if (turningPoints(pts).length > 0) return true;
    const probe = pts.filter((_, k) => k % 4 === 0 || k === pts.length - 1);
    if (classifySamples(probe.map((q) => ({ x: q.x, y: q.y })), tol).type !== "polyline") return true;
    const box = boxes[i]!;
    return projected.some((other, j) => {
      if (j === i) return false;
      const b = boxes[j]!;
      if (b.minX > box.maxX + tol || b.maxX < box.minX - tol || b.minY > box.maxY + tol || b.maxY < box.minY - tol) return false;
      const near = probe.filter((q) => distanceToCurve(q, { type: "polyline", points: other }) < tol).length;
      return near >= 0.6 * probe.length;
    });
  });
}

/**
 * Boxes in a uniform grid of square cells over the view: each box is listed (as a number) in every cell
 * it touches, and a cell's list is found from a point.
 */
class BoxGrid {
  private readonly cells = new Map<number, number[]>();

  constructor(
    private readonly x0: number,
    private readonly y0: number,
    private readonly size: number,
  ) {}

  /** Cell column and row of a point. */
  cellOf(x: number, y: number): [number, number] {
    return [Math.floor((x - this.x0) / this.size), Math.floor((y - this.y0) / this.size)];
  }

  private static key(cx: number, cy: number): number {
    return cx * 100_003 + cy;
  }

  add(minX: number, minY: number, maxX: number, maxY: number, ...values: number[]): void {
    const [cx0, cy0] = this.cellOf(minX, minY);
    const [cx1, cy1] = this.cellOf(maxX, maxY);
    for (let cx = cx0; cx <= cx1; cx++) {
      for (let cy = cy0; cy <= cy1; cy++) {
        const key = BoxGrid.key(cx, cy);
        let list = this.cells.get(key);
        if (!list) this.cells.set(key, (list = []));
        list.push(...values);
      }
    }
  }

  at(x: number, y: number): number[] | undefined {
    const [cx, cy] = this.cellOf(x, y);
    return this.cells.get(BoxGrid.key(cx, cy));
  }

  /** Every non-empty cell with its column, row and list. */
  *entries(): Generator<[number, number, number[]]> {
    for (const [key, list] of this.cells) {
      const cx = Math.round(key / 100_003);
      yield [cx, key - cx * 100_003, list];
    }
  }
}

/** Triangles that can hide something (not edge-on), projected, in a uniform grid over the view. */
class Occluders {
  private readonly grid: BoxGrid;
  private readonly tri: Float64Array;

  constructor(positions: Float32Array, indices: Uint32Array, project: Projector, toward: Vec3) {
    const n = indices.length / 3;
    // Per triangle: x, y, d of its three corners.
    this.tri = new Float64Array(n * 9);
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    const keep: number[] = [];
    for (let i = 0; i < n; i++) {
      const corner = (k: number): Vec3 => {
        const v = indices[i * 3 + k]! * 3;
        return { x: positions[v]!, y: positions[v + 1]!, z: positions[v + 2]! };
      };
      const a = corner(0);
      const b = corner(1);
      const c = corner(2);
      const ab = { x: b.x - a.x, y: b.y - a.y, z: b.z - a.z };
      const ac = { x: c.x - a.x, y: c.y - a.y, z: c.z - a.z };
      const nx = ab.y * ac.z - ab.z * ac.y;
      const ny = ab.z * ac.x - ab.x * ac.z;
      const nz = ab.x * ac.y - ab.y * ac.x;
      const len = Math.hypot(nx, ny, nz);
      if (len < 1e-12) continue;
      // Edge-on (a face parallel to the sight lines): it covers no area in the view.
      if (Math.abs((nx * toward.x + ny * toward.y + nz * toward.z) / len) < 1e-6) continue;
      const pa = project(a);
      const pb = project(b);
      const pc = project(c);
      this.tri.set([pa.x, pa.y, pa.d, pb.x, pb.y, pb.d, pc.x, pc.y, pc.d], i * 9);
      keep.push(i);
      minX = Math.min(minX, pa.x, pb.x, pc.x);
      minY = Math.min(minY, pa.y, pb.y, pc.y);
      maxX = Math.max(maxX, pa.x, pb.x, pc.x);
      maxY = Math.max(maxY, pa.y, pb.y, pc.y);
    }
    const span = Number.isFinite(maxX) ? Math.max(maxX - minX, maxY - minY, 1) : 1;
    this.grid = new BoxGrid(Number.isFinite(minX) ? minX : 0, Number.isFinite(minY) ? minY : 0, span / 96);
    const t = this.tri;
    for (const i of keep) {
      const o = i * 9;
      this.grid.add(
        Math.min(t[o]!, t[o + 3]!, t[o + 6]!) - 1e-6,
        Math.min(t[o + 1]!, t[o + 4]!, t[o + 7]!) - 1e-6,
        Math.max(t[o]!, t[o + 3]!, t[o + 6]!) + 1e-6,
        Math.max(t[o + 1]!, t[o + 4]!, t[o + 7]!) + 1e-6,
        i,
      );
    }
  }

  /** True when a triangle covers (x, y) nearer the viewer than depth d + margin. */
  hides(p: Projected): boolean {
    const list = this.grid.at(p.x, p.y);
    if (!list) return false;
    const t = this.tri;
    for (const i of list) {
      const o = i * 9;
      const ax = t[o]!;
      const ay = t[o + 1]!;
      const bx = t[o + 3]!;
      const by = t[o + 4]!;
      const cx = t[o + 6]!;
      const cy = t[o + 7]!;
      const det = (by - cy) * (ax - cx) + (cx - bx) * (ay - cy);
      if (Math.abs(det) < 1e-18) continue;
      const l1 = ((by - cy) * (p.x - cx) + (cx - bx) * (p.y - cy)) / det;
      const l2 = ((cy - ay) * (p.x - cx) + (ax - cx) * (p.y - cy)) / det;
      const l3 = 1 - l1 - l2;
      const eps = -1e-9;
      if (l1 < eps || l2 < eps || l3 < eps) continue;
      const depth = l1 * t[o + 2]! + l2 * t[o + 5]! + l3 * t[o + 8]!;
      if (depth > p.d + HIDE_MARGIN_MM) return true;
    }
    return false;
  }
}

/** Parameters (as sample index + fraction) where curve a's projection crosses curve b's. */
function crossings(curves: Projected[][]): number[][] {
  const cuts: number[][] = curves.map(() => []);
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const pts of curves) {
    for (const p of pts) {
      minX = Math.min(minX, p.x);
      minY = Math.min(minY, p.y);
      maxX = Math.max(maxX, p.x);
      maxY = Math.max(maxY, p.y);
    }
  }
  if (!Number.isFinite(minX)) return cuts;
  const grid = new BoxGrid(minX, minY, Math.max(maxX - minX, maxY - minY, 1) / 128);
  // Each segment in every grid cell its box touches; a pair is tested only in the first cell both touch.
  const firstCells: number[][] = curves.map(() => []);
  curves.forEach((pts, c) => {
    for (let s = 0; s + 1 < pts.length; s++) {
      const a = pts[s]!;
      const b = pts[s + 1]!;
      firstCells[c]!.push(...grid.cellOf(Math.min(a.x, b.x), Math.min(a.y, b.y)));
      grid.add(Math.min(a.x, b.x), Math.min(a.y, b.y), Math.max(a.x, b.x), Math.max(a.y, b.y), c, s);
    }
  });
  for (const [cx, cy, list] of grid.entries()) {
    for (let i = 0; i < list.length; i += 2) {
      const ca = list[i]!;
      const sa = list[i + 1]!;
      const fa = firstCells[ca]!;
      for (let j = i + 2; j < list.length; j += 2) {
        const cb = list[j]!;
        if (ca === cb) continue;
        const sb = list[j + 1]!;
        const fb = firstCells[cb]!;
        if (Math.max(fa[sa * 2]!, fb[sb * 2]!) !== cx || Math.max(fa[sa * 2 + 1]!, fb[sb * 2 + 1]!) !== cy) continue;
        const hit = segmentCrossing(curves[ca]![sa]!, curves[ca]![sa + 1]!, curves[cb]![sb]!, curves[cb]![sb + 1]!);
        if (!hit) continue;
        cuts[ca]!.push(sa + hit[0]);
        cuts[cb]!.push(sb + hit[1]);
      }
    }
  }
  return cuts;
}

/** Fractions along ab and cd where they cross (touching ends included); undefined when parallel or apart. */
function segmentCrossing(a: ViewPoint, b: ViewPoint, c: ViewPoint, d: ViewPoint): [number, number] | undefined {
  const rx = b.x - a.x;
  const ry = b.y - a.y;
  const sx = d.x - c.x;
  const sy = d.y - c.y;
  const den = rx * sy - ry * sx;
  const scale = Math.hypot(rx, ry) * Math.hypot(sx, sy);
  if (scale === 0) return undefined;
  if (Math.abs(den) < 1e-9 * scale) return overlapEnds(a, b, c, d);
  const qx = c.x - a.x;
  const qy = c.y - a.y;
  const t = (qx * sy - qy * sx) / den;
  const u = (qx * ry - qy * rx) / den;
  const e = 1e-9;
  if (t < -e || t > 1 + e || u < -e || u > 1 + e) return undefined;
  return [Math.min(1, Math.max(0, t)), Math.min(1, Math.max(0, u))];
}

/**
 * Collinear segments that overlap: where each one's ends fall on the other (a line running on top of
 * another ends there, and what is drawn on top may change there). Undefined when apart or not collinear.
 */
function overlapEnds(a: ViewPoint, b: ViewPoint, c: ViewPoint, d: ViewPoint): [number, number] | undefined {
  const along = (p: ViewPoint, s: ViewPoint, e: ViewPoint): number | undefined => {
    const dx = e.x - s.x;
    const dy = e.y - s.y;
    const len2 = dx * dx + dy * dy;
    const f = ((p.x - s.x) * dx + (p.y - s.y) * dy) / len2;
    const off = Math.abs((p.x - s.x) * dy - (p.y - s.y) * dx) / Math.sqrt(len2);
    return off < 1e-6 && f > 1e-9 && f < 1 - 1e-9 ? f : undefined;
  };
  // One cut per call: the first end of cd inside ab (its fraction on cd is 0 or 1), else an end of ab in cd.
  const c0 = along(c, a, b);
  if (c0 !== undefined) return [c0, 0];
  const d0 = along(d, a, b);
  if (d0 !== undefined) return [d0, 1];
  const a0 = along(a, c, d);
  if (a0 !== undefined) return [0, a0];
  const b0 = along(b, c, d);
  if (b0 !== undefined) return [1, b0];
  return undefined;
}

/**
 * Sample positions where a projected curve turns back on itself (a circle seen edge-on, at its ends).
 * Segments that project to a point (at the very turn) are stepped over; the turn is put in their middle.
 */
function turningPoints(pts: Projected[]): number[] {
  const out: number[] = [];
  let prev: { x: number; y: number } | undefined;
  let prevEnd = 0;
  for (let i = 0; i + 1 < pts.length; i++) {
    const dx = pts[i + 1]!.x - pts[i]!.x;
    const dy = pts[i + 1]!.y - pts[i]!.y;
    const len = Math.hypot(dx, dy);
    if (len < 1e-9) continue;
    const dir = { x: dx / len, y: dy / len };
    if (prev && prev.x * dir.x + prev.y * dir.y < 0) out.push((prevEnd + i) / 2);
    prev = dir;
    prevEnd = i + 1;
  }
  return out;
}

/** The parameter of the curve at a sample position (index + fraction). */
function paramAt(curve: SampledCurve, pos: number): number {
  const i = Math.min(curve.params.length - 2, Math.max(0, Math.floor(pos)));
  return curve.params[i]! + (curve.params[i + 1]! - curve.params[i]!) * (pos - i);
}

/** The point of the curve at a sample position (index + fraction), on its sample polygon. */
function pointAt(curve: SampledCurve, pos: number): Vec3 {
  const i = Math.min(curve.points.length - 2, Math.max(0, Math.floor(pos)));
  const f = pos - i;
  const a = curve.points[i]!;
  const b = curve.points[i + 1]!;
  return { x: a.x + (b.x - a.x) * f, y: a.y + (b.y - a.y) * f, z: a.z + (b.z - a.z) * f };
}

/**
 * The 2D geometry of a curve between two sample positions (none when it projects to a point): lines and
 * circles in the view's plane exactly, other curves through their samples (a quarter millimetre apart).
 */
function pieceEdges(curve: SampledCurve, s0: number, s1: number, project: Projector, visibility: "visible" | "hidden"): ViewEdge[] {
  const p = (pos: number): ViewPoint => {
    const q = project(pointAt(curve, pos));
    return { x: q.x, y: q.y };
  };
  const a = p(s0);
  const b = p(s1);
  if (curve.kind === "line") return Math.hypot(a.x - b.x, a.y - b.y) > 1e-9 ? [{ visibility, curve: { type: "line", from: a, to: b } }] : [];
  const last = curve.points.length - 1;
  if (curve.kind === "circle" && curve.circle) {
    const c = project(curve.circle.centre);
    const centre = { x: c.x, y: c.y };
    const whole = Math.abs(curve.params[last]! - curve.params[0]!) >= 2 * Math.PI - 1e-9;
    if (whole && s0 <= 0 && s1 >= last) return [{ visibility, curve: { type: "circle", centre, radius: curve.circle.radius } }];
    return [{ visibility, curve: arcThrough(centre, curve.circle.radius, a, p((s0 + s1) / 2), b) }];
  }
  // A closed run (an oblique circle all in view) is written as two halves, as the exact algorithm does.
  if (Math.hypot(a.x - b.x, a.y - b.y) < 1e-6 && s1 - s0 > 1e-9) {
    const m = (s0 + s1) / 2;
    return [...pieceEdges(curve, s0, m, project, visibility), ...pieceEdges(curve, m, s1, project, visibility)];
  }
  // Exact points of the curve (the polygon's chords would bend a fitted arc off its circle).
  const u0 = paramAt(curve, s0);
  const u1 = paramAt(curve, s1);
  const n = 24;
  const samples: ViewPoint[] = [];
  for (let i = 0; i <= n; i++) {
    const q = project(curve.at(u0 + ((u1 - u0) * i) / n));
    samples.push({ x: q.x, y: q.y });
  }
  const spread = Math.max(...samples.map((q) => Math.hypot(q.x - samples[0]!.x, q.y - samples[0]!.y)));
  if (spread < 1e-6) return [];
  return [{ visibility, curve: classifySamples(samples) }];
}

/** One view worked out by sight lines, when that pays (see `planSightLines`). */
export interface SightLinePlan {
  /** True when the exact algorithm would be slow on this view (only then is `project` worth calling). */
  pays: boolean;
  /** The view's edges, like `projectEdges`, to be cleaned the same way. */
  project(mesh: SightMesh): ViewEdge[];
  /** Frees the kernel objects the plan holds. */
  dispose(): void;
}

/**
 * Samples the shape's sharp edges for one view and decides whether sight lines pay; the samples are
 * kept for `project`. Call `dispose` in every case.
 */
export function planSightLines(oc: OpenCascadeInstance, shape: TopoDS_Shape, frame: ViewFrame): SightLinePlan {
  const trash: Deletable[] = [];
  const dispose = () => {
    for (const o of trash.reverse()) o.delete();
    trash.length = 0;
  };
  try {
    const { project, toward } = projectorOf(frame);
    const sharp = sharpCurves(oc, shape, toward, trash);
    const sharpProjected = sharp.map((c) => c.points.map(project));
    const pays = exactIsSlow(sharp, sharpProjected);
    return {
      pays,
      dispose,
      project(mesh) {
        const outlines = outlineCurves(oc, shape, frame, toward, trash);
        const curves = [...sharp, ...outlines];
        const projected = [...sharpProjected, ...outlines.map((c) => c.points.map(project))];
        return visibleAndHidden(curves, projected, new Occluders(mesh.positions, mesh.indices, project, toward), project);
      },
    };
  } catch (err) {
    dispose();
    throw err;
  }
}

/** Cuts each curve where visibility can change, tests each piece, and writes runs of one visibility. */
function visibleAndHidden(curves: SampledCurve[], projected: Projected[][], occluders: Occluders, project: Projector): ViewEdge[] {
  const cuts = crossings(projected);
  const edges: ViewEdge[] = [];
  curves.forEach((curve, ci) => {
    const last = curve.points.length - 1;
    const stops = [...new Set([0, last, ...cuts[ci]!, ...turningPoints(projected[ci]!)])].sort((a, b) => a - b);
    // Visibility of each piece from its middle; runs of the same visibility are written as one edge.
    let runStart = 0;
    let runVisibility: "visible" | "hidden" | undefined;
    let runEnd = 0;
    for (let k = 0; k + 1 < stops.length; k++) {
      const s0 = stops[k]!;
      const s1 = stops[k + 1]!;
      const a = project(pointAt(curve, s0));
      const b = project(pointAt(curve, s1));
      if (Math.hypot(a.x - b.x, a.y - b.y) < MIN_PIECE_MM && runVisibility !== undefined) {
        runEnd = s1;
        continue;
      }
      const visibility = occluders.hides(project(pointAt(curve, (s0 + s1) / 2))) ? "hidden" : "visible";
      if (runVisibility === undefined) {
        runVisibility = visibility;
        runEnd = s1;
      } else if (visibility === runVisibility) {
        runEnd = s1;
      } else {
        edges.push(...pieceEdges(curve, runStart, runEnd, project, runVisibility));
        runStart = s0;
        runEnd = s1;
        runVisibility = visibility;
      }
    }
    if (runVisibility !== undefined) edges.push(...pieceEdges(curve, runStart, runEnd, project, runVisibility));
  });
  return edges;
}
