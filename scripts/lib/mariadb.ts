/**
 * Runs MariaDB for the project: installs Debian's package if needed, initialises a private data
 * directory, starts `mariadbd` on loopback with its own port and socket, waits until it answers,
 * creates databases and users, and stops it. Never the system service, never systemd.
 * Facts behind each step: STACK.md "MariaDB started by the project".
 */
import { spawn, spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import mariadb from "mariadb";
import type { DbSettings, Instance } from "./instances";

export type Log = (line: string) => void;
const quiet: Log = () => {};

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Finds a program on PATH or in the sbin folders (mariadbd lives in /usr/sbin, not always on PATH). */
export function findProgram(name: string): string | undefined {
  const dirs = [...(process.env.PATH ?? "").split(":"), "/usr/sbin", "/usr/bin", "/sbin", "/usr/local/sbin"];
  for (const dir of dirs) {
    if (!dir) continue;
    const candidate = path.join(dir, name);
    try {
      fs.accessSync(candidate, fs.constants.X_OK);
      return candidate;
    } catch {
      // keep looking
    }
  }
  return undefined;
}

/** Runs apt-get as root (directly, or through sudo when available). Throws with apt's output on failure. */
export function aptInstall(packages: string[], log: Log = quiet): void {
  const isRoot = process.getuid?.() === 0;
  const sudo = isRoot ? [] : findProgram("sudo") ? ["sudo", "-n"] : undefined;
  if (!sudo) throw new Error(`Installing ${packages.join(" ")} needs root (or sudo); install them by hand.`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const apt = ["apt-get", "-o", "DPkg::Lock::Timeout=300"];
  const run = (args: string[]) => {
    const [cmd, ...rest] = [...sudo, ...apt, ...args];
    const r = spawnSync(cmd!, rest, { env, stdio: ["ignore", "pipe", "pipe"], encoding: "utf8" });
    if (r.status !== 0) throw new Error(`${[cmd, ...rest].join(" ")} failed:\n${r.stdout}\n${r.stderr}`);
  };
  log(`Installing ${packages.join(" ")} from Debian (apt-get update, then install; about 20 s)…`);
  run(["update"]);
  run(["install", "-y", "--no-install-recommends", ...packages]);
}

/** Installs `mariadb-server` when `mariadbd` is missing. Returns the paths of the programs used. */
export function ensureMariadbInstalled(log: Log = quiet): { mariadbd: string; installDb: string } {
  let mariadbd = findProgram("mariadbd");
  let installDb = findProgram("mariadb-install-db");
  if (!mariadbd || !installDb) {
    aptInstall(["mariadb-server"], log);
    mariadbd = findProgram("mariadbd");
    installDb = findProgram("mariadb-install-db");
  }
  if (!mariadbd || !installDb)
    throw new Error("mariadb-server is installed but mariadbd or mariadb-install-db is missing.");
  return { mariadbd, installDb };
}

/** The configuration file of one instance. Every MariaDB program gets it as its FIRST option. */
export function renderMyCnf(inst: Instance): string {
  const lines = [
    "# Written by scripts/db.ts for the project's own MariaDB instance; regenerated on every start.",
    "[mysqld]",
    `datadir=${inst.dataDir}`,
    `socket=${inst.socket}`,
    `port=${inst.port}`,
    "bind-address=127.0.0.1",
    `pid-file=${inst.pidFile}`,
    `log-error=${inst.logFile}`,
    `tmpdir=${os.tmpdir()}`,
    // mariadbd refuses to run as root unless told to; only say so when we are root.
    ...(process.getuid?.() === 0 ? ["user=root"] : []),
    "character-set-server=utf8mb4",
    "collation-server=utf8mb4_unicode_ci",
    "skip-name-resolve",
    "skip-networking=0",
    "performance_schema=OFF",
    "innodb_buffer_pool_size=64M",
    "max_connections=200",
    ...(inst.ephemeral
      ? ["# Test data: no fsync per commit.", "innodb_flush_log_at_trx_commit=2", "sync_binlog=0"]
      : []),
    "",
    "[client]",
    `socket=${inst.socket}`,
    `port=${inst.port}`,
    "default-character-set=utf8mb4",
    "",
  ];
  return lines.join("\n");
}

/** True when `pid` is a live mariadbd of THIS instance (a zombie or a reused pid is not). */
export function isOurMariadbd(pid: number, inst: Instance): boolean {
  try {
    const cmdline = fs.readFileSync(`/proc/${pid}/cmdline`, "utf8").split("\0");
    // A zombie has an empty cmdline; a reused pid has someone else's.
    return cmdline.some((a) => a.endsWith("mariadbd")) && cmdline.includes(`--defaults-file=${inst.cnfFile}`);
  } catch {
    return false;
  }
}

function readPid(inst: Instance): number | undefined {
  try {
    const pid = Number(fs.readFileSync(inst.pidFile, "utf8").trim());
    return Number.isInteger(pid) && pid > 0 ? pid : undefined;
  } catch {
    return undefined;
  }
}

/** Connects as root over the instance's socket (root has no password; the socket is only ours). */
export function rootConnection(inst: Instance, connectTimeout = 1000): Promise<mariadb.Connection> {
  return mariadb.createConnection({ socketPath: inst.socket, user: "root", connectTimeout });
}

/** True if the instance answers a query over its socket. */
export async function ping(inst: Instance): Promise<boolean> {
  if (!fs.existsSync(inst.socket)) return false;
  try {
    const conn = await rootConnection(inst, 500);
    try {
      await conn.query("SELECT 1");
      return true;
    } finally {
      await conn.end();
    }
  } catch {
    return false;
  }
}

export interface InstanceStatus {
  running: boolean;
  pid?: number;
  answering: boolean;
  port: number;
  socket: string;
  dataDir: string;
}

export async function instanceStatus(inst: Instance): Promise<InstanceStatus> {
  const pid = readPid(inst);
  const running = pid !== undefined && isOurMariadbd(pid, inst);
  return {
    running,
    ...(running ? { pid } : {}),
    answering: running ? await ping(inst) : false,
    port: inst.port,
    socket: inst.socket,
    dataDir: inst.dataDir,
  };
}

/**
 * Serialises start/stop of one instance between processes (two test runs, or `npm start` and a test):
 * a lock file made with O_EXCL holding the owner's pid; a lock whose owner died is taken over.
 * The file descriptor is closed at once, so mariadbd can never inherit it.
 */
async function withLock<T>(inst: Instance, fn: () => Promise<T>): Promise<T> {
  fs.mkdirSync(inst.dir, { recursive: true });
  const lock = path.join(inst.dir, "start.lock");
  const deadline = Date.now() + 120_000;
  for (;;) {
    try {
      fs.writeFileSync(lock, String(process.pid), { flag: "wx" });
      break;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== "EEXIST") throw err;
      const owner = lockOwner(lock);
      if (owner === "gone") continue;
      // An empty file is a lock being written right now, unless it is old (its writer died mid-write).
      const dead = owner === "empty" ? lockAgeMs(lock) > 5000 : !fs.existsSync(`/proc/${owner}`);
      if (dead) {
        fs.rmSync(lock, { force: true });
        continue;
      }
      if (Date.now() > deadline) {
        throw new Error(`Timed out waiting for ${lock} (held by pid ${String(owner)}).`, { cause: err });
      }
      await sleep(200);
    }
  }
  try {
    return await fn();
  } finally {
    fs.rmSync(lock, { force: true });
  }
}

function lockOwner(lock: string): number | "empty" | "gone" {
  try {
    const pid = Number(fs.readFileSync(lock, "utf8").trim());
    return Number.isInteger(pid) && pid > 0 ? pid : "empty";
  } catch {
    return "gone";
  }
}

function lockAgeMs(lock: string): number {
  try {
    return Date.now() - fs.statSync(lock).mtimeMs;
  } catch {
    return Infinity;
  }
}

function tail(file: string, lines = 20): string {
  try {
    return fs.readFileSync(file, "utf8").trimEnd().split("\n").slice(-lines).join("\n");
  } catch {
    return "(no log)";
  }
}

/**
 * Starts the instance if it is not already running; idempotent. Initialises the data directory on
 * first use (about 1 s), removes a stale pid file or socket left by a crash, starts mariadbd in its own
 * session with stdin closed, and waits until it answers. Returns whether this call started it.
 */
export async function startInstance(
  inst: Instance,
  log: Log = quiet,
): Promise<{ started: boolean; pid: number }> {
  const programs = ensureMariadbInstalled(log);
  return withLock(inst, async () => {
    const existing = readPid(inst);
    if (existing !== undefined && isOurMariadbd(existing, inst)) {
      if (await waitUntilAnswering(inst, existing, 30_000)) return { started: false, pid: existing };
      throw new Error(
        `MariaDB "${inst.name}" (pid ${existing}) is running but does not answer.\n${tail(inst.logFile)}`,
      );
    }
    // Nothing of ours runs: whatever pid file or socket is there is stale.
    fs.rmSync(inst.pidFile, { force: true });
    fs.rmSync(inst.socket, { force: true });
    fs.mkdirSync(inst.dir, { recursive: true });
    fs.writeFileSync(inst.cnfFile, renderMyCnf(inst));

    if (!fs.existsSync(path.join(inst.dataDir, "mysql"))) {
      // Missing or half-made by an interrupted first run: start it afresh.
      fs.rmSync(inst.dataDir, { recursive: true, force: true });
      fs.mkdirSync(inst.dataDir, { recursive: true });
      log(
        `Initialising MariaDB data directory ${path.relative(process.cwd(), inst.dataDir) || inst.dataDir}…`,
      );
      const r = spawnSync(
        programs.installDb,
        [`--defaults-file=${inst.cnfFile}`, "--auth-root-authentication-method=normal", "--skip-test-db"],
        { stdio: ["ignore", "pipe", "pipe"], encoding: "utf8" },
      );
      if (r.status !== 0) {
        fs.rmSync(inst.dataDir, { recursive: true, force: true });
        throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
      }
    }

    const out = fs.openSync(inst.logFile, "a");
    // detached: the child calls setsid(), so Ctrl-C in our terminal does not reach it.
    const child = spawn(programs.mariadbd, [`--defaults-file=${inst.cnfFile}`], {
      detached: true,
      stdio: ["ignore", out, out],
    });
    fs.closeSync(out);
    let exited: number | null | undefined;
    child.on("exit", (code) => {
      exited = code;
    });
    child.unref();
    const pid = child.pid!;
    const deadline = Date.now() + 60_000;
    while (Date.now() < deadline) {
      if (exited !== undefined) {
        throw new Error(
          `mariadbd "${inst.name}" exited (code ${exited}) while starting.\n${tail(inst.logFile)}`,
        );
      }
      if (await ping(inst)) {
        log(`MariaDB "${inst.name}" answering on 127.0.0.1:${inst.port} (pid ${pid}).`);
        return { started: true, pid };
      }
      await sleep(100);
    }
    throw new Error(`mariadbd "${inst.name}" did not answer within 60 s.\n${tail(inst.logFile)}`);
  });
}

async function waitUntilAnswering(inst: Instance, pid: number, ms: number): Promise<boolean> {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    if (await ping(inst)) return true;
    if (!isOurMariadbd(pid, inst)) return false;
    await sleep(100);
  }
  return false;
}

