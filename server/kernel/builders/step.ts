import type { ToolBuilder } from "./types";

/**
 * A step: the axis-aligned box between two corners is removed. Sides of the box lying on or beyond the
 * base's outside are pushed 1 mm further out, so the cut leaves no sliver where it meets the outside.
 */
export const stepBuilder: ToolBuilder<"step"> = {
  kind: "step",
  role: "tool",
  tool(feature, { kernel, base }) {
    const lo: [number, number, number] = [0, 0, 0];
    const hi: [number, number, number] = [0, 0, 0];
    const a = [feature.from.x, feature.from.y, feature.from.z];
    const b = [feature.to.x, feature.to.y, feature.to.z];
    for (let i = 0; i < 3; i++) {
      lo[i] = Math.min(a[i]!, b[i]!);
      hi[i] = Math.max(a[i]!, b[i]!);
      if (lo[i]! <= base.min[i]! + 1e-9) lo[i] = base.min[i]! - 1;
      if (hi[i]! >= base.max[i]! - 1e-9) hi[i] = base.max[i]! + 1;
    }
    return { tools: [kernel.r.makeBox(lo, hi)], threads: [] };
  },
};
