/**
 * Centre lines from the cylindrical faces of a solid (GEOMETRY.md item 8).
 *
 * The kernel part (`cylinderAxes`) reads each cylindrical face's axis, radius, angular span and extent
 * along the axis; the pure part (`centreMarksForView`) turns them into ISO 128 centre lines for one view:
 * a cross where the axis points at the viewer (holes, bores and slot ends seen end-on), a line along the
 * axis where it lies in the view plane (holes and turned diameters seen from the side). Coaxial faces merge
 * (a turned part's steps give one axis line; a counterbored hole one cross sized to its largest radius).
 */
import type { OpenCascadeInstance, TopoDS_Shape } from "replicad-opencascadejs";
import { projectToView, type CentreMark, type ProjectedView } from "@/engine/drawing/projection";

type Vec = { x: number; y: number; z: number };

export interface CylinderAxis {
  /** Points on the axis at the two ends of the face, mm. */
  from: Vec;
  to: Vec;
  direction: Vec;
  radiusMm: number;
  /** Angular span of the face around its axis, degrees (360 for a full hole, 180 for a slot end). */
  spanDeg: number;
}

/** Reads every cylindrical face of `shape`. Every OpenCascade object made here is deleted. */
export function cylinderAxes(oc: OpenCascadeInstance, shape: TopoDS_Shape): CylinderAxis[] {
  const out: CylinderAxis[] = [];
  const explorer = new oc.TopExp_Explorer(shape, oc.TopAbs_ShapeEnum.TopAbs_FACE, oc.TopAbs_ShapeEnum.TopAbs_SHAPE);
  try {
    for (; explorer.More(); explorer.Next()) {
      const current = explorer.Current();
      const face = oc.TopoDS.Face(current);
      const surface = new oc.BRepAdaptor_Surface(face, true);
      if (surface.GetType() === oc.GeomAbs_SurfaceType.GeomAbs_Cylinder) {
        const cyl = surface.Cylinder();
        const axis = cyl.Axis();
        const loc = axis.Location();
        const dir = axis.Direction();
        const o = { x: loc.X(), y: loc.Y(), z: loc.Z() };
        const d = { x: dir.X(), y: dir.Y(), z: dir.Z() };
        const v0 = surface.FirstVParameter();
        const v1 = surface.LastVParameter();
        const at = (v: number) => ({ x: o.x + d.x * v, y: o.y + d.y * v, z: o.z + d.z * v });
        out.push({
          from: at(v0),
          to: at(v1),
          direction: d,
          radiusMm: cyl.Radius(),
          spanDeg: ((surface.LastUParameter() - surface.FirstUParameter()) * 180) / Math.PI,
        });
        for (const o2 of [dir, loc, axis, cyl]) o2.delete();
      }
      surface.delete();
      face.delete();
      current.delete();
    }
  } finally {
    explorer.delete();
  }
  return out;
}

const dot = (a: Vec, b: Vec) => a.x * b.x + a.y * b.y + a.z * b.z;
const TOL = 1e-3;

/**
 * Centre marks of one view. Only full cylinders (≥ 359°) get an axis line in the view plane (a slot's
 * half-round ends would only add clutter beside its outline); anything of 180° or more gets a cross when
 * seen end-on.
 */
export function centreMarksForView(axes: CylinderAxis[], view: Pick<ProjectedView, "towardViewer" | "right" | "up">): CentreMark[] {
  const crosses: { centre: { x: number; y: number }; radius: number }[] = [];
  const lines: { a: { x: number; y: number }; b: { x: number; y: number } }[] = [];
  for (const ax of axes) {
    const along = Math.abs(dot(ax.direction, view.towardViewer));
    if (along > 1 - 1e-6 && ax.spanDeg >= 180 - 1e-6) {
      const centre = projectToView(view, ax.from);
      const same = crosses.find((c) => Math.hypot(c.centre.x - centre.x, c.centre.y - centre.y) < TOL);
      if (same) same.radius = Math.max(same.radius, ax.radiusMm);
      else crosses.push({ centre, radius: ax.radiusMm });
    } else if (along < 1e-6 && ax.spanDeg >= 359) {
      let a = projectToView(view, ax.from);
      let b = projectToView(view, ax.to);
      if (a.x > b.x + TOL || (Math.abs(a.x - b.x) <= TOL && a.y > b.y)) [a, b] = [b, a];
      lines.push({ a, b });
    }
  }
  return [...crosses.map((c) => ({ type: "cross" as const, centre: c.centre, radius: c.radius })), ...mergeAxisLines(lines)];
}

/** Merges collinear axis segments that overlap or touch into single lines. */
function mergeAxisLines(lines: { a: { x: number; y: number }; b: { x: number; y: number } }[]): CentreMark[] {
  const horizontal = (l: (typeof lines)[number]) => Math.abs(l.a.y - l.b.y) < TOL;
  const out: CentreMark[] = [];
  const used = new Set<number>();
  for (let i = 0; i < lines.length; i++) {
    if (used.has(i)) continue;
    const li = lines[i]!;
    const h = horizontal(li);
    let lo = h ? li.a.x : li.a.y;
    let hi = h ? li.b.x : li.b.y;
    const fixed = h ? li.a.y : li.a.x;
    let grew = true;
    used.add(i);
    while (grew) {
      grew = false;
      for (let j = 0; j < lines.length; j++) {
        if (used.has(j)) continue;
        const lj = lines[j]!;
        if (horizontal(lj) !== h || Math.abs((h ? lj.a.y : lj.a.x) - fixed) > TOL) continue;
        const s = h ? lj.a.x : lj.a.y;
        const e = h ? lj.b.x : lj.b.y;
        if (s <= hi + TOL && e >= lo - TOL) {
          lo = Math.min(lo, s);
          hi = Math.max(hi, e);
          used.add(j);
          grew = true;
        }
      }
    }
    out.push(h ? { type: "axis", from: { x: lo, y: fixed }, to: { x: hi, y: fixed } } : { type: "axis", from: { x: fixed, y: lo }, to: { x: fixed, y: hi } });
  }
  return out;
}
