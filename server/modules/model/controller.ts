/** HTTP glue for the model routes: the only code here that touches req/res. */
import type { RequestHandler, Response } from "express";
import type { EvaluateRequest } from "@/shared/templates";
import { parametersFromQuery } from "./query";
import type { ModelService } from "./service";

export function modelController(service: ModelService) {
  const send = async (res: Response, id: string, body: EvaluateRequest) => {
    const { json, cacheKey } = await service.modelJson(id, body);
    // Same key and units → same bytes, so the key is a strong validator (304 on revalidation).
    res.set("ETag", `"${cacheKey}-${body.units ?? "t"}"`);
    res.set("Cache-Control", "private, no-cache");
    res.type("application/json").send(json);
  };

  const get: RequestHandler = async (req, res) => {
    const id = String(req.params.id);
    const body = parametersFromQuery(service.find(id), (req.query ?? {}) as Record<string, unknown>);
    await send(res, id, body);
  };
  const post: RequestHandler = async (req, res) => {
    await send(res, String(req.params.id), req.body as EvaluateRequest);
  };
  return { get, post };
}
