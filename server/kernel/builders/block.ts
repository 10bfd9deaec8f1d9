import type { BaseBuilder } from "./types";

/** The block base: a box over [0, x] × [0, y] × [0, z]. */
export const blockBuilder: BaseBuilder<"block"> = {
  kind: "block",
  role: "base",
  create(feature, { kernel }) {
    const { x, y, z } = feature.size;
    return kernel.r.makeBox([0, 0, 0], [x, y, z]);
  },
};
