import type { Request, Response } from "express";
import type { Sequelize } from "sequelize";
import { pingDatabase } from "./service";

export function healthController(sequelize: Sequelize, timeoutMs: number) {
  return {
    /** 200 `{ status: "ok", db: "up" }`, or 503 `{ status: "error", db: "down", error }` within about `timeoutMs`. */
    async check(_req: Request, res: Response) {
      const up = await pingDatabase(sequelize, timeoutMs);
      res.setHeader("Cache-Control", "no-store");
      if (up) {
        res.json({ status: "ok", db: "up" });
        return;
      }
      // Also in the standard error shape, so the client's one fetch wrapper reads it like any error.
      res.status(503).json({
        status: "error",
        db: "down",
        error: {
          code: "service_unavailable",
          message: "The database is unreachable; try again shortly.",
          details: [],
        },
      });
    },
  };
}
