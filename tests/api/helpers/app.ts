/**
 * The API test harness: the real `createApp()` on the project's TEST MariaDB instance
 * (127.0.0.1:3407, database jigwright_test; settings from TEST_DB_*, which scripts/test.sh exports).
 * Run on its own (`npx vitest run --project api tests/api/x.test.ts`) it starts the test instance if
 * needed and applies pending migrations, both idempotent, so no other step is required.
 */
import { randomBytes } from "node:crypto";
import type express from "express";
import { createApp, type AppDeps } from "@server/app";
import { loadConfig, type AppConfig, type DbConfig, type RateLimitConfig } from "@server/config";
import { createDatabase, type Database } from "@server/db";
import { testDbSettings } from "../../../scripts/lib/instances";
import { prepareDatabase } from "../../../scripts/lib/prepare";

export interface TestApp {
  app: express.Express;
  db: Database;
  config: AppConfig;
  close(): Promise<void>;
}

export interface TestAppOptions {
  /**
   * Use a database of this name on the test instance, dropped and re-made first, for tests that need
   * the whole database to themselves (counting admins, migrating down). Otherwise the shared
   * `jigwright_test`, where other suites add rows too: never assume it is empty.
   */
  isolatedDatabase?: string;
  /** Defaults are generous so ordinary tests are never rate limited; the rate-limit tests lower them. */
  rateLimit?: Partial<RateLimitConfig>;
  config?: Partial<AppConfig>;
  deps?: Partial<AppDeps>;
}

export function testDbConfig(database?: string): DbConfig {
  const t = testDbSettings();
  return { ...t, ...(database ? { database } : {}), poolMax: 5 };
}

/** Starts (if needed) the test instance and migrates the database; with `fresh`, drops it first. */
export async function prepareTestDatabase(db: DbConfig, fresh = false): Promise<void> {
  await prepareDatabase(db, { managed: true, instanceName: "test", seed: false, fresh });
}

export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const dbConfig = testDbConfig(options.isolatedDatabase);
  await prepareTestDatabase(dbConfig, options.isolatedDatabase !== undefined);
  const config = loadConfig(
    { NODE_ENV: "test" },
    {
      logLevel: "silent",
      db: dbConfig,
      sessionSecret: randomBytes(32).toString("hex"),
      serveClient: false,
      rateLimit: { loginPerAccount: 1000, loginPerIp: 1000, windowMs: 15 * 60_000, ...options.rateLimit },
      ...options.config,
    },
  );
  const db = createDatabase(config.db);
  const app = createApp({ config, db, ...options.deps });
  return {
    app,
    db,
    config,
    close: async () => {
      (app.locals.sessionLayer as { close(): void } | undefined)?.close();
      await db.close();
    },
  };
}
