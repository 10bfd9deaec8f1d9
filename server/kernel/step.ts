import type { Shape3D } from "replicad";
import type { ResolvedPart } from "@/engine/parts/features";
import { axisVector } from "./frame";
import type { LoadedKernel } from "./oc";
import { volumeOf } from "./shape-check";

/** A copy of `shape` moved to its place in the assembly (same order of operations as `assemblyMatrix`). */
export function placedCopy(shape: Shape3D, part: Pick<ResolvedPart, "placement">): Shape3D {
  let s = shape.clone();
  const p = part.placement;
  if (!p) return s;
  for (const r of p.rotations ?? []) s = s.rotate(r.angleDeg, [0, 0, 0], axisVector(r.axis));
  return s.translate([p.position.x, p.position.y, p.position.z]);
}

export interface StepEntry {
  shape: Shape3D;
  /** Product name written into the file (the part's name). */
  name: string;
  /** "#rrggbb", carried as the shape's colour. */
  colour?: string;
}

/**
 * Writes a STEP file (ISO 10303-21; application protocol AP242, the schema OpenCascade writes with
 * `write.step.schema` 5), lengths in millimetres. One named product per entry. Uses the kernel's in-memory
 * file system with a fixed file name, so one export at a time per worker (the pool runs one task per worker).
 */
export function stepBytes(kernel: LoadedKernel, entries: StepEntry[]): Promise<Uint8Array> {
  const blob = kernel.r.exportSTEP(
    entries.map((e) => ({ shape: e.shape, name: e.name, ...(e.colour ? { color: e.colour } : {}) })),
    { unit: "mm", modelUnit: "mm" },
  );
  return blob.arrayBuffer().then((b) => new Uint8Array(b));
}

/** Reads a STEP file back into the kernel and returns the total volume of its solids (for round-trip checks). */
export async function stepVolumeMm3(kernel: LoadedKernel, bytes: Uint8Array): Promise<{ volumeMm3: number; solidCount: number }> {
  const shape = (await kernel.r.importSTEP(new Blob([bytes as Uint8Array<ArrayBuffer>]))) as Shape3D;
  try {
    const solids = shape.solids;
    const volumeMm3 = solids.reduce((s, x) => s + volumeOf(kernel, x), 0);
    solids.forEach((s) => s.delete());
    return { volumeMm3, solidCount: solids.length };
  } finally {
    shape.delete();
  }
}
