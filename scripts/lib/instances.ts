import { createHash } from "node:crypto";
import path from "node:path";
import { fileURLToPath } from "node:url";

/** Repository root (scripts/lib → ../..). */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

/**
 * The MariaDB instances the project runs itself, each with its own data directory, port, socket,
 * pid file and log under `.data/mariadb-<name>/` (git-ignored):
 * - `app`   3406: the data of `npm start` / `npm run dev` (database `jigwright`);
 * - `test`  3407: `npm test` (database `jigwright_test`, dropped and re-made each run);
 * - `fault` 3408: started and stopped by the fault test, so it never disturbs the shared test instance.
 */
export const defaultPorts: Record<string, number> = { app: 3406, test: 3407, fault: 3408 };

export interface Instance {
  name: string;
  port: number;
  /** `.data/mariadb-<name>`: holds my.cnf, data/, the pid file and the log. */
  dir: string;
  dataDir: string;
  cnfFile: string;
  pidFile: string;
  logFile: string;
  socket: string;
  /** Relaxed durability (no fsync per commit): for throw-away test data only. */
  ephemeral: boolean;
}

/** Linux limits a Unix socket path to 107 bytes (sun_path is 108 including the NUL). */
const maxSocketPathBytes = 107;

export function instance(name: string, options: { port?: number; root?: string } = {}): Instance {
  if (!/^[a-z][a-z0-9-]{0,20}$/.test(name)) throw new Error(`Bad instance name "${name}" (use a-z, 0-9, -).`);
  const root = options.root ?? repoRoot;
  const port = options.port ?? defaultPorts[name];
  if (port === undefined) throw new Error(`Instance "${name}" has no default port; pass one.`);
  const dir = path.join(root, ".data", `mariadb-${name}`);
  let socket = path.join(dir, "mariadbd.sock");
  if (Buffer.byteLength(socket) > maxSocketPathBytes) {
    // Deep checkout: a short path in /tmp, unique per checkout and instance.
    const tag = createHash("sha256").update(dir).digest("hex").slice(0, 12);
    socket = path.join("/tmp", `jigwright-${tag}-${name}.sock`);
  }
  return {
    name,
    port,
    dir,
    dataDir: path.join(dir, "data"),
    cnfFile: path.join(dir, "my.cnf"),
    pidFile: path.join(dir, "mariadbd.pid"),
    logFile: path.join(dir, "mariadbd.log"),
    socket,
    ephemeral: name !== "app",
  };
}

export interface DbSettings {
  host: string;
  port: number;
  database: string;
  user: string;
  password: string;
}

/**
 * Database settings of the test run. scripts/test.sh exports them as TEST_DB_* for vitest; the API test
 * helpers read them through this function, so both agree on the defaults.
 */
export function testDbSettings(env: NodeJS.ProcessEnv = process.env): DbSettings {
  return {
    host: env.TEST_DB_HOST || "127.0.0.1",
    port: Number(env.TEST_DB_PORT || defaultPorts.test),
    database: env.TEST_DB_NAME || "jigwright_test",
    user: env.TEST_DB_USER || "jigwright_test",
    password: env.TEST_DB_PASSWORD || "jigwright-test-only",
  };
}
