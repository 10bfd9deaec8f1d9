import type { BaseBuilder } from "./types";

/**
 * The turned base: the step profile (diameter, length pairs stacked from z = 0 upward) revolved about the
 * z axis, so each step is an exact cylinder and each shoulder a plane.
 */
export const turnedBuilder: BaseBuilder<"turned"> = {
  kind: "turned",
  role: "base",
  create(feature, { kernel }) {
    const { r } = kernel;
    const pts: [number, number, number][] = [[0, 0, 0]];
    let z = 0;
    for (const step of feature.steps) {
      const radius = step.diameter / 2;
      const last = pts[pts.length - 1]!;
      if (Math.abs(last[0] - radius) > 1e-9) pts.push([radius, 0, z]);
      z += step.length;
      pts.push([radius, 0, z]);
    }
    pts.push([0, 0, z]);
    const face = r.makePolygon(pts);
    const solid = r.revolution(face, [0, 0, 0], [0, 0, 1], 360);
    face.delete();
    return solid;
  },
};
