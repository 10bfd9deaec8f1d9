/**
 * Downloads of a configured template: evaluate the parameters, refuse parts that cannot be made, then
 * build the file with the pack service (server/exporters/build-export.ts), which other routes (saved
 * designs) call the same way.
 */
import type { CompiledTemplate, Evaluation } from "@/engine";
import { evaluateForRequest, requireBuildable } from "@server/templates";
import type { KernelPool } from "@server/kernel";
import { buildExport, ExportInputError, type ExportFile, type ExportFormat } from "@server/exporters/build-export";
import { badRequest, HttpError, notFound } from "@server/lib/errors";
import { guardPartsForKernel, kernelErrorToHttp } from "@server/modules/model";
import type { TemplateStore } from "@server/templates";

export interface ExportServiceDeps {
  templates: TemplateStore;
  /** Without a kernel the downloads answer 503. */
  kernel?: KernelPool;
}

export interface TemplateExportRequest {
  parameters: Record<string, number | string | boolean>;
  units?: "mm" | "in";
  projection?: "first" | "third";
  format: ExportFormat;
  part?: string;
  drawnBy: string;
  date: string;
  signal?: AbortSignal;
}

export function exportService(deps: ExportServiceDeps) {
  const find = (id: string): CompiledTemplate => {
    const compiled = deps.templates.get(id);
    if (!compiled) throw notFound(`There is no template "${id.slice(0, 60)}".`);
    return compiled;
  };

  function evaluate(compiled: CompiledTemplate, req: TemplateExportRequest): Evaluation {
    const evaluation = evaluateForRequest(compiled, { parameters: req.parameters, ...(req.units ? { units: req.units } : {}) });
    requireBuildable(evaluation);
    guardPartsForKernel(evaluation.parts);
    return evaluation;
  }

  return {
    has: (id: string) => deps.templates.get(id) !== undefined,
    find,
    /** The file for a template configuration; HttpErrors for everything the caller can fix. */
    async exportTemplate(id: string, req: TemplateExportRequest): Promise<ExportFile> {
      const compiled = find(id);
      const evaluation = evaluate(compiled, req);
      // The cut list needs no solid; everything else is drawn from the kernel's projections or solids.
      if (!deps.kernel && req.format !== "csv") throw new HttpError("service_unavailable", "The solid modeller is not running on this server.");
      const kernel = deps.kernel ?? { run: () => Promise.reject(new HttpError("service_unavailable", "The solid modeller is not running on this server.")) };
      const units = req.units ?? compiled.template.units;
      try {
        return await buildExport(
          {
            template: compiled.template,
            evaluation,
            format: req.format,
            units,
            projection: req.projection ?? (units === "in" ? "third" : "first"),
            ...(req.part ? { part: req.part } : {}),
            drawnBy: req.drawnBy,
            date: req.date,
          },
          { kernel, ...(req.signal ? { signal: req.signal } : {}) },
        );
      } catch (err) {
        if (err instanceof ExportInputError) throw badRequest(err.message, [{ path: err.field, message: err.message }]);
        throw kernelErrorToHttp(err);
      }
    },
  };
}

export type ExportService = ReturnType<typeof exportService>;
