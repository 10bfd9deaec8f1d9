import type { ResolvedPart } from "@/engine/parts/features";
import { placedCopy, stepBytes, type StepEntry } from "../step";
import { defineTask } from "./types";

export interface StepTaskInput {
  parts: ResolvedPart[];
  /** Place each part by its assembly placement (an assembly file); otherwise each part in its own frame. */
  assembly?: boolean;
  /** "#rrggbb" per part id, written as the product's colour. */
  colours?: Record<string, string>;
}

export interface StepTaskOutput {
  /** The STEP file (ISO 10303-21, AP242, mm). */
  bytes: Uint8Array;
}

/** STEP of one or more parts (per-part files pass one part; the assembly passes all with `assembly`). */
export const stepTask = defineTask<StepTaskInput, StepTaskOutput>({
  name: "step",
  async run(input, ctx) {
    const copies: StepEntry[] = input.parts.map((part) => {
      const built = ctx.buildPart(part);
      const shape = input.assembly ? placedCopy(built.shape, part) : built.shape.clone();
      return { shape, name: part.name, colour: input.colours?.[part.id] };
    });
    try {
      return { bytes: await stepBytes(ctx.kernel, copies) };
    } finally {
      copies.forEach((c) => c.shape.delete());
    }
  },
});
