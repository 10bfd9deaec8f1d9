/** Options for one kernel task. */
export interface KernelRunOptions {
  /** Time limit for this task (default: the pool's `taskTimeoutMs`), queue wait included. */
  timeoutMs?: number;
  /** Abort from outside (e.g. the HTTP client went away); the task's worker is stopped and replaced. */
  signal?: AbortSignal;
}

export interface KernelPoolStats {
  size: number;
  /** Workers that finished loading and warming up since the pool started. */
  warmed: number;
  /** Workers retired because their heap passed the limit. */
  retired: number;
  /** Tasks stopped by their time limit. */
  timedOut: number;
  /** Workers that died while running a task. */
  crashed: number;
  completed: number;
  queued: number;
}

/**
 * The solid kernel as the rest of the server sees it: named tasks run on warm workers that never block the
 * web server's event loop. Every failure is a `KernelError` (see errors.ts); the pool itself never throws
 * outside a `run` promise and never takes the process down.
 */
export interface KernelPool {
  /** Runs the registered task `taskName` (server/kernel/tasks) with `input`. */
  run<T = unknown>(taskName: string, input: unknown, opts?: KernelRunOptions): Promise<T>;
  /** Resolves once the first set of workers has loaded and warmed up (requests made earlier just wait). */
  ready(): Promise<void>;
  stats(): KernelPoolStats;
  /** Stops every worker; pending tasks fail with `kernel_closed`. */
  close(): Promise<void>;
}

/** What the pool logs through (pino's logger fits). */
export interface KernelLogger {
  info(obj: object, msg?: string): void;
  warn(obj: object, msg?: string): void;
  error(obj: object, msg?: string): void;
}

export const silentLogger: KernelLogger = { info() {}, warn() {}, error() {} };
