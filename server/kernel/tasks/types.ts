import type { KernelContext } from "../context";

/**
 * A unit of kernel work, run inside a pool worker (or in-process by the CLI): plain, structured-cloneable
 * input in, plain output out. Typed arrays in the output are transferred to the caller without copying.
 * Throw a `KernelError` for a failure the user should read; anything else is wrapped with the task's name.
 */
export interface KernelTask<I = unknown, O = unknown> {
  name: string;
  run(input: I, ctx: KernelContext): O | Promise<O>;
}

/** Declares a task with its input and output types (identity at run time). */
export function defineTask<I, O>(task: KernelTask<I, O>): KernelTask<I, O> {
  return task;
}
