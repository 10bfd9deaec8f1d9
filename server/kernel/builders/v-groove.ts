import { axisIndex, inFrame, toolFrame } from "../frame";
import { ENTRY_CLEARANCE_MM, type ToolBuilder } from "./types";

/**
 * A V-groove: a triangular prism with its apex `depth` below the face at `at`, the included angle
 * `angleDeg` (half-width at the face = depth · tan(angle/2)), running the whole length of the part along
 * `along`.
 */
export const vGrooveBuilder: ToolBuilder<"v-groove"> = {
  kind: "v-groove",
  role: "tool",
  tool(feature, { kernel, base }) {
    const { r } = kernel;
    const frame = toolFrame(feature.at, feature.direction, feature.along);
    const half = Math.tan(((feature.angleDeg / 2) * Math.PI) / 180);
    const top = feature.depth + ENTRY_CLEARANCE_MM;
    const i = axisIndex(feature.along);
    const start = base.min[i]! - 1 - frame.origin[i]!;
    const length = base.max[i]! - base.min[i]! + 2;
    const face = r.makePolygon([
      inFrame(frame, start, -top * half, -ENTRY_CLEARANCE_MM),
      inFrame(frame, start, top * half, -ENTRY_CLEARANCE_MM),
      inFrame(frame, start, 0, feature.depth),
    ]);
    const vec = new r.Vector(frame.u.map((c) => c * length) as [number, number, number]);
    const solid = r.basicFaceExtrusion(face, vec);
    face.delete();
    vec.delete();
    return { tools: [solid], threads: [] };
  },
};
