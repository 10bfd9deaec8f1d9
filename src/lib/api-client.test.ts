import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";
import { api, resetCsrfToken } from "./api-client";
import { ApiError } from "./api-error";

/** A fetch stand-in that answers from a queue and records every call. */
function fakeFetch(...answers: Array<() => Response>) {
  const calls: Array<{ url: string; init: RequestInit }> = [];
  const mock = vi.fn(async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    const next = answers.shift();
    if (!next) throw new Error(`unexpected request ${init.method} ${url}`);
    return next();
  });
  vi.stubGlobal("fetch", mock);
  return calls;
}

const json =
  (status: number, body: unknown, headers: Record<string, string> = {}) =>
  () =>
    new Response(JSON.stringify(body), {
      status,
      headers: { "content-type": "application/json", ...headers },
    });

const header = (init: RequestInit, name: string) => (init.headers as Record<string, string>)[name];

beforeEach(() => resetCsrfToken());
afterEach(() => vi.unstubAllGlobals());

describe("api client: error JSON becomes a typed ApiError", () => {
  it("keeps status, code, message and the per-field details", async () => {
    fakeFetch(
      json(400, {
        error: {
          code: "validation_error",
          message: "Some fields need fixing.",
          details: [
            { path: "email", message: "Enter a valid e-mail address." },
            { path: "password", message: "Password must be at least 10 characters." },
          ],
        },
      }),
    );
    const error = await api.get("/api/anything").catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const e = error as ApiError;
    expect(e.status).toBe(400);
    expect(e.code).toBe("validation_error");
    expect(e.message).toBe("Some fields need fixing.");
    expect(e.fieldErrors).toEqual({
      email: "Enter a valid e-mail address.",
      password: "Password must be at least 10 characters.",
    });
  });

  it("reads Retry-After on a 429", async () => {
    fakeFetch(
      json(
        429,
        { error: { code: "rate_limited", message: "Too many attempts.", details: [] } },
        { "retry-after": "120" },
      ),
    );
    const e = (await api.get("/api/x").catch((err: unknown) => err)) as ApiError;
    expect(e.code).toBe("rate_limited");
    expect(e.retryAfterSeconds).toBe(120);
  });

  it("gives a generic error for a body that is not our error JSON", async () => {
    fakeFetch(() => new Response("<html>Bad gateway</html>", { status: 502 }));
    const e = (await api.get("/api/x").catch((err: unknown) => err)) as ApiError;
    expect(e).toBeInstanceOf(ApiError);
    expect(e.status).toBe(502);
    expect(e.code).toBe("http_error");
    expect(e.details).toEqual([]);
  });

  it("turns a network failure into status 0", async () => {
    vi.stubGlobal(
      "fetch",
      vi.fn(async () => Promise.reject(new TypeError("Failed to fetch"))),
    );
    const e = (await api.get("/api/x").catch((err: unknown) => err)) as ApiError;
    expect(e.status).toBe(0);
    expect(e.code).toBe("network_error");
  });

  it("refuses a 2xx answer that does not match the schema", async () => {
    fakeFetch(json(200, { user: "not an object" }));
    const schema = z.object({ user: z.object({ id: z.number() }) });
    const e = (await api.get("/api/auth/me", { schema }).catch((err: unknown) => err)) as ApiError;
    expect(e.code).toBe("bad_response");
  });
});

describe("api client: CSRF token", () => {
  it("GETs go out without a token and with the session cookie", async () => {
    const calls = fakeFetch(json(200, { ok: true }));
    await api.get("/api/health");
    expect(calls).toHaveLength(1);
    expect(header(calls[0]!.init, "x-csrf-token")).toBeUndefined();
    expect(calls[0]!.init.credentials).toBe("same-origin");
  });

  it("fetches the token once, then sends it on every state-changing request", async () => {
    const calls = fakeFetch(json(200, { csrfToken: "tok-1" }), json(201, { id: 1 }), json(200, { id: 1 }));
    await api.post("/api/things", { body: { name: "stop" } });
    await api.patch("/api/things/1", { body: { name: "vise stop" } });
    expect(calls.map((c) => `${c.init.method} ${c.url}`)).toEqual([
      "GET /api/auth/csrf",
      "POST /api/things",
      "PATCH /api/things/1",
    ]);
    expect(header(calls[1]!.init, "x-csrf-token")).toBe("tok-1");
    expect(header(calls[2]!.init, "x-csrf-token")).toBe("tok-1");
    expect(header(calls[1]!.init, "content-type")).toBe("application/json");
    expect(calls[1]!.init.body).toBe(JSON.stringify({ name: "stop" }));
  });

  it("on a 403 csrf_invalid, fetches a fresh token and retries once", async () => {
    const refused = json(403, { error: { code: "csrf_invalid", message: "Missing token.", details: [] } });
    const calls = fakeFetch(
      json(200, { csrfToken: "old" }),
      refused,
      json(200, { csrfToken: "new" }),
      json(200, { done: true }),
    );
    const result = await api.post("/api/things", { schema: z.object({ done: z.boolean() }) });
    expect(result).toEqual({ done: true });
    expect(header(calls[1]!.init, "x-csrf-token")).toBe("old");
    expect(header(calls[3]!.init, "x-csrf-token")).toBe("new");
  });

  it("does not retry a second time, and does not retry other 403s", async () => {
    const refused = json(403, { error: { code: "csrf_invalid", message: "Missing token.", details: [] } });
    fakeFetch(json(200, { csrfToken: "a" }), refused, json(200, { csrfToken: "b" }), refused);
    const e = (await api.post("/api/things").catch((err: unknown) => err)) as ApiError;
    expect(e.code).toBe("csrf_invalid");

    resetCsrfToken();
    const calls = fakeFetch(
      json(200, { csrfToken: "c" }),
      json(403, { error: { code: "forbidden", message: "Admins only.", details: [] } }),
    );
    const f = (await api.delete("/api/things/1").catch((err: unknown) => err)) as ApiError;
    expect(f.code).toBe("forbidden");
    expect(calls).toHaveLength(2);
  });

  it("a 204 answer resolves to undefined", async () => {
    fakeFetch(json(200, { csrfToken: "t" }), () => new Response(null, { status: 204 }));
    await expect(api.post("/api/auth/logout")).resolves.toBeUndefined();
  });
});
