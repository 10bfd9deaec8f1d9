/** The solid kernel's public surface for the rest of the server. */
export { createKernelPool } from "./pool";
export { createInProcessKernel } from "./in-process";
export { kernelConfigFromEnv, defaultKernelConfig, type KernelConfig } from "./config";
export { KernelError, kernelErrorCodes, type KernelErrorCode, type KernelErrorDetails } from "./errors";
export type { KernelPool, KernelPoolStats, KernelRunOptions, KernelLogger } from "./types";
export type { ModelTaskInput, ModelTaskOutput, ModelTaskPart, StepTaskInput, StepTaskOutput, StlTaskInput, StlTaskOutput, InfoTaskOutput } from "./tasks";
export type { CosmeticThread } from "./builders/types";
export type { MeshData } from "./mesh";
