import { buildExport, type ExportRequest, type ExportTaskOutput } from "@server/exporters/build-export";
import { projectTask } from "./project";
import { stepTask } from "./step";
import { stlTask } from "./stl";
import type { KernelTask } from "./types";
import { defineTask } from "./types";

/** The tasks a pack calls, run here on this worker's kernel (no second trip through the pool). */
const local: Record<string, KernelTask<never, unknown>> = { project: projectTask, step: stepTask, stl: stlTask };

/**
 * A whole download file built on the worker: projections, drawing layout, PDF/SVG/DXF writing, STEP, STL
 * and the ZIP, so none of it runs on the web server's event loop (server/exporters/build-export.ts).
 */
export const exportTask = defineTask<ExportRequest, ExportTaskOutput>({
  name: "export",
  async run(input, ctx) {
    const kernel = {
      run: async <T>(name: string, taskInput: unknown): Promise<T> => {
        const task = local[name];
        if (!task) throw new Error(`The export task cannot call "${name}".`);
        return (await task.run(taskInput as never, ctx)) as T;
      },
    };
    const file = await buildExport(input, { kernel, inWorker: false });
    return { fileName: file.fileName, contentType: file.contentType, bytes: new Uint8Array(file.body.buffer, file.body.byteOffset, file.body.byteLength) };
  },
});
