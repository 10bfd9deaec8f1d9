import type { Drawing, Shape3D } from "replicad";
import type { LoadedKernel } from "../oc";
import { dot, inFrame, sub, type ToolFrame, type Vec3 } from "../frame";
import { ENTRY_CLEARANCE_MM, type BaseInfo } from "./types";

/**
 * Distance from `entry` along the unit vector `w` to where it leaves the base's bounding box, plus a
 * clearance: the depth of a tool that goes right through.
 */
export function throughDepthMm(base: BaseInfo, entry: Vec3, w: Vec3): number {
  let depth = 0;
  for (let i = 0; i < 3; i++) {
    const wi = w[i]!;
    if (Math.abs(wi) < 1e-12) continue;
    const far = wi > 0 ? base.max[i]! : base.min[i]!;
    depth = Math.max(depth, (far - entry[i]!) / wi);
  }
  return depth + 1;
}

/** The base's largest extent: a length every "through" cut can use as an upper bound. */
export function baseDiagonalMm(base: BaseInfo): number {
  const d = sub(base.max, base.min);
  return Math.sqrt(dot(d, d));
}

/**
 * A point of a revolved hole profile: `radius` from the axis at `depth` below the entry face.
 * The profile runs from the entry face down; it is closed along the axis.
 */
export interface ProfilePoint {
  radius: number;
  depth: number;
}

/**
 * A tool of revolution about the frame's w axis (holes with chamfer, countersink or counterbore, bores):
 * the profile is revolved 360°, starting {@link ENTRY_CLEARANCE_MM} outside the entry face so no sliver of
 * the face survives. BRepSweep turns straight profile segments into planes, cylinders and cones, so the
 * hole's faces are exact analytic surfaces (the drawings find centre lines from them).
 */
export function revolvedTool(kernel: LoadedKernel, frame: ToolFrame, profile: ProfilePoint[]): Shape3D {
  const { r } = kernel;
  const first = profile[0]!;
  const last = profile[profile.length - 1]!;
  const pts: ProfilePoint[] = [
    { radius: 0, depth: -ENTRY_CLEARANCE_MM },
    { radius: first.radius, depth: -ENTRY_CLEARANCE_MM },
    ...profile,
    { radius: 0, depth: last.depth },
  ];
  const deduped = pts.filter((p, i) => {
    const q = pts[i - 1];
    return !q || Math.abs(q.radius - p.radius) > 1e-9 || Math.abs(q.depth - p.depth) > 1e-9;
  });
  const face = r.makePolygon(deduped.map((p) => inFrame(frame, p.radius, 0, p.depth)));
  const solid = r.revolution(face, frame.origin, frame.w, 360);
  face.delete();
  return solid;
}

/**
 * A prism: a 2D outline drawn in the frame's (u, v) plane with its origin at the frame origin, extruded
 * along w from just outside the entry face to `depthMm`.
 */
export function prismTool(kernel: LoadedKernel, frame: ToolFrame, outline: Drawing, depthMm: number): Shape3D {
  const { r } = kernel;
  const start = inFrame(frame, 0, 0, -ENTRY_CLEARANCE_MM);
  const plane = new r.Plane(start, frame.u, frame.w);
  const sketch = outline.sketchOnPlane(plane);
  const solid = sketch.extrude(depthMm + ENTRY_CLEARANCE_MM) as Shape3D;
  plane.delete();
  return solid;
}
