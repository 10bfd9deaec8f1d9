import { Router } from "express";
import { loginBodySchema, registerBodySchema } from "@/shared/auth";
import type { RateLimitConfig } from "@server/config";
import { validate } from "@server/middleware/validate";
import { authController } from "./controller";
import { authRateLimits } from "./rate-limit";
import type { AuthService } from "./service";
import type { SessionLayer } from "./session";

/**
 * `/api/auth`: csrf, register, login, logout, me. Rate limits: per address on register and login,
 * per account on failed logins. CSRF is checked before this router for every POST.
 */
export function authRouter(auth: AuthService, layer: SessionLayer, limits: RateLimitConfig): Router {
  const c = authController(auth, layer);
  const { perIp, perAccount } = authRateLimits(limits);
  const r = Router();
  r.get("/csrf", c.csrf);
  r.get("/me", c.me);
  r.post("/register", perIp, validate({ body: registerBodySchema }), c.register);
  r.post("/login", perIp, validate({ body: loginBodySchema }), perAccount, c.login);
  r.post("/logout", c.logout);
  return r;
}
