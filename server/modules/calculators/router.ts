/**
 * `/api/calculators`:
 *  - `GET /` → `{ calculators: [{ kind, label, summary, inputs, inputSchema, sources }] }`
 *  - `GET /:kind` → `{ calculator: { … } }`
 *  - `POST /:kind` with the calculator's input → its result (with `cautions` and `sources`)
 * Unknown kind → 404; bad input → 400 with one detail per bad field.
 */
import { Router, type RequestHandler } from "express";
import { calculatorRequestSchema } from "@/shared/calculators";
import { notFound } from "@server/lib/errors";
import { validate } from "@server/middleware/validate";
import { calculatorsController } from "./controller";
import type { CalculatorsService } from "./service";

export function calculatorsRouter(service: CalculatorsService): Router {
  const c = calculatorsController(service);
  const known: RequestHandler = (req, _res, next) => {
    const kind = String(req.params.kind);
    if (!service.has(kind)) next(notFound(`There is no calculator "${kind.slice(0, 60)}".`));
    else next();
  };
  const r = Router();
  r.get("/", c.list);
  r.get("/:kind", known, c.describe);
  r.post("/:kind", known, validate({ body: calculatorRequestSchema }), c.run);
  return r;
}
