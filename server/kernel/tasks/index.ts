import { infoTask } from "./info";
import { modelTask } from "./model";
import { modelJsonTask } from "./model-json";
import { projectTask } from "./project";
import { exportTask } from "./export";
import { stepTask } from "./step";
import { stlTask } from "./stl";
import type { KernelTask } from "./types";

/**
 * The task registry: every kind of work a kernel worker can do. To add a task, write
 * `tasks/<name>.ts` exporting `defineTask({ name, run(input, ctx) })` and add it to this list (one line).
 */
export const kernelTasks: KernelTask<never, unknown>[] = [modelTask, modelJsonTask, stepTask, stlTask, infoTask, projectTask, exportTask];

export type { ModelTaskInput, ModelTaskOutput, ModelTaskPart } from "./model";
export type { ModelJsonTaskInput, ModelJsonTaskOutput } from "./model-json";
export type { StepTaskInput, StepTaskOutput } from "./step";
export type { StlTaskInput, StlTaskOutput } from "./stl";
export type { InfoTaskOutput } from "./info";
export type { ProjectTaskInput, ProjectTaskOutput } from "./project";
export type { KernelTask } from "./types";
export { defineTask } from "./types";
