/**
 * The orthographic views of one solid: hidden lines (exact, or by sight lines where the exact algorithm is
 * slow), cleaned, with centre marks.
 */
import type { OpenCascadeInstance, TopoDS_Shape } from "replicad-opencascadejs";
import { axisVector, type ProjectedView, type ViewEdge } from "@/engine/drawing/projection";
import type { ViewFrame } from "@/engine/drawing/views";
import { centreMarksForView, cylinderAxes } from "./centres";
import { cleanEdges, edgeBounds } from "./cleanup";
import { encodeRegularity, projectEdges } from "./hlr";
import { hasFreeFormEdges, planSightLines, type SightMesh } from "./sightlines";

/**
 * Projects `shape` into each frame. The shape's edge regularity flags are set in place (see hlr.ts).
 * With `sightMesh` (the shape's triangles, made on first need), a view where the exact algorithm would
 * be slow (sightlines.ts) is worked out by sight lines instead.
 */
export function projectShape(oc: OpenCascadeInstance, shape: TopoDS_Shape, frames: ViewFrame[], sightMesh?: () => SightMesh): ProjectedView[] {
  encodeRegularity(oc, shape);
  const axes = cylinderAxes(oc, shape);
  let mesh: SightMesh | undefined;
  const freeForm = sightMesh !== undefined && hasFreeFormEdges(oc, shape);
  return frames.map((frame) => {
    let raw: ViewEdge[] | undefined;
    if (freeForm && sightMesh) {
      let plan: ReturnType<typeof planSightLines> | undefined;
      try {
        plan = planSightLines(oc, shape, frame);
        if (plan.pays) raw = plan.project((mesh ??= sightMesh()));
      } catch {
        // The exact algorithm below is the reference the sight lines are tested against: a view they
        // cannot work out (a triangulation that fails) is drawn the slow way rather than not at all.
        raw = undefined;
      } finally {
        plan?.dispose();
      }
    }
    raw ??= projectEdges(oc, shape, frame);
    const edges = cleanEdges(raw);
    const base = { name: frame.name, towardViewer: axisVector(frame.towardViewer), right: frame.right, up: frame.up };
    return { ...base, edges, centreMarks: centreMarksForView(axes, base), bounds: edgeBounds(edges) };
  });
}
