import { Router } from "express";
import type { Sequelize } from "sequelize";
import { healthController } from "./controller";

/** `/api/health`, mounted before sessions so it never depends on the session store. */
export function healthRouter(sequelize: Sequelize, timeoutMs = 1000): Router {
  const c = healthController(sequelize, timeoutMs);
  const r = Router();
  r.get("/", c.check);
  return r;
}
