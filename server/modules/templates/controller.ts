/** HTTP glue for the template routes: the only code here that touches req/res. */
import type { RequestHandler } from "express";
import type { EvaluateRequest } from "@/shared/templates";
import { sendJsonText } from "@server/lib/json";
import type { TemplatesService } from "./service";

export function templatesController(service: TemplatesService) {
  const list: RequestHandler = (_req, res) => {
    res.json({ templates: service.list() });
  };
  const detail: RequestHandler = (req, res) => {
    const query = (res.locals.query ?? {}) as { units?: "mm" | "in" };
    res.json({ template: service.detail(String(req.params.id), query.units) });
  };
  const evaluate: RequestHandler = (req, res) => {
    sendJsonText(res, service.evaluateJson(String(req.params.id), req.body as EvaluateRequest));
  };
  return { list, detail, evaluate };
}
