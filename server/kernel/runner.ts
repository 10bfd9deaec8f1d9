import { createRequire } from "node:module";
import { createKernelContext, PartShapeCache, type KernelContext } from "./context";
import { KernelError } from "./errors";
import { describeKernelException, loadKernel, type LoadedKernel } from "./oc";
import { kernelTasks } from "./tasks";
import type { KernelTask } from "./tasks/types";
import { warmUpParts } from "./warmup";

export interface RunnerOptions {
  partCacheEntries: number;
  extraTaskModules: string[];
}

/**
 * Runs registered tasks against one loaded kernel, in the thread that loaded it (a pool worker, or the
 * main thread for the CLI). Failures come out as KernelError with a readable message: kernel exceptions
 * are decoded here, in the thread that caught them.
 */
export class TaskRunner {
  private constructor(
    readonly kernel: LoadedKernel,
    private readonly tasks: Map<string, KernelTask<unknown, unknown>>,
    private readonly cache: PartShapeCache,
    private readonly ctx: KernelContext,
  ) {}

  static async create(options: RunnerOptions): Promise<TaskRunner> {
    const kernel = await loadKernel();
    const tasks = new Map<string, KernelTask<unknown, unknown>>();
    for (const t of kernelTasks as KernelTask<unknown, unknown>[]) tasks.set(t.name, t);
    // require, not import(): inside a worker thread on Node 20 only tsx's require hook is active.
    const requireModule = createRequire(import.meta.url);
    for (const file of options.extraTaskModules) {
      const mod = requireModule(file) as { tasks?: KernelTask<unknown, unknown>[] };
      for (const t of mod.tasks ?? []) tasks.set(t.name, t);
    }
    const cache = new PartShapeCache(options.partCacheEntries);
    return new TaskRunner(kernel, tasks, cache, createKernelContext(kernel, cache));
  }

  get heapBytes(): number {
    return this.ctx.heapBytes();
  }

  taskNames(): string[] {
    return [...this.tasks.keys()];
  }

  async execute(name: string, input: unknown): Promise<unknown> {
    const task = this.tasks.get(name);
    if (!task) throw new KernelError("kernel_task", `There is no kernel task "${name}" (known: ${this.taskNames().join(", ")}).`);
    try {
      return await task.run(input, this.ctx);
    } catch (err) {
      if (err instanceof KernelError) throw err;
      throw new KernelError("kernel_task", `Kernel task "${name}" failed: ${describeKernelException(this.kernel.oc, err)}.`, {
        kernelMessage: describeKernelException(this.kernel.oc, err),
      });
    } finally {
      this.cache.trim();
    }
  }

  /** Builds, meshes and exports the representative parts `rounds` times, then forgets them. */
  async warmUp(rounds: number): Promise<void> {
    for (let i = 0; i < rounds; i++) {
      await this.execute("model", { parts: warmUpParts });
      await this.execute("step", { parts: warmUpParts.slice(0, 1) });
      this.cache.clear();
    }
  }
}
