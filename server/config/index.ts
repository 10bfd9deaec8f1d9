import path from "node:path";
import { fileURLToPath } from "node:url";
import type { LevelWithSilent } from "pino";
import { parseEnv, type Env } from "./env";
import { loadOrCreateSessionSecret } from "./secret";

/** The repository root (two levels above this file). */
export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

export interface DbConfig {
  host: string;
  port: number;
  database: string;
  user: string;
  password: string;
  poolMax: number;
}

export interface RateLimitConfig {
  /** Failed sign-ins per account (e-mail) per window; successful ones do not count. */
  loginPerAccount: number;
  /** Sign-in and register requests per client address per window. */
  loginPerIp: number;
  windowMs: number;
}

/** The server's settings, plain data: tests build one with {@link loadConfig} and overrides. */
export interface AppConfig {
  env: Env["NODE_ENV"];
  host: string;
  port: number;
  logLevel: LevelWithSilent;
  db: DbConfig;
  dbManaged: boolean;
  sessionSecret: string;
  /** Value for Express's "trust proxy" setting. */
  trustProxy: boolean | number | string;
  /** Serve `clientDir` with a history fallback for every non-/api GET. */
  serveClient: boolean;
  clientDir: string;
  seedDemo: boolean;
  rateLimit: RateLimitConfig;
  /** Path of the data folder for local state (.data). */
  dataDir: string;
}

/** Parses TRUST_PROXY the way Express understands it. */
function parseTrustProxy(raw: string): boolean | number | string {
  const v = raw.trim().toLowerCase();
  if (v === "true") return true;
  if (v === "false" || v === "") return false;
  if (/^\d+$/.test(v)) return Number(v);
  return raw;
}

/**
 * Reads and validates the environment. `overrides` win over `env` (tests use them to point at the
 * test database). May create `.data/session-secret` when SESSION_SECRET is unset.
 */
export function loadConfig(
  env: NodeJS.ProcessEnv = process.env,
  overrides: Partial<AppConfig> = {},
): AppConfig {
  const e = parseEnv(env);
  const dataDir = path.join(projectRoot, ".data");
  const config: AppConfig = {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === "test" ? "silent" : "info"),
    db: {
      host: e.DB_HOST,
      port: e.DB_PORT,
      database: e.DB_NAME,
      user: e.DB_USER,
      password: e.DB_PASSWORD,
      poolMax: e.DB_POOL_MAX,
    },
    dbManaged: e.DB_MANAGED,
    sessionSecret: overrides.sessionSecret ?? e.SESSION_SECRET ?? loadOrCreateSessionSecret(dataDir),
    trustProxy: parseTrustProxy(e.TRUST_PROXY),
    serveClient: e.SERVE_CLIENT ?? e.NODE_ENV === "production",
    clientDir: path.join(projectRoot, "dist", "client"),
    seedDemo: e.SEED_DEMO,
    rateLimit: {
      loginPerAccount: e.LOGIN_LIMIT_PER_ACCOUNT,
      loginPerIp: e.LOGIN_LIMIT_PER_IP,
      windowMs: e.LOGIN_LIMIT_WINDOW_MIN * 60_000,
    },
    dataDir,
  };
  return { ...config, ...overrides };
}

export type { Env };
export { ConfigError } from "./env";
