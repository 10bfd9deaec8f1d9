import { apiErrorBodySchema, type ErrorDetail } from "@/shared/errors";

/**
 * A failed API call, typed: the HTTP status, the server's stable `code`, a message safe to show and
 * the per-field problems. `status` 0 means the request never reached the server.
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: ErrorDetail[];
  /** From the `Retry-After` header of a 429 or 503, when the server sent one. */
  readonly retryAfterSeconds: number | null;

  constructor(
    status: number,
    code: string,
    message: string,
    details: ErrorDetail[] = [],
    retryAfterSeconds: number | null = null,
  ) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.details = details;
    this.retryAfterSeconds = retryAfterSeconds;
  }

  /** Field path → first message for that field; problems with the whole request sit under `""`. */
  get fieldErrors(): Record<string, string> {
    const out: Record<string, string> = {};
    for (const d of this.details) if (!(d.path in out)) out[d.path] = d.message;
    return out;
  }
}

/** A generic sentence for a status when the body is not our error JSON (a proxy page, an empty 502). */
function fallbackMessage(status: number): string {
  if (status === 404) return "That was not found.";
  if (status === 429) return "Too many attempts. Wait a minute and try again.";
  if (status >= 500) return "The server had a problem. Try again in a moment.";
  return `The request failed (HTTP ${status}).`;
}

/** Reads a non-2xx response into an ApiError, whatever its body holds. */
export async function apiErrorFromResponse(response: Response): Promise<ApiError> {
  const retryHeader = Number(response.headers.get("retry-after"));
  const retryAfter = Number.isFinite(retryHeader) && retryHeader > 0 ? retryHeader : null;
  let body: unknown = undefined;
  try {
    body = await response.json();
  } catch {
    // Not JSON: fall through to the generic message.
  }
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, details } = parsed.data.error;
    return new ApiError(response.status, code, message, details, retryAfter);
  }
  return new ApiError(response.status, "http_error", fallbackMessage(response.status), [], retryAfter);
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}
