import { z } from "zod";

/**
 * The error contract of every HTTP API route: a non-2xx answer always has the body
 * `{ error: { code, message, details } }`.
 *
 * - `code` is a stable machine-readable word from {@link errorCodes} (clients branch on it);
 * - `message` is one human sentence, safe to show to the user;
 * - `details` is a list (possibly empty) of per-field problems; for validation errors there is one entry
 *   per bad field, with `path` naming the field (`"email"`, `"parameters.jawWidthMm"`).
 */
export const errorCodes = [
  /** 400: the body, query or path failed its schema; `details` has one entry per bad field. */
  "validation_error",
  /** 400: the request body is not valid JSON. */
  "malformed_json",
  /** 401: the route needs a signed-in user and there is none. */
  "unauthenticated",
  /** 401: sign-in refused; deliberately does not say whether the e-mail or the password was wrong. */
  "invalid_credentials",
  /** 403: signed in, but the role does not allow this. */
  "forbidden",
  /** 403: a state-changing request without a valid `x-csrf-token` header. */
  "csrf_invalid",
  /** 404: no such route or no such record. */
  "not_found",
  /** 409: the request clashes with existing data (e.g. e-mail already registered, last admin). */
  "conflict",
  /** 413: the body is larger than the server accepts. */
  "payload_too_large",
  /** 415: the body has a content type the route does not accept. */
  "unsupported_media_type",
  /** 429: too many attempts; retry later (see the `Retry-After` header). */
  "rate_limited",
  /** 500: a fault on our side; the message never leaks internals. */
  "internal_error",
  /** 503: the database (or another required service) is unreachable. */
  "service_unavailable",
] as const;

export const errorCodeSchema = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

/** One problem with one field (or, with an empty `path`, with the request as a whole). */
export const errorDetailSchema = z.object({
  /** Dotted path of the field, e.g. `"email"` or `"parameters.jawWidthMm"`; `""` for the whole input. */
  path: z.string(),
  message: z.string(),
});
export type ErrorDetail = z.infer<typeof errorDetailSchema>;

export const apiErrorBodySchema = z.object({
  error: z.object({
    // Accept unknown codes so an older client keeps working when the server adds one.
    code: z.string(),
    message: z.string(),
    details: z.array(errorDetailSchema),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** The HTTP status each code is sent with. */
export const errorStatus: Record<ErrorCode, number> = {
  validation_error: 400,
  malformed_json: 400,
  unauthenticated: 401,
  invalid_credentials: 401,
  forbidden: 403,
  csrf_invalid: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal_error: 500,
  service_unavailable: 503,
};

/** The header carrying the CSRF token on every POST/PUT/PATCH/DELETE. */
export const csrfHeaderName = "x-csrf-token";
