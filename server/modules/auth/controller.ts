import type { NextFunction, Request, Response } from "express";
import type { LoginBody, RegisterBody } from "@/shared/auth";
import { HttpError } from "@server/lib/errors";
import { csrfTokenFor } from "@server/middleware/csrf";
import type { AuthService } from "./service";
import type { SessionLayer } from "./session";
import { toPublicUser } from "./public-user";

/**
 * Signs `user` in on a fresh session id (passport 0.7 regenerates the session), keeping the browser's
 * CSRF token so the client need not fetch a new one.
 */
function signIn(req: Request, user: Express.User): Promise<void> {
  const csrfToken = req.session.csrfToken;
  return new Promise((resolve, reject) => {
    req.login(user, (err?: unknown) => {
      if (err) return reject(err instanceof Error ? err : new Error(String(err)));
      if (csrfToken) req.session.csrfToken = csrfToken;
      resolve();
    });
  });
}

/** The only auth code touching req/res. */
export function authController(auth: AuthService, layer: SessionLayer) {
  return {
    csrf(req: Request, res: Response) {
      res.json({ csrfToken: csrfTokenFor(req) });
    },

    async register(req: Request, res: Response) {
      const user = await auth.register(req.body as RegisterBody);
      await signIn(req, user);
      res.status(201).json({ user: toPublicUser(user) });
    },

    login(req: Request, res: Response, next: NextFunction) {
      const { email } = req.body as LoginBody;
      layer.passport.authenticate("local", { session: false }, (err: unknown, user: Express.User | false) => {
        if (err) return next(err);
        if (!user) {
          return next(
            new HttpError("invalid_credentials", "That e-mail and password do not match an account.", [
              { path: "", message: `Check the e-mail (${email}) and the password, then try again.` },
            ]),
          );
        }
        signIn(req, user).then(() => res.json({ user: toPublicUser(user) }), next);
      })(req, res, next);
    },

    logout(req: Request, res: Response, next: NextFunction) {
      const csrfToken = req.session.csrfToken;
      req.logout((err?: unknown) => {
        if (err) return next(err);
        if (csrfToken) req.session.csrfToken = csrfToken;
        res.status(204).end();
      });
    },

    me(req: Request, res: Response) {
      res.json({ user: req.user ? toPublicUser(req.user) : null });
    },
  };
}
