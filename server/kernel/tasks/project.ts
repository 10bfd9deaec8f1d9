import type { Shape3D } from "replicad";
import type { ResolvedPart } from "@/engine/parts/features";
import { projectToView, type AssemblyAnchor, type ProjectedAssembly, type ProjectedPart, type ViewName } from "@/engine/drawing/projection";
import { visibleAnchors, type PartTriangles } from "@/engine/drawing/assemblyAnchors";
import { viewFrame, viewsForPart } from "@/engine/drawing/views";
import { assemblyMatrix, transformPoint } from "../placement";
import { projectShape } from "../projection/projectShape";
import { SIGHT_MESH } from "../projection/sightlines";
import { placedCopy } from "../step";
import { meshTriangles } from "../mesh";
import type { KernelContext } from "../context";
import { defineTask } from "./types";

/** A coarse mesh is plenty to tell which part the viewer sees where (a cell is ~0.2–0.5 mm). */
const ANCHOR_MESH = { toleranceMm: 0.2, angularTolerance: 0.5 };

/** The part's triangles moved to its assembly placement. */
function placedTriangles(ctx: KernelContext, shape: Shape3D, part: ResolvedPart): PartTriangles {
  const mesh = meshTriangles(ctx.kernel, shape, ANCHOR_MESH);
  const m = assemblyMatrix(part);
  const positions = new Float64Array(mesh.positions.length);
  for (let v = 0; v + 2 < positions.length; v += 3) {
    const [x, y, z] = transformPoint(m, mesh.positions[v]!, mesh.positions[v + 1]!, mesh.positions[v + 2]!);
    positions[v] = x;
    positions[v + 1] = y;
    positions[v + 2] = z;
  }
  return { partId: part.id, positions, indices: mesh.indices };
}

export interface ProjectTaskInput {
  /** Parts drawn one per sheet, each in its own frame with the views `viewsForPart` gives it. */
  parts: ResolvedPart[];
  /** The template's `drawing.views`, for the parts that do not list their own. */
  defaultViews?: ViewName[];
  /** Also project these parts together at their assembly placements (the assembly sheet). */
  assembly?: { parts: ResolvedPart[]; views?: ViewName[] };
}

export interface ProjectTaskOutput {
  parts: ProjectedPart[];
  assembly?: ProjectedAssembly;
}

/**
 * Orthographic views with exact hidden lines (HLRBRep through `oc`, see projection/hlr.ts) and centre
 * marks, for the drawings. The assembly is projected as one compound of placed copies, so parts hide
 * each other as they do on the bench.
 */
export const projectTask = defineTask<ProjectTaskInput, ProjectTaskOutput>({
  name: "project",
  run(input, ctx) {
    const parts = input.parts.map((part) => {
      const built = ctx.buildPart(part);
      const sightMesh = () => meshTriangles(ctx.kernel, built.shape, SIGHT_MESH);
      return { partId: part.id, views: projectShape(ctx.oc, built.shape.wrapped, viewsForPart(part, input.defaultViews), sightMesh) };
    });
    if (!input.assembly || input.assembly.parts.length === 0) return { parts };
    // Front and side by side: the side view shows how the parts stack and hook; they fit a sheet at 1:1 more often than three views.
    const names = input.assembly.views ?? ["front", "right"];
    const frames = names.map((n) => viewFrame("block", n));
    const copies: Shape3D[] = [];
    const anchors: AssemblyAnchor[] = [];
    const triangles: PartTriangles[] = [];
    try {
      for (const part of input.assembly.parts) {
        const built = ctx.buildPart(part);
        copies.push(placedCopy(built.shape, part));
        const [x, y, z] = transformPoint(
          assemblyMatrix(part),
          (built.bbox.min[0] + built.bbox.max[0]) / 2,
          (built.bbox.min[1] + built.bbox.max[1]) / 2,
          (built.bbox.min[2] + built.bbox.max[2]) / 2,
        );
        for (const f of frames) anchors.push({ partId: part.id, view: f.name, point: projectToView(f, { x, y, z }), clearanceMm: 0, visibleShare: 0 });
        triangles.push(placedTriangles(ctx, built.shape, part));
      }
      // Leaders end on what the viewer sees of each part; a hidden part keeps its box centre.
      for (const v of visibleAnchors(triangles, frames)) {
        const i = anchors.findIndex((a) => a.partId === v.partId && a.view === v.view);
        if (i >= 0) anchors[i] = v;
      }
      const compound = ctx.r.makeCompound(copies);
      try {
        const sightMesh = () => meshTriangles(ctx.kernel, compound, SIGHT_MESH);
        return { parts, assembly: { views: projectShape(ctx.oc, compound.wrapped, frames, sightMesh), anchors } };
      } finally {
        compound.delete();
      }
    } finally {
      copies.forEach((c) => c.delete());
    }
  },
});
