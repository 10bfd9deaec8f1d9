/**
 * The solid kernel: for each built-in template, cold solid + mesh time (parameters not built before, on a
 * warm worker: evaluation, kernel build and mesh, transfer, encoding) and cached time (the same request
 * again: evaluation, cache key, cache hit), through the model service the HTTP route uses; then the event
 * loop's delay (p99) in the web process while 4 model jobs run at once over HTTP.
 * The cold CPU column is the same work on an in-process kernel measured as this thread's CPU time: the
 * cost on an idle core, which stays meaningful when other jobs load the machine.
 * Targets: cold ≤ 1 s, cached ≤ 10 ms, event-loop p99 ≤ 50 ms.
 * Pool size and warm-up come from KERNEL_* (DEVELOPERS.md); defaults: one worker per core, 3 rounds.
 */
import http from "node:http";
import type { AddressInfo } from "node:net";
import { monitorEventLoopDelay, performance as nodePerformance } from "node:perf_hooks";
import express from "express";
import type { CompiledTemplate } from "@/engine";
import { createInProcessKernel, createKernelPool, kernelConfigFromEnv } from "@server/kernel";
import { modelRouter, modelService } from "@server/modules/model";
import { builtInTemplates } from "@server/templates";
import { benchTemplates, ms, percentiles, type BenchModule } from "./types";

const COLD_VARIANTS = 4;
const CACHED_RUNS = 200;
const TARGETS = { coldMs: 1000, cachedMs: 10, loopP99Ms: 50 };

/** Distinct in-range parameter sets: each length nudged by a different fraction of its range. */
function variants(compiled: CompiledTemplate, n: number, salt: number): Record<string, number>[] {
  const out: Record<string, number>[] = [];
  for (let i = 0; i < n; i++) {
    const f = 0.02 + 0.013 * (i + 1) + 0.001 * salt;
    const set: Record<string, number> = {};
    const p = compiled.parameters.find((x) => x.kind === "length" && x.max > x.default);
    if (p && p.kind === "length") set[p.key] = Math.round((p.default + (p.max - p.default) * f) * 100) / 100;
    out.push(set);
  }
  return out;
}

export const kernelBench: BenchModule = {
  name: "kernel",
  summary: `solid + mesh per template, cold (new parameters, warm worker) and cached; event-loop p99 during 4 jobs (targets ≤ ${TARGETS.coldMs} ms, ≤ ${TARGETS.cachedMs} ms, ≤ ${TARGETS.loopP99Ms} ms)`,
  async run() {
    const config = kernelConfigFromEnv();
    const t0 = performance.now();
    const pool = createKernelPool(config);
    await pool.ready();
    console.log(`  pool: ${config.poolSize} worker(s), ${config.warmupRounds} warm-up round(s), ready in ${(performance.now() - t0).toFixed(0)} ms`);
    const templates = builtInTemplates();
    const service = modelService({ templates, kernel: pool, cacheMb: 256 });
    const inProcess = createInProcessKernel({ warmupRounds: config.warmupRounds });
    await inProcess.ready();
    const local = modelService({ templates, kernel: inProcess, cacheMb: 256 });
    try {
      for (const compiled of benchTemplates()) {
        const id = compiled.template.id;
        const cold: number[] = [];
        for (const parameters of variants(compiled, COLD_VARIANTS, 0)) {
          const s = performance.now();
          const r = await service.modelJson(id, { parameters });
          cold.push(performance.now() - s);
          if (r.cached) throw new Error("a cold run was served from the cache");
        }
        const parameters = variants(compiled, 1, 0)[0]!;
        const cached: number[] = [];
        for (let i = 0; i < CACHED_RUNS; i++) {
          const s = performance.now();
          const r = await service.modelJson(id, { parameters });
          cached.push(performance.now() - s);
          if (!r.cached) throw new Error("a repeat was not served from the cache");
        }
        // CPU time of the same cold work on this thread (in-process kernel): what the job costs on an idle
        // core, whatever else the machine is running.
        const cpu: number[] = [];
        for (const parameters of variants(compiled, COLD_VARIANTS, 1)) {
          const before = process.cpuUsage();
          await local.modelJson(id, { parameters });
          const used = process.cpuUsage(before);
          cpu.push((used.user + used.system) / 1000);
        }
        const c = percentiles(cold);
        const h = percentiles(cached);
        const u = percentiles(cpu);
        const ok = c.median <= TARGETS.coldMs && h.median <= TARGETS.cachedMs ? "ok" : "OVER TARGET";
        console.log(`  ${id.padEnd(22)} cold median ${ms(c.median)} (max ${ms(Math.max(...cold))}, CPU ${ms(u.median)})  cached median ${ms(h.median)} p95 ${ms(h.p95)}  (${ok})`);
      }

      // Event-loop delay of a web process serving the model route while 4 uncached jobs run at once.
      const app = express();
      app.use(express.json());
      app.get("/ping", (_req, res) => void res.json({ ok: true }));
      app.use("/api/templates", modelRouter(modelService({ templates, kernel: pool, cacheMb: 1 })));
      const server = http.createServer(app);
      await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
      const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
      const stop = templates.get("cam-vise-stop") ?? templates.list()[0]!;
      const loop = monitorEventLoopDelay({ resolution: 5 });
      const pings: number[] = [];
      let running = true;
      const pinger = (async () => {
        while (running) {
          const s = performance.now();
          await fetch(`${base}/ping`).then((r) => r.json());
          pings.push(performance.now() - s);
          await new Promise((r) => setTimeout(r, 10));
        }
      })();
      loop.enable();
      const elu0 = nodePerformance.eventLoopUtilization();
      const s = performance.now();
      const jobs = variants(stop, 4, 7).map((parameters) => {
        const q = new URLSearchParams(Object.entries(parameters).map(([k, v]) => [k, String(v)]));
        return fetch(`${base}/api/templates/${stop.template.id}/model?${q}`).then(async (r) => {
          if (r.status !== 200) throw new Error(`model answered ${r.status}: ${await r.text()}`);
          return r.arrayBuffer();
        });
      });
      const bodies = await Promise.all(jobs);
      const wall = performance.now() - s;
      const elu = nodePerformance.eventLoopUtilization(elu0);
      loop.disable();
      running = false;
      await pinger;
      server.close();
      const p99 = loop.percentile(99) / 1e6;
      const p = percentiles(pings);
      const verdict = p99 <= TARGETS.loopP99Ms ? "ok" : "OVER TARGET";
      console.log(
        `  event loop during 4 jobs (${stop.template.id}, ${(bodies.reduce((t, b) => t + b.byteLength, 0) / 4 / 1024).toFixed(0)} KB each, ${wall.toFixed(0)} ms): ` +
          `delay p99 ${ms(p99)}, max ${ms(loop.max / 1e6)}; main thread busy ${(elu.utilization * 100).toFixed(1)} %; /ping median ${ms(p.median)} p95 ${ms(p.p95)}  (${verdict})`,
      );
    } finally {
      await pool.close();
      await inProcess.close();
    }
  },
};
