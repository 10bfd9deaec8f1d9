/** HTTP glue for the calculator routes. */
import type { RequestHandler } from "express";
import type { CalculatorsService } from "./service";

export function calculatorsController(service: CalculatorsService) {
  const list: RequestHandler = (_req, res) => {
    res.json({ calculators: service.list() });
  };
  const describe: RequestHandler = (req, res) => {
    res.json({ calculator: service.describe(String(req.params.kind)) });
  };
  const run: RequestHandler = (req, res) => {
    res.json(service.run(String(req.params.kind), req.body));
  };
  return { list, describe, run };
}
