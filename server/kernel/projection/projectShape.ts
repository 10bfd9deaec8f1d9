/**
 * The orthographic views of one solid: exact hidden lines, cleaned, with centre marks.
 */
import type { OpenCascadeInstance, TopoDS_Shape } from "replicad-opencascadejs";
import { axisVector, type ProjectedView } from "@/engine/drawing/projection";
import type { ViewFrame } from "@/engine/drawing/views";
import { centreMarksForView, cylinderAxes } from "./centres";
import { cleanEdges, edgeBounds } from "./cleanup";
import { encodeRegularity, projectEdges } from "./hlr";

/** Projects `shape` into each frame. The shape's edge regularity flags are set in place (see hlr.ts). */
export function projectShape(oc: OpenCascadeInstance, shape: TopoDS_Shape, frames: ViewFrame[]): ProjectedView[] {
  encodeRegularity(oc, shape);
  const axes = cylinderAxes(oc, shape);
  return frames.map((frame) => {
    const edges = cleanEdges(projectEdges(oc, shape, frame));
    const base = { name: frame.name, towardViewer: axisVector(frame.towardViewer), right: frame.right, up: frame.up };
    return { ...base, edges, centreMarks: centreMarksForView(axes, base), bounds: edgeBounds(edges) };
  });
}
