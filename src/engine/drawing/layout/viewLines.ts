/**
 * The line work of one view on the sheet: projected edges (visible wide, hidden dashed narrow), centre
 * lines (long-dash dot narrow, running ~3 mm past the outline, ISO 128-2 §; small circles get continuous
 * narrow crosses, which read better than a dash pattern shorter than one dash), and cosmetic threads
 * (ISO 6410-1: thread roots continuous narrow, a ¾ circle seen end-on with the gap in the upper right
 * quadrant; the limit of the useful thread a wide line; hidden threads dashed).
 */
import type { ThreadMarkRequest } from "../annotations/types";
import { sheetPoint, toSheet, type Layer, type SheetShape, type ViewPlacement } from "../model";
import { projectToView, depthInView, type ProjectedView, type ViewCurve } from "../projection";
import { axisOf, travel } from "../annotations/helpers";

export const CENTRE_OVERSHOOT_MM = 3;
/** Below this sheet radius a centre cross is drawn continuous narrow. */
const SMALL_CIRCLE_MM = 3;

export function curveShape(curve: ViewCurve, layer: Layer, place: ViewPlacement): SheetShape {
  switch (curve.type) {
    case "line":
      return { type: "line", layer, from: toSheet(place, curve.from), to: toSheet(place, curve.to) };
    case "polyline":
      return { type: "polyline", layer, points: curve.points.map((p) => toSheet(place, p)) };
    case "circle":
      return { type: "circle", layer, centre: toSheet(place, curve.centre), radius: curve.radius * place.scale };
    case "arc":
      return { type: "arc", layer, centre: toSheet(place, curve.centre), radius: curve.radius * place.scale, startDeg: curve.startDeg, endDeg: curve.endDeg };
  }
}

export function edgeShapes(view: ProjectedView, place: ViewPlacement): SheetShape[] {
  return view.edges.map((e) => curveShape(e.curve, e.visibility === "visible" ? "visible" : "hidden", place));
}

export function centreShapes(view: ProjectedView, place: ViewPlacement): SheetShape[] {
  const out: SheetShape[] = [];
  for (const m of view.centreMarks) {
    if (m.type === "cross") {
      const c = toSheet(place, m.centre);
      const r = m.radius * place.scale;
      const arm = r + CENTRE_OVERSHOOT_MM;
      const layer: Layer = r < SMALL_CIRCLE_MM ? "thin" : "centre";
      out.push({ type: "line", layer, from: sheetPoint(c.x - arm, c.y), to: sheetPoint(c.x + arm, c.y) });
      out.push({ type: "line", layer, from: sheetPoint(c.x, c.y - arm), to: sheetPoint(c.x, c.y + arm) });
    } else {
      const a = toSheet(place, m.from);
      const b = toSheet(place, m.to);
      const len = Math.hypot(b.x - a.x, b.y - a.y);
      if (len < 1e-6) continue;
      const ux = (b.x - a.x) / len;
      const uy = (b.y - a.y) / len;
      out.push({
        type: "line",
        layer: "centre",
        from: sheetPoint(a.x - ux * CENTRE_OVERSHOOT_MM, a.y - uy * CENTRE_OVERSHOOT_MM),
        to: sheetPoint(b.x + ux * CENTRE_OVERSHOOT_MM, b.y + uy * CENTRE_OVERSHOOT_MM),
      });
    }
  }
  return out;
}

/** Cosmetic thread lines for one view. */
export function threadShapes(view: ProjectedView, marks: ThreadMarkRequest[], place: ViewPlacement): SheetShape[] {
  const out: SheetShape[] = [];
  const towardAxis = (["x", "y", "z"] as const).find((a) => Math.abs(view.towardViewer[a]) > 0.5)!;
  for (const m of marks) {
    const h = axisOf(m.direction);
    const end = travel(m.start, m.direction, m.lengthMm);
    if (h === towardAxis) {
      // End-on: drawn only when the thread opens toward the viewer.
      const facing = depthInView(view, m.start) >= depthInView(view, end);
      if (!facing) continue;
      const rootRadius = (m.form === "internal" ? m.majorMm : m.minorMm) / 2;
      const c = toSheet(place, projectToView(view, m.start));
      out.push({ type: "arc", layer: "thin", centre: c, radius: rootRadius * place.scale, startDeg: 100, endDeg: 350 });
      continue;
    }
    // Side-on: the axis lies in the view plane; the thread's radial direction is the other view axis.
    const a = projectToView(view, m.start);
    const b = projectToView(view, end);
    const horizontal = Math.abs(b.x - a.x) > Math.abs(b.y - a.y);
    const across = (p: { x: number; y: number }, r: number) => (horizontal ? { x: p.x, y: p.y + r } : { x: p.x + r, y: p.y });
    const rootR = (m.form === "internal" ? m.majorMm : m.minorMm) / 2;
    const crestR = (m.form === "internal" ? m.minorMm : m.majorMm) / 2;
    const rootLayer: Layer = m.form === "internal" ? "hidden" : "thin";
    for (const sgn of [-1, 1]) {
      out.push({ type: "line", layer: rootLayer, from: toSheet(place, across(a, sgn * rootR)), to: toSheet(place, across(b, sgn * rootR)) });
    }
    // The limit of useful thread: a line across the crests at the thread's end.
    out.push({
      type: "line",
      layer: m.form === "internal" ? "hidden" : "visible",
      from: toSheet(place, across(b, -(m.form === "internal" ? rootR : crestR))),
      to: toSheet(place, across(b, m.form === "internal" ? rootR : crestR)),
    });
  }
  return out;
}
