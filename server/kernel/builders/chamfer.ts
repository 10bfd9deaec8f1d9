import type { Shape3D } from "replicad";
import type { Axis, Direction } from "@/engine/parts/features";
import { KernelError } from "../errors";
import { axisIndex, axisVector, directionAxis, scale, add, type Vec3 } from "../frame";
import type { BaseInfo, ToolBuilder } from "./types";
import type { LoadedKernel } from "../oc";

/** How far the chamfer tools reach past the outside, so no sliver is left. */
const CLEARANCE_MM = 0.5;

/** An outside edge of the base: it runs along `along`, and `out1`, `out2` are the outward normals of its two faces. */
interface OutsideEdge {
  along: Axis;
  /** A point on the edge line. */
  point: Vec3;
  out1: Vec3;
  out2: Vec3;
  key: string;
}

/** The four outside edges of one face of a block base. */
function blockFaceEdges(face: Direction, base: BaseInfo): OutsideEdge[] {
  const n = directionAxis(face);
  const nIdx = axisIndex(n);
  const nSign = face[0] === "+" ? 1 : -1;
  const others = (["x", "y", "z"] as const).filter((a) => a !== n);
  const edges: OutsideEdge[] = [];
  for (const along of others) {
    const b = others.find((a) => a !== along)!;
    const bIdx = axisIndex(b);
    for (const bSign of [-1, 1]) {
      const point: Vec3 = [0, 0, 0];
      point[nIdx] = nSign > 0 ? base.max[nIdx]! : base.min[nIdx]!;
      point[bIdx] = bSign > 0 ? base.max[bIdx]! : base.min[bIdx]!;
      point[axisIndex(along)] = base.min[axisIndex(along)]!;
      const key = `${along}:${point.join(",")}`;
      edges.push({ along, point, out1: scale(axisVector(n), nSign), out2: scale(axisVector(b), bSign), key });
    }
  }
  return edges;
}

/**
 * A 45° chamfer on a straight outside edge as a cutting tool: the triangular prism {s + t < c} where s and t
 * are the depths below the edge's two faces, reaching {@link CLEARANCE_MM} into the air and past both ends.
 * On a box this removes exactly what an edge chamfer does, mitred corners included.
 */
function edgePrism(kernel: LoadedKernel, edge: OutsideEdge, c: number, base: BaseInfo): Shape3D {
  const { r } = kernel;
  const ai = axisIndex(edge.along);
  const length = base.max[ai]! - base.min[ai]! + 2;
  const start: Vec3 = [...edge.point];
  start[ai] = base.min[ai]! - 1;
  // (s, t) → start − s·out1 − t·out2
  const at = (s: number, t: number): Vec3 => add(add(start, scale(edge.out1, -s)), scale(edge.out2, -t));
  const e = CLEARANCE_MM;
  const face = r.makePolygon([at(-e, -e), at(c + e, -e), at(-e, c + e)]);
  const vec = new r.Vector(scale(axisVector(edge.along), length));
  const solid = r.basicFaceExtrusion(face, vec);
  face.delete();
  vec.delete();
  return solid;
}

/** The chamfer ring at one end face of a turned base: the triangle {s + t < c} revolved about the axis. */
function endRing(kernel: LoadedKernel, face: "+z" | "-z", c: number, base: BaseInfo & { kind: "turned" }): Shape3D {
  const { r } = kernel;
  const top = face === "+z";
  const step = top ? base.steps[base.steps.length - 1]! : base.steps[0]!;
  const R = step.diameter / 2;
  const zEnd = top ? base.lengthMm : 0;
  const sign = top ? 1 : -1;
  // s = R − ρ (depth below the cylinder), t = depth below the end face.
  const at = (s: number, t: number): [number, number, number] => [R - s, 0, zEnd - sign * t];
  const e = CLEARANCE_MM;
  const prof = r.makePolygon([at(-e, -e), at(c + e, -e), at(-e, c + e)]);
  const solid = r.revolution(prof, [0, 0, 0], [0, 0, 1], 360);
  prof.delete();
  return solid;
}

/**
 * 45° chamfers of leg `size` on the outside edges of the listed faces of the base (a block's four edges
 * around each face; a turned part's outer circle at an end face). Built as cutting tools, so they batch
 * with the other cuts; edges shared by two listed faces are cut once.
 */
export const chamferBuilder: ToolBuilder<"chamfer"> = {
  kind: "chamfer",
  role: "tool",
  tool(feature, { kernel, base }) {
    const c = feature.size;
    if (base.kind === "turned") {
      if (feature.faces.some((f) => f !== "+z" && f !== "-z")) throw new KernelError("kernel_input", "On a turned part only the end faces (+z, -z) can be chamfered.");
      const faces = [...new Set(feature.faces)] as ("+z" | "-z")[];
      return { tools: faces.map((f) => endRing(kernel, f, c, base)), threads: [] };
    }
    const seen = new Map<string, OutsideEdge>();
    for (const f of feature.faces) for (const e of blockFaceEdges(f, base)) seen.set(e.key, e);
    return { tools: [...seen.values()].map((e) => edgePrism(kernel, e, c, base)), threads: [] };
  },
};
