/**
 * The projection method symbol of ISO 5456-2 §6 (also ISO 128-30): a truncated cone drawn as its front
 * view (a trapezoid, small end on the left) and its end view seen from the left (two concentric circles,
 * both visible because the viewer looks at the small end). First angle puts the view from the left on the
 * right of the front view; third angle puts it on the left. Proportions after ISO 5456-2 Fig. 5/6 with
 * h = 2.5 mm lettering: large diameter 2h, small diameter h, cone length 2h; a centre line runs through.
 */
import { sheetPoint, type SheetPoint, type SheetShape } from "../model";
import type { ProjectionMethod } from "../layout/arrange";

export const SYMBOL_WIDTH_MM = 19;
export const SYMBOL_HEIGHT_MM = 6;

/** The symbol with its centre line at `centre`. */
export function projectionSymbol(method: ProjectionMethod, centre: SheetPoint, h = 2.5): SheetShape[] {
  const big = h; // radius of the large end (diameter 2h)
  const small = h / 2;
  const coneLength = 2 * h;
  const gap = 1.5 * h;
  const total = coneLength + gap + 2 * big;
  const x0 = centre.x - total / 2;
  // First angle: cone then circles; third angle: circles then cone.
  const coneX = method === "first" ? x0 : x0 + 2 * big + gap;
  const circleX = method === "first" ? x0 + coneLength + gap + big : x0 + big;
  const y = centre.y;
  const trapezoid: SheetPoint[] = [
    sheetPoint(coneX, y - small),
    sheetPoint(coneX + coneLength, y - big),
    sheetPoint(coneX + coneLength, y + big),
    sheetPoint(coneX, y + small),
  ];
  return [
    { type: "polyline", layer: "visible", points: trapezoid, closed: true },
    { type: "circle", layer: "visible", centre: sheetPoint(circleX, y), radius: big },
    { type: "circle", layer: "visible", centre: sheetPoint(circleX, y), radius: small },
    { type: "line", layer: "centre", from: sheetPoint(x0 - 1, y), to: sheetPoint(x0 + total + 1, y) },
    { type: "line", layer: "centre", from: sheetPoint(circleX, y - big - 1), to: sheetPoint(circleX, y + big + 1) },
  ];
}
