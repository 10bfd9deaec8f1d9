import { toolFrame } from "../frame";
import { prismTool, throughDepthMm } from "./tools";
import type { ToolBuilder } from "./types";

/**
 * An obround slot: from the first end centre `at`, `length` centre to centre along `along`, `width` wide
 * (so length + width overall), cut along `direction` to `depth` or right through.
 */
export const slotBuilder: ToolBuilder<"slot"> = {
  kind: "slot",
  role: "tool",
  tool(feature, { kernel, base }) {
    const { r } = kernel;
    const frame = toolFrame(feature.at, feature.direction, feature.along);
    const depth = feature.through || feature.depth === undefined ? throughDepthMm(base, frame.origin, frame.w) : feature.depth;
    const w = feature.width;
    const outline =
      feature.length > 1e-9
        ? r.drawRoundedRectangle(feature.length + w, w, w / 2).translate(feature.length / 2, 0)
        : r.drawCircle(w / 2);
    return { tools: [prismTool(kernel, frame, outline, depth)], threads: [] };
  },
};
