/**
 * The one fetch wrapper of the client. It sends the session cookie, adds the CSRF token to every
 * state-changing request (fetching and caching it first, and fetching a fresh one once if the server
 * refuses it), checks JSON answers against the contract's zod schemas and turns every failure into an
 * {@link ApiError}.
 */
import type { z } from "zod";
import { csrfResponseSchema } from "@/shared/auth";
import { csrfHeaderName } from "@/shared/errors";
import { ApiError, apiErrorFromResponse } from "./api-error";

type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

export interface RequestOptions<S extends z.ZodType> {
  /** Validates the 2xx JSON body; its output type is the call's result type. */
  schema?: S;
  body?: unknown;
  signal?: AbortSignal;
}

const csrfPath = "/api/auth/csrf";
let csrfToken: string | null = null;
let csrfPending: Promise<string> | null = null;

/** Forget the cached CSRF token (the session behind it changed: sign-in, sign-out). */
export function resetCsrfToken(): void {
  csrfToken = null;
  csrfPending = null;
}

async function getCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  csrfPending ??= (async () => {
    const data = await send("GET", csrfPath, { schema: csrfResponseSchema });
    csrfToken = data.csrfToken;
    return data.csrfToken;
  })().finally(() => {
    csrfPending = null;
  });
  return csrfPending;
}

async function send<S extends z.ZodType>(
  method: Method,
  path: string,
  options: RequestOptions<S>,
  token?: string,
) {
  const headers: Record<string, string> = { accept: "application/json" };
  if (options.body !== undefined) headers["content-type"] = "application/json";
  if (token) headers[csrfHeaderName] = token;
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: "same-origin",
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "network_error", "Cannot reach the server. Check the connection and try again.");
  }
  if (!response.ok) throw await apiErrorFromResponse(response);
  if (response.status === 204) return undefined as z.output<S>;
  const text = await response.text();
  const json: unknown = text ? JSON.parse(text) : undefined;
  if (!options.schema) return json as z.output<S>;
  const parsed = options.schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError(
      response.status,
      "bad_response",
      "The server sent an answer this page does not understand.",
    );
  }
  return parsed.data as z.output<S>;
}

/** Sends one request. GETs go straight out; other methods carry the CSRF header. */
export async function request<S extends z.ZodType>(
  method: Method,
  path: string,
  options: RequestOptions<S> = {},
): Promise<z.output<S>> {
  if (method === "GET") return send(method, path, options);
  try {
    return await send(method, path, options, await getCsrfToken());
  } catch (error) {
    // The session (and its token) may have changed under us: fetch a fresh token and retry once.
    if (error instanceof ApiError && error.status === 403 && error.code === "csrf_invalid") {
      resetCsrfToken();
      return send(method, path, options, await getCsrfToken());
    }
    throw error;
  }
}

export const api = {
  get: <S extends z.ZodType>(path: string, options?: Omit<RequestOptions<S>, "body">) =>
    request("GET", path, options),
  post: <S extends z.ZodType>(path: string, options?: RequestOptions<S>) => request("POST", path, options),
  patch: <S extends z.ZodType>(path: string, options?: RequestOptions<S>) => request("PATCH", path, options),
  put: <S extends z.ZodType>(path: string, options?: RequestOptions<S>) => request("PUT", path, options),
  delete: <S extends z.ZodType>(path: string, options?: RequestOptions<S>) =>
    request("DELETE", path, options),
};
