import type { RequestHandler } from "express";
import type { ZodError, ZodType } from "zod";
import type { ErrorDetail } from "@/shared/errors";
import { HttpError } from "@server/lib/errors";

/** One detail per bad field (the first problem of each), `path` dotted, `""` for the whole input. */
export function zodDetails(err: ZodError, prefix?: string): ErrorDetail[] {
  const seen = new Set<string>();
  const details: ErrorDetail[] = [];
  for (const issue of err.issues) {
    const parts = [...(prefix ? [prefix] : []), ...issue.path.map(String)];
    const path = parts.join(".");
    if (seen.has(path)) continue;
    seen.add(path);
    details.push({ path, message: issue.message });
  }
  return details;
}

export interface RequestSchemas {
  body?: ZodType;
  params?: ZodType;
  query?: ZodType;
}

/** Parsed query values, since Express 5 makes `req.query` read-only: `res.locals.query`. */
declare module "express-serve-static-core" {
  interface Locals {
    query?: unknown;
  }
}

/**
 * Validates the parts of a request against zod schemas. On success `req.body` and `req.params` are
 * replaced by the parsed (trimmed, coerced) values and the query is put in `res.locals.query`;
 * on failure the answer is 400 `validation_error` with one `details` entry per bad field
 * (paths of params and query are prefixed `params.` / `query.`).
 */
export function validate(schemas: RequestSchemas): RequestHandler {
  return (req, res, next) => {
    const details: ErrorDetail[] = [];
    if (schemas.params) {
      const r = schemas.params.safeParse(req.params);
      if (r.success) req.params = r.data as typeof req.params;
      else details.push(...zodDetails(r.error, "params"));
    }
    if (schemas.query) {
      const r = schemas.query.safeParse(req.query);
      if (r.success) res.locals.query = r.data;
      else details.push(...zodDetails(r.error, "query"));
    }
    if (schemas.body) {
      if (req.body === undefined) {
        details.push({ path: "", message: "Send a JSON body with Content-Type: application/json." });
      } else {
        const r = schemas.body.safeParse(req.body);
        if (r.success) req.body = r.data;
        else details.push(...zodDetails(r.error));
      }
    }
    if (details.length > 0) {
      next(new HttpError("validation_error", "Some fields are not valid.", details));
      return;
    }
    next();
  };
}
