import { z } from "zod";

/**
 * Every setting the server reads from the environment, validated once at start (zod).
 * A bad value stops the process with a message naming the variable, rather than failing later.
 * README.md "Configuration" documents each variable; keep the two in step.
 */
const boolish = z
  .enum(["1", "0", "true", "false", "yes", "no", "on", "off"], { error: "Use true or false." })
  .transform((v) => ["1", "true", "yes", "on"].includes(v));

const port = z.coerce.number({ error: "Use a port number." }).int().min(1).max(65535);

export const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  HOST: z.string().min(1).default("127.0.0.1"),
  PORT: port.default(3000),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).optional(),

  DB_HOST: z.string().min(1).default("127.0.0.1"),
  DB_PORT: port.default(3406),
  DB_NAME: z
    .string()
    .regex(/^[A-Za-z0-9_]{1,64}$/, { error: "Letters, digits and _ only (at most 64)." })
    .default("jigwright"),
  DB_USER: z.string().min(1).max(80).default("jigwright"),
  /** Only for the project-run MariaDB on loopback; set a real secret for any other server. */
  DB_PASSWORD: z.string().default("jigwright-local-only"),
  /** `false`: DB_HOST is a server you run yourself, so `npm start` must not start its own MariaDB. */
  DB_MANAGED: boolish.default(true),
  /** Connection pool size per server process. */
  DB_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),

  /** Signs the session cookie. Unset: one is generated once and kept in .data/session-secret. */
  SESSION_SECRET: z.string().min(32, { error: "Use at least 32 characters." }).optional(),
  /** Express "trust proxy": false, true, a hop count, or a list like "loopback, 10.0.0.0/8". */
  TRUST_PROXY: z.string().default("false"),
  /** Serve the built client from dist/client (default: only when NODE_ENV=production). */
  SERVE_CLIENT: boolish.optional(),
  /** `false`: `npm start` does not create the demo accounts on a fresh database. */
  SEED_DEMO: boolish.default(true),

  /** Failed sign-ins allowed per account per window, and sign-in/register requests per address. */
  LOGIN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  LOGIN_LIMIT_PER_IP: z.coerce.number().int().min(1).default(30),
  LOGIN_LIMIT_WINDOW_MIN: z.coerce.number().int().min(1).default(15),
});

export type Env = z.infer<typeof envSchema>;

/** Thrown when the environment does not validate; the message lists every bad variable. */
export class ConfigError extends Error {}

export function parseEnv(env: NodeJS.ProcessEnv): Env {
  // Empty strings count as unset, so `PORT= npm start` behaves like no PORT at all.
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== ""));
  const result = envSchema.safeParse(cleaned);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new ConfigError(`Invalid configuration:\n${lines.join("\n")}`);
  }
  return result.data;
}
