/**
 * One view at one scale with everything drawn around it: line work, centre lines, thread marks, linear
 * and angular dimensions and callouts. Shapes are in sheet mm with the view frame's origin at (0, 0); the arrangement
 * then moves the whole group into place. The envelope is what the arrangement keeps clear of other views.
 */
import type { SheetShape } from "../model";
import { sheetPoint } from "../model";
import type { ProjectedView } from "../projection";
import type { ViewAnnotations } from "./assign";
import { layoutAngular } from "./angular";
import { layoutCallouts } from "./callouts";
import type { Box } from "./geometry";
import { layoutLinear } from "./linear";
import { shapesBox } from "./shapes";
import { centreShapes, edgeShapes, threadShapes } from "./viewLines";

export interface LaidOutView {
  view: ProjectedView;
  shapes: SheetShape[];
  /** Extent of the view's own line work (what projection lines align), sheet mm. */
  geometryBox: Box;
  /** Extent of everything including dimensions and notes, sheet mm. */
  envelope: Box;
}

export function layoutView(view: ProjectedView, ann: ViewAnnotations, scale: number): LaidOutView {
  const place = { origin: sheetPoint(0, 0), scale };
  const lines = [...edgeShapes(view, place), ...threadShapes(view, ann.threads, place)];
  const centres = centreShapes(view, place);
  const geometryBox = shapesBox(lines.length ? lines : centres);
  const viewBox = shapesBox([...lines, ...centres]);
  const dims = [...layoutLinear(view, ann.linear, scale, viewBox), ...layoutAngular(view, ann.angular, scale)];
  const soFar = shapesBox([...lines, ...centres, ...dims]);
  const notes = layoutCallouts(view, ann.callouts, scale, soFar.maxY);
  const shapes = [...lines, ...centres, ...dims, ...notes];
  return { view, shapes, geometryBox, envelope: shapesBox(shapes) };
}
