import { defaultKernelConfig, type KernelConfig } from "./config";
import { KernelError } from "./errors";
import { TaskRunner } from "./runner";
import type { KernelPool, KernelPoolStats, KernelRunOptions } from "./types";

/**
 * The kernel on the calling thread, behind the same interface as the pool: for the CLI (one job, no server
 * to keep responsive) and for tests of tasks. Tasks run one after another. A time limit cannot stop work
 * inside WASM on the same thread, so `timeoutMs` is not enforced here; use the pool for untrusted input.
 */
export function createInProcessKernel(config: Partial<KernelConfig> = {}): KernelPool {
  const cfg: KernelConfig = { ...defaultKernelConfig(), warmupRounds: 0, ...config };
  const runnerPromise = TaskRunner.create({ partCacheEntries: cfg.partCacheEntries, extraTaskModules: cfg.extraTaskModules }).then(async (r) => {
    await r.warmUp(cfg.warmupRounds);
    return r;
  });
  let chain: Promise<unknown> = Promise.resolve();
  let closed = false;
  const stats: KernelPoolStats = { size: 1, warmed: 0, retired: 0, timedOut: 0, crashed: 0, completed: 0, queued: 0 };
  void runnerPromise.then(() => stats.warmed++, () => undefined);

  return {
    run<T>(taskName: string, input: unknown, _opts?: KernelRunOptions): Promise<T> {
      if (closed) return Promise.reject(new KernelError("kernel_closed", "The solid kernel has been shut down."));
      stats.queued++;
      const next = chain.then(async () => {
        const runner = await runnerPromise;
        try {
          return (await runner.execute(taskName, input)) as T;
        } finally {
          stats.queued--;
          stats.completed++;
        }
      });
      chain = next.catch(() => undefined);
      return next;
    },
    ready: () => runnerPromise.then(() => undefined),
    stats: () => ({ ...stats }),
    async close() {
      closed = true;
      await chain;
    },
  };
}
