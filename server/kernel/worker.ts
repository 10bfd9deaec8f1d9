/**
 * The piscina worker: loads the kernel once, warms it up, then answers {@link WorkerRequest}s by running the
 * registered task. The default export is a promise of the handler, which piscina awaits before it reports
 * the worker ready, so no request reaches a cold worker.
 */
import { parentPort, threadId, workerData } from "node:worker_threads";
import Piscina from "piscina";
import { KernelError, serializeKernelError } from "./errors";
import type { WorkerMeta, WorkerOptions, WorkerReadyMessage, WorkerRequest, WorkerResponse } from "./protocol";
import { TaskRunner } from "./runner";
import { collectBuffers } from "./transfer";

const options = workerData as WorkerOptions;

async function start() {
  const t0 = performance.now();
  const runner = await TaskRunner.create({ partCacheEntries: options.partCacheEntries, extraTaskModules: options.extraTaskModules });
  await runner.warmUp(options.warmupRounds);
  const ready: WorkerReadyMessage = { type: "jigwright-kernel-ready", threadId, heapBytes: runner.heapBytes, warmUpMs: performance.now() - t0 };
  parentPort?.postMessage(ready);

  return async function handle(request: WorkerRequest): Promise<unknown> {
    let response: WorkerResponse;
    try {
      const value = await runner.execute(request.task, request.input);
      response = { ok: true, value, meta: meta(runner) };
    } catch (err) {
      const error = err instanceof KernelError ? err : new KernelError("kernel_task", err instanceof Error ? err.message : String(err));
      response = { ok: false, error: serializeKernelError(error), meta: meta(runner) };
    }
    const buffers = response.ok ? collectBuffers(response.value) : [];
    if (buffers.length === 0) return response;
    // Hand the typed arrays to the caller without copying (GEOMETRY.md pitfall 13).
    return Piscina.move({ [Piscina.transferableSymbol]: buffers, [Piscina.valueSymbol]: response } as never);
  };
}

function meta(runner: TaskRunner): WorkerMeta {
  const heapBytes = runner.heapBytes;
  return { threadId, heapBytes, retire: heapBytes > options.heapLimitBytes };
}

export default start();
