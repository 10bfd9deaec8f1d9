/**
 * `/api/templates/:id/model` — the configured template's solids as triangles for the 3D preview
 * (contract: src/shared/model.ts):
 *  - `GET /:id/model?units=mm|in&<param>=<value>…`
 *  - `POST /:id/model` `{ parameters, units }` (the `/evaluate` body)
 * Unknown id → 404; bad parameters or an unbuildable part → 400 naming the part and feature; kernel busy,
 * timed out or absent → 503.
 */
import { Router, type RequestHandler } from "express";
import { z } from "zod";
import { evaluateRequestSchema } from "@/shared/templates";
import { notFound } from "@server/lib/errors";
import { validate } from "@server/middleware/validate";
import { modelController } from "./controller";
import type { ModelService } from "./service";

const idParams = z.object({ id: z.string().max(200) });

export function modelRouter(service: ModelService): Router {
  const c = modelController(service);
  const known: RequestHandler = (req, _res, next) => {
    const id = String(req.params.id);
    next(service.has(id) ? undefined : notFound(`There is no template "${id.slice(0, 60)}".`));
  };
  const r = Router();
  r.get("/:id/model", validate({ params: idParams }), known, c.get);
  r.post("/:id/model", validate({ params: idParams }), known, validate({ body: evaluateRequestSchema }), c.post);
  return r;
}
