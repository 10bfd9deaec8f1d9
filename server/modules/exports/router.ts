/**
 * `/api/templates/:id/export` — the download pack of a configured template (contract: src/shared/exports.ts):
 *  - `GET /:id/export?format=pdf|svg|dxf|step|stl|csv|zip&units=mm|in&projection=first|third&part=<id>&<param>=<value>…`
 *  - `POST /:id/export` `{ format, units, projection, part, parameters }`
 * Signed-in users only (downloading packs is a machinist's right, PRODUCT.md). The answer is the file
 * with `Content-Disposition: attachment; filename="<template>-v<version>-<what>.<ext>"`.
 * Unknown template → 404; bad option, parameter, part or an unbuildable part → 400; kernel absent, busy or
 * too slow → 503.
 */
import { Router, type RequestHandler } from "express";
import { z } from "zod";
import { exportRequestSchema } from "@/shared/exports";
import { notFound } from "@server/lib/errors";
import { requireUser } from "@server/middleware/auth";
import { validate } from "@server/middleware/validate";
import { exportController } from "./controller";
import type { ExportService } from "./service";

const idParams = z.object({ id: z.string().max(200) });

export function exportRouter(service: ExportService): Router {
  const c = exportController(service);
  const known: RequestHandler = (req, _res, next) => {
    const id = String(req.params.id);
    next(service.has(id) ? undefined : notFound(`There is no template "${id.slice(0, 60)}".`));
  };
  const r = Router();
  r.get("/:id/export", requireUser, validate({ params: idParams }), known, c.get);
  r.post("/:id/export", requireUser, validate({ params: idParams }), known, validate({ body: exportRequestSchema }), c.post);
  return r;
}
