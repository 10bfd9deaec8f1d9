import type { ResolvedPart } from "@/engine/parts/features";
import { DEFAULT_MESH_OPTIONS, meshShape, type MeshOptions } from "../mesh";
import { assemblyMatrix } from "../placement";
import { binaryStl } from "../stl";
import { defineTask } from "./types";

export interface StlTaskInput {
  parts: ResolvedPart[];
  /** Place each part by its assembly placement (one file for the whole assembly). */
  assembly?: boolean;
  meshOptions?: MeshOptions;
}

export interface StlTaskOutput {
  /** Binary STL, mm. */
  bytes: Uint8Array;
  triangleCount: number;
}

/** Binary STL of one part, or of the whole assembly with each part in place. */
export const stlTask = defineTask<StlTaskInput, StlTaskOutput>({
  name: "stl",
  run(input, ctx) {
    const meshes = input.parts.map((part) => ({
      mesh: meshShape(ctx.kernel, ctx.buildPart(part).shape, input.meshOptions ?? DEFAULT_MESH_OPTIONS),
      matrix: input.assembly ? assemblyMatrix(part) : undefined,
    }));
    const bytes = binaryStl(meshes);
    return { bytes, triangleCount: meshes.reduce((s, m) => s + m.mesh.indices.length / 3, 0) };
  },
});
