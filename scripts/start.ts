/**
 * `npm start`: the one command after `npm ci`. Ensures MariaDB (instance `app`, 127.0.0.1:3406 unless
 * DB_MANAGED=false), applies migrations, creates the demo accounts on first run, builds the client when
 * it is missing or stale, then serves everything on http://127.0.0.1:${PORT:-3000}.
 *
 * Ctrl-C stops the web server, and stops MariaDB too if this command started it; a MariaDB that was
 * already running (e.g. from `npm run db -- start`) is left running.
 */
import { loadConfig } from "@server/config";
import { startServer } from "@server/index";
import { demoAccounts, demoWorkshopName } from "@server/db/seeders/demo-accounts";
import { prepareDatabase } from "./lib/prepare";
import { buildClientIfNeeded } from "./lib/build-client";
import { stopInstance } from "./lib/mariadb";

// Read by loadConfig() in main(), after the imports: npm start serves the built client.
process.env.NODE_ENV ??= "production";

const log = (line: string) => process.stdout.write(`${line}\n`);

async function main(): Promise<void> {
  const config = loadConfig();
  const prepared = await prepareDatabase(config.db, {
    managed: config.dbManaged,
    instanceName: "app",
    seed: config.seedDemo,
    log,
  });
  if (config.serveClient) buildClientIfNeeded(log);
  const server = await startServer(config);

  log("");
  log(`Jigwright is running at ${server.url}`);
  if (config.seedDemo) {
    log("");
    log(`Demo accounts (${demoWorkshopName}; DEMO ONLY, the passwords are public):`);
    for (const a of demoAccounts) log(`  ${a.role.padEnd(10)} ${a.email.padEnd(28)} ${a.password}`);
  }
  log("");
  log(
    prepared.startedInstance
      ? "Press Ctrl-C to stop the server and the MariaDB it started."
      : "Press Ctrl-C to stop the server (MariaDB keeps running).",
  );

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    log(`\n${signal}: stopping…`);
    try {
      await server.close();
      if (prepared.startedInstance && prepared.instance) await stopInstance(prepared.instance, log);
      process.exit(0);
    } catch (err) {
      process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
      process.exit(1);
    }
  };
  process.on("SIGINT", () => void stop("SIGINT"));
  process.on("SIGTERM", () => void stop("SIGTERM"));
}

main().catch((err: unknown) => {
  process.stderr.write(`npm start failed: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
