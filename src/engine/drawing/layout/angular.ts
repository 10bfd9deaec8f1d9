/**
 * Angular dimensions (ISO 129-1): the dimension line is an arc centred on the angle's vertex, ending in
 * arrowheads on the two legs, with the value in degrees written upright outside the arc at its middle.
 * Used for a bore located by polar coordinates: the legs are the part's principal centre line nearest the
 * bore and the line of centres from the vertex through the bore's centre (drawn as a centre line across
 * the part), each continued as a thin extension line beyond the outline to just past the arc
 * (ISO 129-1: extension lines 2 mm past the dimension line); the value sits beyond their ends. The arc runs 8 mm outside the outline, the
 * first dimension row of linear dimensions; arrowheads go outside the legs when the arc is too short.
 */
import type { AngularRequest } from "../annotations/types";
import { formatAngle } from "../format";
import { sheetPoint, TEXT_HEIGHTS, type SheetShape } from "../model";
import { projectToView, type ProjectedView } from "../projection";
import { textWidthMm } from "../text/measure";
import { EXT_OVERSHOOT_MM, FIRST_ROW_MM } from "./linear";
import { arrowhead, ARROW_LENGTH_MM, line } from "./shapes";
import { CENTRE_OVERSHOOT_MM } from "./viewLines";

const TEXT_H = TEXT_HEIGHTS.large;
const TEXT_GAP_MM = 1.2;
const rad = (deg: number) => (deg * Math.PI) / 180;

/** The angle, the reference direction and the arc of one request in a view (sheet degrees, ccw). */
export function angularGeometry(view: ProjectedView, r: AngularRequest): { refDeg: number; lineDeg: number; valueDeg: number } | undefined {
  const c = projectToView(view, r.vertex);
  const t = projectToView(view, r.through);
  if (Math.hypot(t.x - c.x, t.y - c.y) < 1e-9) return undefined;
  const lineDeg = (Math.atan2(t.y - c.y, t.x - c.x) * 180) / Math.PI;
  // The nearest principal centre line (right, up, left, down in the view).
  const refDeg = Math.round(lineDeg / 90) * 90;
  return { refDeg, lineDeg, valueDeg: Math.abs(lineDeg - refDeg) };
}

/** Shapes of the angular dimensions of one view, sheet mm with the view origin at (0, 0). */
export function layoutAngular(view: ProjectedView, requests: AngularRequest[], scale: number): SheetShape[] {
  const shapes: SheetShape[] = [];
  for (const r of requests) {
    const g = angularGeometry(view, r);
    if (!g || g.valueDeg < 1e-6) continue;
    const v = projectToView(view, r.vertex);
    const c = { x: v.x * scale, y: v.y * scale };
    const at = (deg: number, radius: number) => sheetPoint(c.x + radius * Math.cos(rad(deg)), c.y + radius * Math.sin(rad(deg)));
    const outline = r.outlineRadiusMm * scale;
    const arcR = outline + FIRST_ROW_MM;
    const legEnd = arcR + EXT_OVERSHOOT_MM;
    const legStart = outline + CENTRE_OVERSHOOT_MM;
    // The line of centres across the part, then both legs continued past the arc.
    shapes.push(line("centre", at(g.lineDeg, 0), at(g.lineDeg, legStart)));
    shapes.push(line("dimension", at(g.lineDeg, legStart), at(g.lineDeg, legEnd)));
    shapes.push(line("dimension", at(g.refDeg, legStart), at(g.refDeg, legEnd)));
    const a0 = Math.min(g.refDeg, g.lineDeg);
    const a1 = Math.max(g.refDeg, g.lineDeg);
    const arcLength = arcR * rad(a1 - a0);
    const inside = arcLength >= 2 * ARROW_LENGTH_MM + 1;
    const spill = inside ? 0 : ((ARROW_LENGTH_MM + 2) / arcR) * (180 / Math.PI);
    shapes.push({ type: "arc", layer: "dimension", centre: sheetPoint(c.x, c.y), radius: arcR, startDeg: a0 - spill, endDeg: a1 + spill });
    // Tangents: at a0 the arc leaves clockwise toward its leg, at a1 anticlockwise (reversed when outside).
    const s = inside ? 1 : -1;
    shapes.push(arrowhead(at(a0, arcR), s * Math.sin(rad(a0)), -s * Math.cos(rad(a0))));
    shapes.push(arrowhead(at(a1, arcR), -s * Math.sin(rad(a1)), s * Math.cos(rad(a1))));
    // The value upright, outside the arc at its middle, beyond the ends of the legs so no line crosses it.
    const text = formatAngle(g.valueDeg);
    const w = textWidthMm(text, TEXT_H);
    const mid = (a0 + a1) / 2;
    const reach = legEnd + TEXT_GAP_MM + Math.abs(Math.cos(rad(mid))) * (w / 2) + Math.abs(Math.sin(rad(mid))) * (TEXT_H / 2);
    const centre = at(mid, reach);
    shapes.push({ type: "text", layer: "dimension", role: "dimension", at: sheetPoint(centre.x, centre.y - TEXT_H / 2), text, heightMm: TEXT_H, align: "centre" });
  }
  return shapes;
}
