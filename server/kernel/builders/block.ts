import type { Shape3D } from "replicad";
import { castOwned } from "../boolean";
import { axisIndex, axisVector, scale } from "../frame";
import { blockChamferCuts, chamferedRectangle } from "./chamfer";
import type { BaseBuilder } from "./types";

/**
 * The block base: a box over [0, x] × [0, y] × [0, z]. With chamfers, the intersection of one prism per
 * direction of chamfered edges, each the block's section with those corners cut (see chamfer.ts).
 */
export const blockBuilder: BaseBuilder<"block"> = {
  kind: "block",
  role: "base",
  create(feature, ctx, chamfers) {
    const { r, oc } = ctx.kernel;
    const { x, y, z } = feature.size;
    if (chamfers.length === 0) return r.makeBox([0, 0, 0], [x, y, z]);
    const prisms: Shape3D[] = [];
    for (const [along, cuts] of blockChamferCuts(chamfers)) {
      const [p, q] = (["x", "y", "z"] as const).filter((a) => a !== along) as ["x" | "y" | "z", "x" | "y" | "z"];
      const outline = chamferedRectangle(ctx.base, p, q, cuts);
      const ai = axisIndex(along);
      const points = outline.map(([u, v]) => {
        const pt: [number, number, number] = [0, 0, 0];
        pt[axisIndex(p)] = u;
        pt[axisIndex(q)] = v;
        pt[ai] = ctx.base.min[ai]!;
        return pt;
      });
      const face = r.makePolygon(points);
      const vec = new r.Vector(scale(axisVector(along), ctx.base.max[ai]! - ctx.base.min[ai]!));
      prisms.push(r.basicFaceExtrusion(face, vec));
      face.delete();
      vec.delete();
    }
    let shape = prisms[0]!;
    for (const next of prisms.slice(1)) {
      const progress = new oc.Message_ProgressRange();
      const op = new oc.BRepAlgoAPI_Common(shape.wrapped, next.wrapped, progress);
      const common = castOwned(ctx.kernel, op.Shape());
      op.delete();
      progress.delete();
      shape.delete();
      next.delete();
      shape = common;
    }
    return shape;
  },
};
