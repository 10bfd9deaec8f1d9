/** HTTP glue for the downloads: the only code here that touches req/res. */
import type { Request, RequestHandler, Response } from "express";
import { EXPORT_OPTION_KEYS, exportOptionsSchema, type ExportRequestBody } from "@/shared/exports";
import { zodDetails } from "@server/middleware/validate";
import { badRequest } from "@server/lib/errors";
import { abortOnClose, sendDownload, today } from "@server/lib/downloads";
import { parametersFromQuery } from "@server/modules/model";
import type { ExportService } from "./service";

export function exportController(service: ExportService) {
  const send = async (req: Request, res: Response, id: string, body: ExportRequestBody) => {
    const file = await service.exportTemplate(id, {
      parameters: body.parameters,
      format: body.format,
      ...(body.units ? { units: body.units } : {}),
      ...(body.projection ? { projection: body.projection } : {}),
      ...(body.part ? { part: body.part } : {}),
      drawnBy: req.user?.displayName ?? "Jigwright user",
      date: today(),
      signal: abortOnClose(res),
    });
    sendDownload(res, file);
  };

  const get: RequestHandler = async (req, res) => {
    const id = String(req.params.id);
    const query = (req.query ?? {}) as Record<string, unknown>;
    const optionsRaw: Record<string, unknown> = {};
    const rest: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(query)) {
      if ((EXPORT_OPTION_KEYS as readonly string[]).includes(k)) optionsRaw[k] = v;
      else rest[k] = v;
    }
    const parsed = exportOptionsSchema.safeParse(optionsRaw);
    if (!parsed.success) {
      const details = zodDetails(parsed.error, "query");
      throw badRequest(details.length === 1 ? details[0]!.message : "Some export options are not acceptable.", details);
    }
    if (parsed.data.units) rest.units = parsed.data.units;
    const { parameters } = parametersFromQuery(service.find(id), rest);
    await send(req, res, id, { ...parsed.data, parameters });
  };

  const post: RequestHandler = async (req, res) => {
    await send(req, res, String(req.params.id), req.body as ExportRequestBody);
  };
  return { get, post };
}
