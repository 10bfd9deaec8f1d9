/**
 * `npm run db -- <start|stop|status|reset|migrate> [--instance app|test|fault] [--port N]`
 *
 * Manages the project's own MariaDB instances (see scripts/lib/instances.ts for names and ports):
 * - start   installs mariadb-server if missing, starts the instance, creates its database and user;
 * - stop    stops it cleanly (SIGTERM);
 * - status  prints whether it runs and answers;
 * - migrate start + apply pending migrations (and, for `app`, demo data on first run unless SEED_DEMO=false);
 * - reset   start + DROP the database + migrate: a clean slate (what `npm test` does to the test instance).
 * The `app` instance uses the server's DB_* settings; `test` uses TEST_DB_* (defaults in instances.ts).
 */
import { loadConfig, type DbConfig } from "@server/config";
import { instance, testDbSettings } from "./lib/instances";
import { ensureDatabase, instanceStatus, startInstance, stopInstance } from "./lib/mariadb";
import { prepareDatabase } from "./lib/prepare";

export * from "./lib/instances";
export * from "./lib/mariadb";
export { prepareDatabase } from "./lib/prepare";

const usage = "Usage: npm run db -- <start|stop|status|reset|migrate> [--instance app|test|fault] [--port N]";

/** Database settings for an instance: the server's config for `app`, TEST_DB_* for `test`. */
function settingsFor(name: string, port: number | undefined): DbConfig {
  if (name === "app") {
    const c = loadConfig().db;
    return { ...c, port: port ?? c.port };
  }
  if (name === "test") {
    const t = testDbSettings();
    return { ...t, port: port ?? t.port, poolMax: 5 };
  }
  const inst = instance(name, port ? { port } : {});
  return {
    host: "127.0.0.1",
    port: inst.port,
    database: `jigwright_${name.replace(/-/g, "_")}`,
    user: "jigwright",
    password: "jigwright-local-only",
    poolMax: 5,
  };
}

async function main(argv: string[]): Promise<number> {
  const [command, ...rest] = argv;
  let name = "app";
  let port: number | undefined;
  for (let i = 0; i < rest.length; i++) {
    const a = rest[i];
    if (a === "--instance") name = rest[++i] ?? "";
    else if (a?.startsWith("--instance=")) name = a.slice("--instance=".length);
    else if (a === "--port") port = Number(rest[++i]);
    else if (a?.startsWith("--port=")) port = Number(a.slice("--port=".length));
    else {
      process.stderr.write(`Unknown argument "${a}".\n${usage}\n`);
      return 2;
    }
  }
  if (port !== undefined && !(Number.isInteger(port) && port > 0 && port < 65536)) {
    process.stderr.write(`--port needs a port number.\n${usage}\n`);
    return 2;
  }
  const settings = settingsFor(name, port);
  const inst = instance(name, { port: settings.port });
  const log = (line: string) => process.stderr.write(`${line}\n`);
  switch (command) {
    case "start": {
      const r = await startInstance(inst, log);
      await ensureDatabase(inst, settings);
      log(
        `MariaDB "${name}" ${r.started ? "started" : "already running"}: 127.0.0.1:${inst.port}, database ${settings.database}.`,
      );
      return 0;
    }
    case "stop": {
      const was = await stopInstance(inst, log);
      if (!was) log(`MariaDB "${name}" was not running.`);
      return 0;
    }
    case "status": {
      const s = await instanceStatus(inst);
      process.stdout.write(`${JSON.stringify({ instance: name, ...s }, null, 2)}\n`);
      return s.running && s.answering ? 0 : 1;
    }
    case "migrate":
    case "reset": {
      const seed = name === "app" && loadConfig().seedDemo;
      await prepareDatabase(settings, {
        managed: true,
        instanceName: name,
        seed,
        fresh: command === "reset",
        log,
      });
      log(
        `Database ${settings.database} on 127.0.0.1:${inst.port} is ${command === "reset" ? "fresh and " : ""}migrated.`,
      );
      return 0;
    }
    default:
      process.stderr.write(`${usage}\n`);
      return 2;
  }
}

const invokedDirectly = process.argv[1] !== undefined && /scripts[\\/]db\.ts$/.test(process.argv[1]);
if (invokedDirectly) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (err: unknown) => {
      process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
      process.exitCode = 1;
    },
  );
}
