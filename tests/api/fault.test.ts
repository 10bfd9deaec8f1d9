import { afterAll, beforeAll, describe, expect, it } from "vitest";
import supertest from "supertest";
import { createApp } from "@server/app";
import { loadConfig } from "@server/config";
import { createDatabase, type Database } from "@server/db";
import { ensureDatabase, instance, startInstance, stopInstance } from "../../scripts/db";

/**
 * The database goes away and comes back while the app keeps running. A third MariaDB instance
 * ("fault", port 3408) is used, so stopping it cannot disturb suites running on the shared test instance.
 */
const fault = instance(
  "fault",
  process.env.TEST_FAULT_DB_PORT ? { port: Number(process.env.TEST_FAULT_DB_PORT) } : {},
);
const dbConfig = {
  host: "127.0.0.1",
  port: fault.port,
  database: "jigwright_fault",
  user: "jigwright_fault",
  password: "jigwright-fault-only",
  poolMax: 3,
};
let db: Database;
let app: ReturnType<typeof createApp>;
/** A real session cookie, taken while the database was up. */
let sessionCookie = "";

beforeAll(async () => {
  await startInstance(fault);
  await ensureDatabase(fault, dbConfig);
  const config = loadConfig(
    { NODE_ENV: "test" },
    { logLevel: "silent", db: dbConfig, sessionSecret: "f".repeat(32) },
  );
  db = createDatabase(config.db);
  app = createApp({ config, db });
});
afterAll(async () => {
  await db?.close();
  await stopInstance(fault);
});

async function health() {
  return supertest(app).get("/api/health");
}

/** Asks until the answer has `status` (the pool may need a request or two to drop dead connections). */
async function healthUntil(status: number, attempts = 50) {
  let res = await health();
  for (let i = 1; i < attempts && res.status !== status; i++) {
    await new Promise((r) => setTimeout(r, 200));
    res = await health();
  }
  return res;
}

describe("database outage", () => {
  it("answers 200 while the database is up", async () => {
    const res = await health();
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: "ok", db: "up" });
    const csrf = await supertest(app).get("/api/auth/csrf").expect(200);
    const cookies = csrf.headers["set-cookie"] as unknown as string[];
    sessionCookie = cookies.find((c) => c.startsWith("jigwright.sid="))!.split(";")[0]!;
  });

  it("answers 503 db:down when the database stops, and the sign-in routes 503 rather than 500", async () => {
    await stopInstance(fault);
    const res = await health();
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ status: "error", db: "down", error: { code: "service_unavailable" } });

    // A signed-in browser's session lookup needs the database: it must be a 503 in the standard shape.
    const withCookie = await supertest(app).get("/api/auth/me").set("Cookie", sessionCookie);
    expect(withCookie.status).toBe(503);
    expect(withCookie.body).toMatchObject({ error: { code: "service_unavailable" } });
  });

  it("recovers by itself when the database returns, without restarting the app", async () => {
    await startInstance(fault);
    const res = await healthUntil(200);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: "ok", db: "up" });
  });
});
