/**
 * The HTTP server process: loads the config, opens the database, listens, and shuts down cleanly on
 * SIGINT/SIGTERM (stop accepting, finish open requests for up to 10 s, close the pool).
 * It does not migrate or start MariaDB: `npm start` / `npm run dev` (scripts/) do that first.
 * Run directly with `tsx server/index.ts` (what `npm run dev` does), or call {@link startServer}.
 */
import type { AddressInfo } from "node:net";
import http from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { createApp } from "./app";
import { loadConfig, type AppConfig } from "./config";
import { createDatabase } from "./db";
import { createLogger } from "./lib/logger";
import type { SessionLayer } from "./modules/auth/session";
import { createKernelPool, kernelConfigFromEnv } from "./kernel";

export interface RunningServer {
  url: string;
  close(): Promise<void>;
}

export async function startServer(config: AppConfig = loadConfig()): Promise<RunningServer> {
  const logger = createLogger(config.logLevel);
  const db = createDatabase(config.db, logger);
  // Solid-kernel workers (KERNEL_* variables; DEVELOPERS.md "Solid kernel"); they warm up in the background.
  const kernelConfig = kernelConfigFromEnv();
  const kernel = createKernelPool(kernelConfig, logger.child({ area: "kernel" }));
  const app = createApp({ config, db, logger, kernel, modelCacheMb: kernelConfig.modelCacheMb });
  const server = http.createServer(app);
  server.keepAliveTimeout = 5000;
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(config.port, config.host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  const url = `http://${config.host.includes(":") ? `[${config.host}]` : config.host}:${port}`;
  logger.info({ url, env: config.env }, "listening");

  let closing: Promise<void> | undefined;
  const close = () =>
    (closing ??= (async () => {
      logger.info("shutting down");
      const done = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      const force = setTimeout(() => server.closeAllConnections(), 10_000);
      await done;
      clearTimeout(force);
      (app.locals.sessionLayer as SessionLayer | undefined)?.close();
      await db.close();
      await kernel.close();
    })());
  return { url, close };
}

/** When run as a program: start, and stop on the first SIGINT/SIGTERM. */
async function main(): Promise<void> {
  const running = await startServer();
  const stop = (signal: string) => {
    process.stderr.write(`\n${signal}: stopping the server…\n`);
    running.close().then(
      () => process.exit(0),
      (err: unknown) => {
        process.stderr.write(`${String(err)}\n`);
        process.exit(1);
      },
    );
  };
  process.once("SIGINT", () => stop("SIGINT"));
  process.once("SIGTERM", () => stop("SIGTERM"));
}

const thisFile = fileURLToPath(import.meta.url);
if (process.argv[1] && path.resolve(process.argv[1]) === thisFile) {
  main().catch((err: unknown) => {
    process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  });
}
