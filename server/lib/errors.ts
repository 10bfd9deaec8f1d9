import { errorStatus, type ErrorCode, type ErrorDetail } from "@/shared/errors";

/**
 * A failure meant for the client: services throw it, the central error handler turns it into
 * `{ error: { code, message, details } }` with the status that belongs to `code`.
 * The message is shown to users, so it must be a clear sentence and never leak internals.
 */
export class HttpError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly details: ErrorDetail[];

  constructor(code: ErrorCode, message: string, details: ErrorDetail[] = []) {
    super(message);
    this.name = "HttpError";
    this.code = code;
    this.status = errorStatus[code];
    this.details = details;
  }
}

export const badRequest = (message: string, details: ErrorDetail[] = []) =>
  new HttpError("validation_error", message, details);
export const unauthenticated = (message = "Sign in to do this.") => new HttpError("unauthenticated", message);
export const forbidden = (message = "Your role does not allow this.") => new HttpError("forbidden", message);
export const notFound = (message = "Not found.") => new HttpError("not_found", message);
export const conflict = (message: string, details: ErrorDetail[] = []) =>
  new HttpError("conflict", message, details);
export const serviceUnavailable = (message = "The database is unreachable; try again shortly.") =>
  new HttpError("service_unavailable", message);
