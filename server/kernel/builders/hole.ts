import type { Direction, HoleFeature, Point3 } from "@/engine/parts/features";
import { KernelError } from "../errors";
import { directionAxis, toolFrame, type ToolFrame } from "../frame";
import { revolvedTool, throughDepthMm, type ProfilePoint } from "./tools";
import type { BaseInfo, ToolBuilder } from "./types";

/**
 * The profile of a plain, chamfered, countersunk or counterbored hole, from the entry face down
 * (drill point not modelled: `depth` is the depth of the full diameter).
 *  - chamfer c (45°): radius r + c at the face, r at depth c;
 *  - countersink Ø D, included angle α (default 90°): radius D/2 at the face, r at depth (D/2 − r)/tan(α/2);
 *  - counterbore Ø D × d: radius D/2 down to depth d, then the hole (a chamfer then breaks the counterbore's edge).
 */
export function holeProfile(
  hole: Pick<HoleFeature, "diameter" | "chamfer" | "countersink" | "counterbore">,
  depthMm: number,
): ProfilePoint[] {
  const r = hole.diameter / 2;
  const pts: ProfilePoint[] = [];
  const c = hole.chamfer ?? 0;
  if (hole.counterbore) {
    const rc = hole.counterbore.diameter / 2;
    if (c > 0) pts.push({ radius: rc + c, depth: 0 }, { radius: rc, depth: c });
    else pts.push({ radius: rc, depth: 0 });
    pts.push({ radius: rc, depth: hole.counterbore.depth }, { radius: r, depth: hole.counterbore.depth });
  } else if (hole.countersink) {
    const rs = hole.countersink.diameter / 2;
    const half = ((hole.countersink.angleDeg ?? 90) / 2) * (Math.PI / 180);
    pts.push({ radius: rs, depth: 0 }, { radius: r, depth: (rs - r) / Math.tan(half) });
  } else if (c > 0) {
    pts.push({ radius: r + c, depth: 0 }, { radius: r, depth: c });
  } else {
    pts.push({ radius: r, depth: 0 });
  }
  pts.push({ radius: r, depth: depthMm });
  return pts;
}

export interface HoleAxis {
  frame: ToolFrame;
  /** Where the tool meets the material (equals `at` except for radial holes in turned parts). */
  entry: Point3;
  radial: boolean;
  /** Depth to the far side of the base's box along the axis (what "through" means), plus 1 mm. */
  throughMm: number;
}

/**
 * The axis of a hole-like feature. On a block, the hole enters at `at`. On a turned part, ±z holes are axial
 * and enter at `at`; ±x / ±y holes are radial cross holes: the axis is the line through `at` along
 * `direction`, and the hole enters where that line meets the outside diameter of the step containing
 * `at.z` (features.ts), so `depth` is measured at the axis from that surface.
 */
export function holeAxis(f: { at: Point3; direction: Direction }, base: BaseInfo): HoleAxis {
  const axis = directionAxis(f.direction);
  let entry = f.at;
  let radial = false;
  if (base.kind === "turned" && axis !== "z") {
    radial = true;
    let z0 = 0;
    const step = base.steps.find((s) => {
      const inside = f.at.z >= z0 - 1e-9 && f.at.z <= z0 + s.length + 1e-9;
      z0 += s.length;
      return inside;
    });
    if (!step) throw new KernelError("kernel_input", `the cross hole's axis height z=${f.at.z} is outside the part (0 to ${base.lengthMm})`);
    const R = step.diameter / 2;
    const offset = axis === "x" ? f.at.y : f.at.x;
    if (Math.abs(offset) >= R) throw new KernelError("kernel_input", `the cross hole's axis is ${Math.abs(offset)} mm off centre, outside the Ø${step.diameter} step`);
    const sign = f.direction[0] === "-" ? -1 : 1;
    const surface = -sign * Math.sqrt(R * R - offset * offset);
    entry = { ...f.at, [axis]: surface };
  }
  const frame = toolFrame(entry, f.direction);
  return { frame, entry, radial, throughMm: throughDepthMm(base, frame.origin, frame.w) };
}

export const holeBuilder: ToolBuilder<"hole"> = {
  kind: "hole",
  role: "tool",
  tool(feature, { kernel, base }) {
    const ax = holeAxis(feature, base);
    const depth = feature.through || feature.depth === undefined ? ax.throughMm : feature.depth;
    const shape = ax.radial ? { diameter: feature.diameter } : feature;
    const tool = revolvedTool(kernel, ax.frame, holeProfile(shape, depth));
    return { tools: [tool], threads: [] };
  },
};
