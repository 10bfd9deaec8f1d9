import type { SerializedKernelError } from "./errors";

/** What the pool posts to a worker. */
export interface WorkerRequest {
  task: string;
  input: unknown;
}

/** Facts about the worker that ran a task, sent with every answer. */
export interface WorkerMeta {
  threadId: number;
  heapBytes: number;
  /** The heap passed the limit: the pool stops sending work to this worker and replaces it. */
  retire: boolean;
}

/** A worker's answer: errors travel as data, because structured cloning strips an Error's own fields. */
export type WorkerResponse = { ok: true; value: unknown; meta: WorkerMeta } | { ok: false; error: SerializedKernelError; meta: WorkerMeta };

/** Posted on the worker's parentPort once the kernel is loaded and warm. */
export interface WorkerReadyMessage {
  type: "jigwright-kernel-ready";
  threadId: number;
  heapBytes: number;
  warmUpMs: number;
}

export interface WorkerOptions {
  heapLimitBytes: number;
  warmupRounds: number;
  partCacheEntries: number;
  extraTaskModules: string[];
}
