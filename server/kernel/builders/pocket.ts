import { toolFrame } from "../frame";
import { prismTool } from "./tools";
import type { ToolBuilder } from "./types";

/**
 * A pocket (recess) centred on `at`: a rectangle u × v (the face's two axes in x, y, z order) with an
 * optional corner radius, or a round one, cut `depth` along `direction`.
 */
export const pocketBuilder: ToolBuilder<"pocket"> = {
  kind: "pocket",
  role: "tool",
  tool(feature, { kernel }) {
    const { r } = kernel;
    const frame = toolFrame(feature.at, feature.direction);
    const shape = feature.shape;
    let outline;
    if (shape.kind === "round") outline = r.drawCircle(shape.diameter / 2);
    else if (shape.cornerRadius && shape.cornerRadius > 0) outline = r.drawRoundedRectangle(shape.u, shape.v, shape.cornerRadius);
    else outline = r.drawRectangle(shape.u, shape.v);
    // The frame's v is w × u, which may point along −(second face axis); the outline is symmetric, so it
    // does not matter.
    return { tools: [prismTool(kernel, frame, outline, feature.depth)], threads: [] };
  },
};