/** Stops the instance with SIGTERM (a clean InnoDB shutdown), SIGKILL after 60 s. Returns whether it was running. */
export async function stopInstance(inst: Instance, log: Log = quiet): Promise<boolean> {
  return withLock(inst, async () => {
    const pid = readPid(inst);
    if (pid === undefined || !isOurMariadbd(pid, inst)) {
      fs.rmSync(inst.pidFile, { force: true });
      return false;
    }
    process.kill(pid, "SIGTERM");
    const deadline = Date.now() + 60_000;
    while (isOurMariadbd(pid, inst)) {
      if (Date.now() > deadline) {
        log(`MariaDB "${inst.name}" did not stop on SIGTERM; killing it.`);
        process.kill(pid, "SIGKILL");
      }
      await sleep(50);
    }
    fs.rmSync(inst.pidFile, { force: true });
    fs.rmSync(inst.socket, { force: true });
    log(`MariaDB "${inst.name}" stopped.`);
    return true;
  });
}

/**
 * Creates the database (utf8mb4) and a user allowed to use it from loopback, and (re)sets the user's
 * password to the configured one. Idempotent. Runs as root over the socket.
 */
export async function ensureDatabase(inst: Instance, db: Omit<DbSettings, "host" | "port">): Promise<void> {
  const conn = await rootConnection(inst);
  try {
    const name = conn.escapeId(db.database);
    await conn.query(
      `CREATE DATABASE IF NOT EXISTS ${name} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
    for (const host of ["127.0.0.1", "localhost", "::1"]) {
      const account = `${conn.escape(db.user)}@${conn.escape(host)}`;
      await conn.query(`CREATE USER IF NOT EXISTS ${account} IDENTIFIED BY ${conn.escape(db.password)}`);
      await conn.query(`ALTER USER ${account} IDENTIFIED BY ${conn.escape(db.password)}`);
      await conn.query(`GRANT ALL PRIVILEGES ON ${name}.* TO ${account}`);
    }
  } finally {
    await conn.end();
  }
}

/** Drops a database if it exists (the test run starts from nothing). */
export async function dropDatabase(inst: Instance, database: string): Promise<void> {
  const conn = await rootConnection(inst);
  try {
    await conn.query(`DROP DATABASE IF EXISTS ${conn.escapeId(database)}`);
  } finally {
    await conn.end();
  }
}
