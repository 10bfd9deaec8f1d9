import { ApiError } from "@/lib/api-error";

/**
 * A sentence for the form as a whole, written for the person signing in. `rest` is whatever the server
 * said that no field took (see applyServerFieldErrors).
 */
export function authFailureMessage(error: unknown, rest: string | null): string | null {
  if (error instanceof ApiError) {
    if (error.code === "invalid_credentials") {
      // The server deliberately does not say which of the two was wrong; neither do we.
      const hint = rest && rest !== error.message ? ` ${rest}` : "";
      return `${error.message}${hint}`;
    }
    if (error.code === "rate_limited" || error.status === 429) {
      const wait = error.retryAfterSeconds;
      const minutes = wait ? Math.max(1, Math.ceil(wait / 60)) : null;
      const when = minutes ? `in about ${minutes} minute${minutes > 1 ? "s" : ""}` : "in a few minutes";
      return `Too many sign-in attempts. To protect the account, sign-in is paused: try again ${when}.`;
    }
  }
  return rest;
}
