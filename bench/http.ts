/**
 * Throughput of `POST /api/templates/:id/evaluate` against a bare JSON route of the same server, measured
 * side by side in one run with autocannon on loopback. The bare route is `GET /api/auth/csrf` (it answers
 * `{ csrfToken }` and nothing else), requested with the same session cookie, so both pass the same
 * middleware (headers, request log, session from MariaDB, body parsing) and the ratio shows what the
 * evaluation itself costs. Target: ratio ≥ 0.5.
 *
 * Two loads per template:
 *  - "new values": every request changes one length parameter, so the server's cache of recent
 *    evaluations never answers — the evaluation's own cost, the figure the target is about;
 *  - "same values": every request repeats the defaults, as a page reload or a shared link does, answered
 *    from that cache after the first.
 *
 * The load generator (bench/load-runner.ts) runs in a child process, as a load generator on another
 * machine would: run in the server's process it would take the server's thread.
 *
 * The machine's speed drifts by a third over a minute here (the bare route alone gave 256–405 req/s in
 * runs minutes apart), so each round measures the bare route and the new values back to back, in
 * alternating order, and the ratio printed is the median of the rounds' ratios, with the lowest beside it.
 *
 * Needs the project's test MariaDB (started and migrated on demand, as the API tests do).
 */
import { execFile } from "node:child_process";
import http from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { createTestApp } from "../tests/api/helpers/app";
import type { LoadSpec } from "./load-runner";
import { benchTemplates, percentiles, type BenchModule } from "./types";

const CONNECTIONS = 10;
const SECONDS = 3;
const ROUNDS = 5;
const TARGET_RATIO = 0.5;
const runner = path.join(path.dirname(fileURLToPath(import.meta.url)), "load-runner.ts");

interface Result {
  requests: { average: number };
  non2xx: number;
  errors: number;
}

/** One autocannon run in a child process. */
function run(load: Omit<LoadSpec, "connections" | "seconds">): Promise<Result> {
  const spec: LoadSpec = { connections: CONNECTIONS, seconds: SECONDS, ...load };
  return new Promise((resolve, reject) => {
    execFile(process.execPath, ["--import", "tsx", runner, JSON.stringify(spec)], { maxBuffer: 16 * 1024 * 1024 }, (err, stdout, stderr) => {
      if (err) return reject(new Error(`the load generator failed: ${stderr || err.message}`));
      try {
        resolve(JSON.parse(stdout) as Result);
      } catch {
        reject(new Error(`the load generator printed no JSON report: ${stdout.slice(0, 200)}`));
      }
    });
  });
}

const verdict = (ratio: number) => (ratio >= TARGET_RATIO ? "ok" : "BELOW TARGET");

export const httpBench: BenchModule = {
  name: "http",
  summary: `POST /api/templates/:id/evaluate vs a bare JSON route, req/s (autocannon in a child process, ${CONNECTIONS} connections; target ratio ≥ ${TARGET_RATIO} with new values on every request)`,
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
      for (const compiled of benchTemplates()) {
        const id = compiled.template.id;
        const url = `${base}/api/templates/${id}/evaluate`;
        const probe = await fetch(url, { method: "POST", headers, body: "{}" });
        if (probe.status !== 200) throw new Error(`evaluate answered ${probe.status}: ${await probe.text()}`);
        const length = compiled.parameters.find((p) => p.kind === "length");
        if (!length || length.kind !== "length") throw new Error(`${id} has no length parameter to vary`);
        // Stay inside the limits so every request is a valid configuration (a 400 would be cheaper).
        const vary = { key: length.key, min: length.min, max: length.max };
        const bares: number[] = [];
        const ratios: number[] = [];
        let fresh = 0;
        let repeated = 0;
        let failures = 0;
        for (let round = 0; round < ROUNDS; round++) {
          const bareRun = () => run({ url: `${base}/api/auth/csrf`, method: "GET", headers: { cookie } });
          const freshRun = () => run({ url, method: "POST", headers, vary });
          let b: Result;
          let f: Result;
          if (round % 2 === 0) {
            b = await bareRun();
            f = await freshRun();
          } else {
            f = await freshRun();
            b = await bareRun();
          }
          const r = await run({ url, method: "POST", headers, body: "{}" });
          bares.push(b.requests.average);
          ratios.push(f.requests.average / b.requests.average);
          fresh += f.requests.average / ROUNDS;
          repeated += r.requests.average / ROUNDS;
          failures += b.non2xx + b.errors + f.non2xx + f.errors + r.non2xx + r.errors;
        }
        const bare = bares.reduce((a, v) => a + v, 0) / ROUNDS;
        const ratio = percentiles(ratios).median;
        console.log(
          `  ${id.padEnd(20)} bare ${bare.toFixed(0)} req/s; new values ${fresh.toFixed(0)} req/s, ratio ${ratio.toFixed(2)} (median of ${ROUNDS} rounds, lowest ${Math.min(...ratios).toFixed(2)}; ${verdict(ratio)}); ` +
            `same values ${repeated.toFixed(0)} req/s, ratio ${(repeated / bare).toFixed(2)}${failures ? `; ${failures} failed requests` : ""}`,
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
