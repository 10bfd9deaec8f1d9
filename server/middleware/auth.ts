import type { RequestHandler } from "express";
import type { Role } from "@/shared/auth";
import { forbidden, unauthenticated } from "@server/lib/errors";

/** 401 unless someone is signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthenticated());
};

/** 401 for guests, 403 for signed-in users whose role is not in `allowed`. */
export function requireRole(...allowed: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) next(unauthenticated());
    else if (!allowed.includes(req.user.role)) next(forbidden());
    else next();
  };
}
