import type { RequestHandler } from "express";
import { HttpError } from "@server/lib/errors";

/** Any request no route answered: 404 in the standard error shape (never an HTML page for /api). */
export const notFoundHandler: RequestHandler = (req, _res, next) => {
  const path = req.originalUrl.split("?")[0] ?? req.path;
  next(new HttpError("not_found", `No route for ${req.method} ${path}.`));
};
