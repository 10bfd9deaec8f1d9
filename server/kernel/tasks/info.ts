import { threadId } from "node:worker_threads";
import { defineTask } from "./types";

export interface InfoTaskOutput {
  /** The worker thread that ran the task (0 in-process). */
  threadId: number;
  heapBytes: number;
}

/** Which worker answered and how big its kernel heap is (health checks and pool tests). */
export const infoTask = defineTask<Record<string, never>, InfoTaskOutput>({
  name: "info",
  run(_input, ctx) {
    return { threadId, heapBytes: ctx.heapBytes() };
  },
});
