/**
 * Throughput of `POST /api/templates/:id/evaluate` against a bare JSON route of the same server, measured
 * side by side in one run with autocannon on loopback. The bare route is `GET /api/auth/csrf` (it answers
 * `{ csrfToken }` and nothing else), requested with the same session cookie, so both pass the same
 * middleware (headers, request log, session from MariaDB, body parsing) and the ratio shows what the
 * evaluation itself costs. Target: ratio ≥ 0.5.
 *
 * The load generator (autocannon's own command) runs in a child process, as a load generator on another
 * machine would: run in the server's process it would take the server's thread, and the route that sends
 * the bigger answer (the cam curve) would also pay for the client parsing it.
 *
 * Needs the project's test MariaDB (started and migrated on demand, as the API tests do).
 */
import { execFile } from "node:child_process";
import { createRequire } from "node:module";
import http from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { createTestApp } from "../tests/api/helpers/app";
import { builtInTemplates } from "@server/templates";
import type { BenchModule } from "./types";

const CONNECTIONS = 10;
const SECONDS = 4;
const ROUNDS = 2;
const TARGET_RATIO = 0.5;

interface Result {
  requests: { average: number };
  non2xx: number;
  errors: number;
}

const autocannonCli = path.join(path.dirname(createRequire(import.meta.url).resolve("autocannon/package.json")), "autocannon.js");

interface Load {
  url: string;
  method?: "GET" | "POST";
  headers: Record<string, string>;
  body?: string;
}

/** One autocannon run in a child process; its `--json` report on stdout. */
function run(load: Load): Promise<Result> {
  const args = [autocannonCli, "--json", "-c", String(CONNECTIONS), "-d", String(SECONDS), "-m", load.method ?? "GET"];
  for (const [k, v] of Object.entries(load.headers)) args.push("-H", `${k}=${v}`);
  if (load.body !== undefined) args.push("-b", load.body);
  args.push(load.url);
  return new Promise((resolve, reject) => {
    execFile(process.execPath, args, { maxBuffer: 16 * 1024 * 1024 }, (err, stdout, stderr) => {
      if (err) return reject(new Error(`autocannon failed: ${stderr || err.message}`));
      try {
        resolve(JSON.parse(stdout) as Result);
      } catch {
        reject(new Error(`autocannon printed no JSON report: ${stdout.slice(0, 200)}`));
      }
    });
  });
}

export const httpBench: BenchModule = {
  name: "http",
  summary: `POST /api/templates/:id/evaluate vs a bare JSON route, req/s (autocannon, ${CONNECTIONS} connections, target ratio ≥ ${TARGET_RATIO})`,
  async run() {
    const t = await createTestApp();
    const server = http.createServer(t.app);
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    try {
      const first = await fetch(`${base}/api/auth/csrf`);
      const cookie = (first.headers.get("set-cookie") ?? "").split(";")[0]!;
      const { csrfToken } = (await first.json()) as { csrfToken: string };
      const headers = { cookie, "x-csrf-token": csrfToken, "content-type": "application/json" };
      for (const compiled of builtInTemplates().list()) {
        const id = compiled.template.id;
        const probe = await fetch(`${base}/api/templates/${id}/evaluate`, { method: "POST", headers, body: "{}" });
        if (probe.status !== 200) throw new Error(`evaluate answered ${probe.status}: ${await probe.text()}`);
        let bare = 0;
        let evaluate = 0;
        let failures = 0;
        for (let round = 0; round < ROUNDS; round++) {
          const b = await run({ url: `${base}/api/auth/csrf`, headers: { cookie } });
          const e = await run({ url: `${base}/api/templates/${id}/evaluate`, method: "POST", headers, body: "{}" });
          bare += b.requests.average / ROUNDS;
          evaluate += e.requests.average / ROUNDS;
          failures += b.non2xx + b.errors + e.non2xx + e.errors;
        }
        const ratio = evaluate / bare;
        console.log(
          `  ${id.padEnd(28)} evaluate ${evaluate.toFixed(0)} req/s, bare ${bare.toFixed(0)} req/s, ratio ${ratio.toFixed(2)} (${ratio >= TARGET_RATIO ? "ok" : "BELOW TARGET"})${failures ? `, ${failures} failed requests` : ""}`,
        );
      }
    } finally {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      // Let the session store finish the writes of the last requests before the pool closes.
      await new Promise((resolve) => setTimeout(resolve, 1000));
      await t.close();
    }
  },
};
