import { randomBytes, timingSafeEqual } from "node:crypto";
import type { Request, RequestHandler } from "express";
import { csrfHeaderName } from "@/shared/errors";
import { HttpError } from "@server/lib/errors";

declare module "express-session" {
  interface SessionData {
    /** Synchronizer token for CSRF protection; survives sign-in and sign-out of the same browser. */
    csrfToken?: string;
  }
}

const safeMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/** The session's CSRF token, made on first use (32 random bytes, base64url). Marks the session modified. */
export function csrfTokenFor(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(32).toString("base64url");
  return req.session.csrfToken;
}

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/**
 * Refuses every state-changing request (POST, PUT, PATCH, DELETE…) whose `x-csrf-token` header does not
 * match the token stored in the session (synchronizer token pattern, constant-time compare): 403
 * `csrf_invalid`. Needs express-session before it. A client gets the token from `GET /api/auth/csrf`.
 */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method)) {
    next();
    return;
  }
  const sent = req.get(csrfHeaderName);
  const expected = req.session?.csrfToken;
  if (!sent || !expected || !sameToken(sent, expected)) {
    next(
      new HttpError(
        "csrf_invalid",
        "This request is missing a valid security token. Reload the page and try again.",
      ),
    );
    return;
  }
  next();
};
