/**
 * `/api/templates`:
 *  - `GET /` → `{ templates: [{ id, version, name, family, summary }] }`
 *  - `GET /:id[?units=mm|in]` → `{ template: { …parameters with kinds, limits, groups, help, choices,
 *    materials, defaults; derived; analyses; checks; parts; drawing; cautions } }`
 *  - `POST /:id/evaluate` `{ parameters, units }` → the evaluation (template, units, parameters, derived,
 *    analyses, checks, ok, partSummaries, parametersMm, buildable, blockedParts, assembly, cautions)
 * Unknown id → 404; bad input → 400 with one detail per bad field.
 */
import { Router } from "express";
import { z } from "zod";
import { evaluateRequestSchema, templateDetailQuerySchema } from "@/shared/templates";
import { validate } from "@server/middleware/validate";
import { notFound } from "@server/lib/errors";
import type { RequestHandler } from "express";
import { templatesController } from "./controller";
import type { TemplatesService } from "./service";

const idParams = z.object({ id: z.string().max(200) });

export function templatesRouter(service: TemplatesService): Router {
  const c = templatesController(service);
  /** Unknown (or impossible) ids are 404 before the body is looked at. */
  const knownShape: RequestHandler = (req, _res, next) => {
    const id = String(req.params.id);
    if (!service.has(id)) next(notFound(`There is no template "${id.slice(0, 60)}".`));
    else next();
  };
  const r = Router();
  r.get("/", c.list);
  r.get("/:id", validate({ params: idParams, query: templateDetailQuerySchema }), knownShape, c.detail);
  r.post("/:id/evaluate", validate({ params: idParams }), knownShape, validate({ body: evaluateRequestSchema }), c.evaluate);
  return r;
}
