import { availableParallelism } from "node:os";
import { z } from "zod";

/** How the kernel pool is sized and guarded. Every field has a default; the environment can override each. */
export interface KernelConfig {
  /** Worker threads (default: the machine's cores, at least 1). Each costs ~100 MB and ~0.5 s to load. */
  poolSize: number;
  /**
   * A worker is retired and replaced once its WASM heap passes this many MB (the heap never shrinks).
   * Measured here: a fresh worker holds ~105 MB; each Boolean cut leaks ~0.2 MB inside OpenCascade even
   * with every object deleted, each validity check ~0.075 MB, so a whole-template build costs ~1–3 MB.
   * 256 MB gives ~50+ cold builds between replacements (each replacement: ~0.5 s load plus warm-up).
   */
  heapLimitMb: number;
  /** Default time limit of a task, queue wait included; past it the worker is stopped and replaced. */
  taskTimeoutMs: number;
  /** Warm-up rounds of representative parts each worker builds before taking work (V8 tiers up the WASM). */
  warmupRounds: number;
  /** Tasks allowed to wait for a worker; beyond it `run` fails fast with `kernel_busy`. */
  maxQueue: number;
  /** Solids each worker remembers between tasks (so a drawing after a preview needs no rebuild). */
  partCacheEntries: number;
  /** Size of the in-memory model cache in the web process, MB. */
  modelCacheMb: number;
  /** Extra task modules (absolute paths) each worker loads; tests use it for deliberately failing tasks. */
  extraTaskModules: string[];
}

export const defaultKernelConfig = (): KernelConfig => ({
  poolSize: Math.max(1, availableParallelism()),
  heapLimitMb: 256,
  taskTimeoutMs: 30_000,
  warmupRounds: 3,
  maxQueue: 64,
  partCacheEntries: 32,
  modelCacheMb: 64,
  extraTaskModules: [],
});

const int = (min: number, max: number) => z.coerce.number({ error: "Use a whole number." }).int().min(min).max(max);

/** The environment variables, each optional (documented in DEVELOPERS.md, "Solid kernel"). */
const envSchema = z.object({
  KERNEL_POOL_SIZE: int(1, 64).optional(),
  KERNEL_HEAP_LIMIT_MB: int(64, 4096).optional(),
  KERNEL_TASK_TIMEOUT_MS: int(100, 600_000).optional(),
  KERNEL_WARMUP_ROUNDS: int(0, 20).optional(),
  KERNEL_MAX_QUEUE: int(0, 10_000).optional(),
  KERNEL_PART_CACHE: int(0, 1000).optional(),
  KERNEL_MODEL_CACHE_MB: int(0, 4096).optional(),
});

/** Reads KERNEL_* variables; a bad value throws an Error naming the variable. */
export function kernelConfigFromEnv(env: NodeJS.ProcessEnv = process.env): KernelConfig {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([k, v]) => k.startsWith("KERNEL_") && v !== undefined && v !== ""));
  const parsed = envSchema.safeParse(cleaned);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`Invalid kernel configuration:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  const d = defaultKernelConfig();
  return {
    ...d,
    poolSize: e.KERNEL_POOL_SIZE ?? d.poolSize,
    heapLimitMb: e.KERNEL_HEAP_LIMIT_MB ?? d.heapLimitMb,
    taskTimeoutMs: e.KERNEL_TASK_TIMEOUT_MS ?? d.taskTimeoutMs,
    warmupRounds: e.KERNEL_WARMUP_ROUNDS ?? d.warmupRounds,
    maxQueue: e.KERNEL_MAX_QUEUE ?? d.maxQueue,
    partCacheEntries: e.KERNEL_PART_CACHE ?? d.partCacheEntries,
    modelCacheMb: e.KERNEL_MODEL_CACHE_MB ?? d.modelCacheMb,
  };
}
