import type { ResolvedPart } from "@/engine/parts/features";
import { encodeModelPart } from "../encode-model";
import { DEFAULT_MESH_OPTIONS, meshShape } from "../mesh";
import { defineTask } from "./types";

export interface ModelJsonTaskInput {
  parts: ResolvedPart[];
}

export interface ModelJsonTaskOutput {
  /** Per part, in order: the UTF-8 JSON of one `ModelPart` (src/shared/model.ts). */
  parts: Uint8Array[];
}

/**
 * The 3D preview parts already encoded (base64 meshes, matrices, colour, mass) in the worker, so the web
 * thread only splices bytes: no large strings or typed-array encoding on the event loop.
 */
export const modelJsonTask = defineTask<ModelJsonTaskInput, ModelJsonTaskOutput>({
  name: "model-json",
  run(input, ctx) {
    return {
      parts: input.parts.map((part) => {
        const built = ctx.buildPart(part);
        return encodeModelPart(part, built, meshShape(ctx.kernel, built.shape, DEFAULT_MESH_OPTIONS));
      }),
    };
  },
});
