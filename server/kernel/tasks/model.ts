import type { ResolvedPart } from "@/engine/parts/features";
import type { CosmeticThread } from "../builders/types";
import { DEFAULT_MESH_OPTIONS, meshShape, type MeshData, type MeshOptions } from "../mesh";
import { defineTask } from "./types";

export interface ModelTaskInput {
  parts: ResolvedPart[];
  /** Triangulate each part (default true); false gives only the solid's numbers (the CLI's `model`). */
  mesh?: boolean;
  meshOptions?: MeshOptions;
}

export interface ModelTaskPart {
  partId: string;
  /** From the exact B-rep. */
  volumeMm3: number;
  bbox: { min: [number, number, number]; max: [number, number, number] };
  /** Every part returned passed the validity check (one solid, BRepCheck valid, volume > 0). */
  valid: true;
  threads: CosmeticThread[];
  mesh?: MeshData;
}

export interface ModelTaskOutput {
  parts: ModelTaskPart[];
}

/** Builds every part (validated, checked) and, unless told not to, triangulates it for the preview. */
export const modelTask = defineTask<ModelTaskInput, ModelTaskOutput>({
  name: "model",
  run(input, ctx) {
    const options = input.meshOptions ?? DEFAULT_MESH_OPTIONS;
    return {
      parts: input.parts.map((part) => {
        const built = ctx.buildPart(part);
        const out: ModelTaskPart = { partId: part.id, volumeMm3: built.volumeMm3, bbox: built.bbox, valid: true, threads: built.threads };
        if (input.mesh !== false) out.mesh = meshShape(ctx.kernel, built.shape, options);
        return out;
      }),
    };
  },
});
