import type { ErrorRequestHandler } from "express";
import { BaseError as SequelizeBaseError, ConnectionError, ConnectionAcquireTimeoutError } from "sequelize";
import { ZodError } from "zod";
import type { ApiErrorBody, ErrorCode, ErrorDetail } from "@/shared/errors";
import { errorStatus } from "@/shared/errors";
import { HttpError } from "@server/lib/errors";
import type { Logger } from "@server/lib/logger";
import { zodDetails } from "./validate";

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

/** Sequelize errors that mean "the database is not there" rather than a bug. */
function isDatabaseDown(err: unknown): boolean {
  if (err instanceof ConnectionError || err instanceof ConnectionAcquireTimeoutError) return true;
  if (err instanceof SequelizeBaseError) {
    const code = (err as { original?: { code?: string } }).original?.code;
    return (
      code === "ECONNREFUSED" || code === "ER_CONNECTION_TIMEOUT" || code === "ER_SOCKET_UNEXPECTED_CLOSE"
    );
  }
  return false;
}

function body(code: ErrorCode, message: string, details: ErrorDetail[] = []): ApiErrorBody {
  return { error: { code, message, details } };
}

/**
 * The one place errors become HTTP answers, always `{ error: { code, message, details } }`.
 * Known failures keep their status; anything else is logged with its stack and answered with a plain
 * 500 whose message leaks nothing.
 */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    let status: number;
    let payload: ApiErrorBody;
    const parserType = (err as BodyParserError | null)?.type;
    if (err instanceof HttpError) {
      status = err.status;
      payload = body(err.code, err.message, err.details);
    } else if (parserType === "entity.parse.failed") {
      status = 400;
      payload = body("malformed_json", "The request body is not valid JSON.");
    } else if (parserType === "entity.too.large") {
      status = 413;
      payload = body("payload_too_large", "The request body is too large.");
    } else if (parserType === "encoding.unsupported" || parserType === "charset.unsupported") {
      status = 415;
      payload = body(
        "unsupported_media_type",
        "The request body uses an encoding the server does not accept.",
      );
    } else if (err instanceof ZodError) {
      status = 400;
      payload = body("validation_error", "Some fields are not valid.", zodDetails(err));
    } else if (isDatabaseDown(err)) {
      status = errorStatus.service_unavailable;
      payload = body("service_unavailable", "The database is unreachable; try again shortly.");
      logger.warn({ err, url: req.originalUrl }, "database unreachable");
    } else {
      status = 500;
      payload = body("internal_error", "Something went wrong on our side. The fault has been logged.");
      logger.error({ err, url: req.originalUrl, method: req.method }, "unhandled error");
    }
    res.status(status).json(payload);
  };
}
