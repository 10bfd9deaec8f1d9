import type { BaseBuilder } from "./types";

/**
 * The turned base: the step profile (diameter, length pairs stacked from z = 0 upward) revolved about the
 * z axis, so each step is an exact cylinder and each shoulder a plane. A chamfer on an end face cuts the
 * profile's outer corner there at 45° (a cone when revolved).
 */
export const turnedBuilder: BaseBuilder<"turned"> = {
  kind: "turned",
  role: "base",
  create(feature, { kernel }, chamfers) {
    const { r } = kernel;
    const leg = (face: "+z" | "-z") => Math.max(0, ...chamfers.filter((c) => c.faces.includes(face)).map((c) => c.size));
    const top = leg("+z");
    const bottom = leg("-z");
    const steps = feature.steps;
    const pts: [number, number, number][] = [[0, 0, 0]];
    const r0 = steps[0]!.diameter / 2;
    if (bottom > 0) pts.push([r0 - bottom, 0, 0], [r0, 0, bottom]);
    let z = 0;
    steps.forEach((step, i) => {
      const radius = step.diameter / 2;
      const last = pts[pts.length - 1]!;
      if (Math.abs(last[0] - radius) > 1e-9) pts.push([radius, 0, z]);
      z += step.length;
      if (i === steps.length - 1 && top > 0) pts.push([radius, 0, z - top], [radius - top, 0, z]);
      else pts.push([radius, 0, z]);
    });
    pts.push([0, 0, z]);
    const face = r.makePolygon(pts);
    const solid = r.revolution(face, [0, 0, 0], [0, 0, 1], 360);
    face.delete();
    return solid;
  },
};
