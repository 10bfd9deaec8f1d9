import { ApiError } from "@/lib/api-error";

/** A sentence for the form as a whole, written for the person signing in. */
export function authFailureMessage(error: unknown, fallback: string | null): string | null {
  if (error instanceof ApiError) {
    if (error.code === "invalid_credentials") {
      return "That e-mail and password do not match an account. Check both and try again.";
    }
    if (error.code === "rate_limited" || error.status === 429) {
      const wait = error.retryAfterSeconds;
      const when = wait ? `in about ${Math.ceil(wait / 60)} minute${wait > 60 ? "s" : ""}` : "in a few minutes";
      return `Too many sign-in attempts. For your account's safety, wait and try again ${when}.`;
    }
    if (error.status === 0) return error.message;
  }
  return fallback;
}
