import { rateLimit, type Options } from "express-rate-limit";
import type { RateLimitConfig } from "@server/config";
import { HttpError } from "@server/lib/errors";

const tooMany: Options["handler"] = (req, res, next) => {
  const reset = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
  if (reset)
    res.setHeader("Retry-After", String(Math.max(1, Math.ceil((reset.getTime() - Date.now()) / 1000))));
  next(new HttpError("rate_limited", "Too many sign-in attempts. Wait a few minutes and try again."));
};

/**
 * Sign-in and registration limits. Counters live in this process's memory (express-rate-limit's
 * MemoryStore): with several server processes each keeps its own, see README "Growing past one machine".
 */
export function authRateLimits(config: RateLimitConfig) {
  /** Every sign-in and register request per client address (IPv6 grouped by /56, the library default). */
  const perIp = rateLimit({
    windowMs: config.windowMs,
    limit: config.loginPerIp,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    handler: tooMany,
  });
  /**
   * Failed sign-ins per account, keyed on the normalised e-mail (so a guesser spread over many addresses
   * is still stopped); successful sign-ins do not count. Must run after body validation.
   */
  const perAccount = rateLimit({
    windowMs: config.windowMs,
    limit: config.loginPerAccount,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    identifier: "login-account",
    keyGenerator: (req) => `account:${String((req.body as { email?: unknown } | undefined)?.email ?? "")}`,
    handler: tooMany,
  });
  return { perIp, perAccount };
}
