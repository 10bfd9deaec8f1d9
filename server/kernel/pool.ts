import { fileURLToPath } from "node:url";
import Piscina from "piscina";
import { defaultKernelConfig, type KernelConfig } from "./config";
import { deserializeKernelError, KernelError } from "./errors";
import type { WorkerOptions, WorkerReadyMessage, WorkerRequest, WorkerResponse } from "./protocol";
import { silentLogger, type KernelLogger, type KernelPool, type KernelPoolStats, type KernelRunOptions } from "./types";

interface WorkerIface {
  id: number;
  currentUsage: number;
}

const TIMEOUT = Symbol("kernel-timeout");

/**
 * A piscina pool of kernel workers (GEOMETRY.md pitfalls 3–5, 12):
 *  - `atomics: 'disabled'`, so a worker's event loop turns between tasks (finalisers, timers, exit);
 *  - one task per worker (the STEP writer uses a fixed file in the WASM file system);
 *  - every task has an AbortSignal with a time limit: piscina terminates the hung thread and starts another;
 *  - a worker whose kernel heap passed the limit is sent no more work and terminated once idle; piscina
 *    starts its replacement (a custom load balancer skips retiring workers);
 *  - a worker that dies is replaced by piscina; its task fails with `kernel_crash`.
 */
export function createKernelPool(config: Partial<KernelConfig> = {}, logger: KernelLogger = silentLogger): KernelPool {
  const cfg: KernelConfig = { ...defaultKernelConfig(), ...config };
  const size = Math.max(1, Math.floor(cfg.poolSize));
  const filename = fileURLToPath(new URL("./worker.ts", import.meta.url));
  const tsconfig = fileURLToPath(new URL("../../tsconfig.json", import.meta.url));
  const workerData: WorkerOptions = {
    heapLimitBytes: cfg.heapLimitMb * 1024 * 1024,
    warmupRounds: cfg.warmupRounds,
    partCacheEntries: cfg.partCacheEntries,
    extraTaskModules: cfg.extraTaskModules,
  };

  /** Workers past the heap limit: no new work; terminated once idle. */
  const retiring = new Set<number>();
  /** Workers being terminated: still listed by piscina until their exit, so the balancer must skip them. */
  const stopping = new Set<number>();
  const ifaces = new Map<number, WorkerIface>();
  const stats: KernelPoolStats = { size, warmed: 0, retired: 0, timedOut: 0, crashed: 0, completed: 0, queued: 0 };
  let closed = false;
  let readyResolve: () => void = () => {};
  const readyPromise = new Promise<void>((resolve) => (readyResolve = resolve));

  const piscina = new Piscina<WorkerRequest, WorkerResponse>({
    filename,
    minThreads: size,
    maxThreads: size,
    idleTimeout: Infinity,
    concurrentTasksPerWorker: 1,
    atomics: "disabled",
    maxQueue: cfg.maxQueue,
    // Workers load TypeScript through tsx, with the repository's path aliases.
    execArgv: ["--import", "tsx"],
    env: { ...process.env, TSX_TSCONFIG_PATH: tsconfig },
    workerData,
    loadBalancer: (_task, workers) => {
      for (const w of workers as unknown as WorkerIface[]) {
        if (!retiring.has(w.id) && !stopping.has(w.id) && w.currentUsage === 0) return w as never;
      }
      return null;
    },
  });

  piscina.on("workerCreate", (w: WorkerIface) => ifaces.set(w.id, w));
  piscina.on("workerDestroy", (w: WorkerIface) => {
    ifaces.delete(w.id);
    retiring.delete(w.id);
    stopping.delete(w.id);
  });
  piscina.on("message", (m: WorkerReadyMessage) => {
    if (m?.type !== "jigwright-kernel-ready") return;
    stats.warmed++;
    logger.info({ threadId: m.threadId, heapMb: Math.round(m.heapBytes / 1e6), warmUpMs: Math.round(m.warmUpMs) }, "kernel worker ready");
    if (stats.warmed >= size) readyResolve();
  });
  // An error event with no listener would take the process down.
  piscina.on("error", (err: unknown) => logger.error({ err }, "kernel worker error"));

  /** Terminates retiring workers that have no task; piscina replaces them. */
  const sweep = () => {
    for (const id of [...retiring]) {
      const iface = ifaces.get(id);
      if (iface && iface.currentUsage !== 0) continue;
      const worker = piscina.threads.find((t) => t.threadId === id);
      retiring.delete(id);
      if (worker) {
        stopping.add(id);
        stats.retired++;
        logger.info({ threadId: id }, "kernel worker retired (heap limit)");
        void worker.terminate();
      }
    }
  };

  async function run<T>(taskName: string, input: unknown, opts: KernelRunOptions = {}): Promise<T> {
    if (closed) throw new KernelError("kernel_closed", "The solid kernel has been shut down.");
    const timeoutMs = opts.timeoutMs ?? cfg.taskTimeoutMs;
    const controller = new AbortController();
    const timer = setTimeout(() => controller.abort(TIMEOUT), timeoutMs);
    const onOuterAbort = () => controller.abort(opts.signal?.reason ?? "aborted");
    opts.signal?.addEventListener("abort", onOuterAbort, { once: true });
    if (opts.signal?.aborted) onOuterAbort();
    stats.queued++;
    let response: WorkerResponse;
    try {
      response = await piscina.run({ task: taskName, input }, { signal: controller.signal });
    } catch (err) {
      if (controller.signal.aborted && controller.signal.reason === TIMEOUT) {
        stats.timedOut++;
        throw new KernelError("kernel_timeout", `The solid kernel took longer than ${timeoutMs} ms on "${taskName}" and was stopped.`);
      }
      if (controller.signal.aborted) throw new KernelError("kernel_task", `The kernel task "${taskName}" was cancelled.`);
      if (closed) throw new KernelError("kernel_closed", "The solid kernel has been shut down.");
      const message = err instanceof Error ? err.message : String(err);
      if (/queue is at limit|no task queue/i.test(message)) throw new KernelError("kernel_busy", "The solid kernel is busy; try again in a moment.");
      stats.crashed++;
      logger.error({ err, task: taskName }, "kernel worker died during a task");
      throw new KernelError("kernel_crash", `The kernel worker stopped unexpectedly during "${taskName}" (${message}); it has been replaced.`);
    } finally {
      stats.queued--;
      clearTimeout(timer);
      opts.signal?.removeEventListener("abort", onOuterAbort);
    }
    stats.completed++;
    if (response.meta.retire) retiring.add(response.meta.threadId);
    if (retiring.size > 0) sweep();
    if (!response.ok) throw deserializeKernelError(response.error);
    return response.value as T;
  }

  return {
    run,
    ready: () => readyPromise,
    stats: () => ({ ...stats }),
    async close() {
      if (closed) return;
      closed = true;
      readyResolve();
      await piscina.destroy();
    },
  };
}
