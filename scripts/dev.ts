/**
 * `npm run dev`: MariaDB (instance `app`) + migrations + demo data, then the Vite dev server on
 * http://127.0.0.1:5173 (hot reload; it proxies /api) and the API server on 127.0.0.1:3001 restarted by
 * `tsx watch` on every server change. Ctrl-C stops both, and MariaDB if this command started it.
 */
import concurrently from "concurrently";
import { loadConfig } from "@server/config";
import { demoAccounts } from "@server/db/seeders/demo-accounts";
import { prepareDatabase } from "./lib/prepare";
import { stopInstance } from "./lib/mariadb";

process.env.NODE_ENV ??= "development";

const log = (line: string) => process.stdout.write(`${line}\n`);
const apiPort = process.env.API_PORT ?? "3001";

async function main(): Promise<number> {
  const config = loadConfig();
  const prepared = await prepareDatabase(config.db, {
    managed: config.dbManaged,
    instanceName: "app",
    seed: config.seedDemo,
    log,
  });
  log("Client with hot reload: http://127.0.0.1:5173  (API on http://127.0.0.1:" + apiPort + ")");
  if (config.seedDemo)
    log(`Demo accounts (demo only): ${demoAccounts.map((a) => `${a.email} / ${a.password}`).join(", ")}`);

  const env = { ...process.env, PORT: apiPort, SERVE_CLIENT: "false" };
  const { result } = concurrently(
    [
      { name: "api", command: "tsx watch --clear-screen=false server/index.ts", env, prefixColor: "blue" },
      {
        name: "web",
        command: `vite --port 5173 --strictPort`,
        env: { ...process.env, API_PORT: apiPort },
        prefixColor: "green",
      },
    ],
    { killOthersOn: ["failure", "success"], prefix: "name" },
  );
  let code = 0;
  try {
    await result;
  } catch {
    code = 1;
  }
  if (prepared.startedInstance && prepared.instance) await stopInstance(prepared.instance, log);
  return code;
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    process.stderr.write(`npm run dev failed: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  },
);
