/**
 * The drawing pack: for each built-in template, the PDF pack (every part sheet, the assembly sheet, the
 * cut list and operation sheet) through the export service the download routes use, built in a warm
 * kernel worker: cold (parameters not seen before, projection cache emptied), again with the same
 * parameters (a second download: projections remembered), and with another value of the first length
 * parameter (the next user's vise: only the parts that value changes are projected anew); then, for the same work done on the calling thread,
 * how much of it is the kernel's projections and how much the drawing layout and PDF; then the web
 * process's event-loop delay (p99, max) while 4 packs are built at once in the workers.
 * Targets: PDF pack ≤ 2 s; event-loop p99 ≤ 50 ms.
 */
import { monitorEventLoopDelay } from "node:perf_hooks";
import { evaluateTemplate, type CompiledTemplate } from "@/engine";
import { buildExport, clearProjectionCache } from "@server/exporters/build-export";
import { createKernelPool, kernelConfigFromEnv, type KernelPool } from "@server/kernel";
import { builtInTemplates } from "@server/templates";
import { benchTemplates, ms, percentiles, type BenchModule } from "./types";

const COLD_VARIANTS = 3;
const TARGETS = { packMs: 2000, loopP99Ms: 50 };

/** In-range parameter sets not built before: the first length nudged by a different fraction each time. */
function variant(compiled: CompiledTemplate, i: number): Record<string, number> {
  const p = compiled.parameters.find((x) => x.kind === "length" && x.max > x.default);
  if (!p || p.kind !== "length") return {};
  const f = 0.03 + 0.017 * (i + 1);
  return { [p.key]: Math.round((p.default + (p.max - p.default) * f) * 100) / 100 };
}

/** The parameter {@link variant} changes. */
function firstLength(compiled: CompiledTemplate): string {
  return compiled.parameters.find((x) => x.kind === "length" && x.max > x.default)?.key ?? "value";
}

/** Wraps the pool to time the kernel's share of a pack: wall time while at least one task runs. */
function timed(pool: KernelPool): { kernel: Pick<KernelPool, "run">; take(): number } {
  let busy = 0;
  let active = 0;
  let since = 0;
  return {
    kernel: {
      async run<T>(task: string, input: unknown) {
        if (active++ === 0) since = performance.now();
        try {
          return await pool.run<T>(task, input);
        } finally {
          if (--active === 0) busy += performance.now() - since;
        }
      },
    },
    take() {
      const b = busy;
      busy = 0;
      return b;
    },
  };
}

async function pack(compiled: CompiledTemplate, parameters: Record<string, number>, kernel: Pick<KernelPool, "run">, inWorker = true): Promise<number> {
  const evaluation = evaluateTemplate(compiled, { parameters });
  const file = await buildExport(
    { template: compiled.template, evaluation, format: "pdf", units: compiled.template.units, projection: "first", drawnBy: "bench", date: "2026-12-01" },
    { kernel, inWorker },
  );
  return file.body.length;
}

export const drawingsBench: BenchModule = {
  name: "drawings",
  summary: `PDF drawing pack per template, cold on a warm pool, kernel vs drawing share; event-loop p99 during 4 packs (targets ≤ ${TARGETS.packMs} ms, ≤ ${TARGETS.loopP99Ms} ms)`,
  async run() {
    const config = kernelConfigFromEnv();
    const t0 = performance.now();
    const pool = createKernelPool(config);
    await pool.ready();
    console.log(`  pool: ${config.poolSize} worker(s), ${config.warmupRounds} warm-up round(s), ready in ${(performance.now() - t0).toFixed(0)} ms`);
    const templates = builtInTemplates();
    const clock = timed(pool);
    try {
      // One pack each first, so the workers have run the projection and PDF code before it is timed.
      for (const compiled of benchTemplates()) await pack(compiled, variant(compiled, 30), pool);
      for (const compiled of benchTemplates()) {
        const totals: number[] = [];
        const again: number[] = [];
        const next: number[] = [];
        let bytes = 0;
        for (let i = 0; i < COLD_VARIANTS; i++) {
          clearProjectionCache();
          const s = performance.now();
          bytes = await pack(compiled, variant(compiled, i), pool);
          totals.push(performance.now() - s);
          const s2 = performance.now();
          await pack(compiled, variant(compiled, i), pool);
          again.push(performance.now() - s2);
          const s3 = performance.now();
          await pack(compiled, variant(compiled, i + COLD_VARIANTS), pool);
          next.push(performance.now() - s3);
        }
        clearProjectionCache();
        // The same work on this thread, to see where the time goes.
        const sSplit = performance.now();
        await pack(compiled, variant(compiled, 20), clock.kernel, false);
        const split = performance.now() - sSplit;
        const kernelMs = clock.take();
        const t = percentiles(totals);
        const ok = t.median <= TARGETS.packMs ? "ok" : "OVER TARGET";
        console.log(
          `  ${compiled.template.id.padEnd(22)} cold pack median ${ms(t.median)} (max ${ms(Math.max(...totals))}), ${(bytes / 1024).toFixed(0)} KB  (${ok}); again ${ms(percentiles(again).median)}; another ${firstLength(compiled)} ${ms(percentiles(next).median)}; split: kernel ${ms(kernelMs)}, drawing + PDF ${ms(split - kernelMs)}`,
        );
      }
      const stop = templates.get("cam-vise-stop") ?? templates.list()[0]!;
      const loop = monitorEventLoopDelay({ resolution: 5 });
      loop.enable();
      const s = performance.now();
      clearProjectionCache();
      await Promise.all([0, 1, 2, 3].map((i) => pack(stop, variant(stop, 10 + i), pool)));
      loop.disable();
      const p99 = loop.percentile(99) / 1e6;
      console.log(
        `  4 packs at once (${stop.template.id}): ${ms(performance.now() - s)} in all; event-loop delay p99 ${ms(p99)}, max ${ms(loop.max / 1e6)}  (${p99 <= TARGETS.loopP99Ms ? "ok" : "OVER TARGET"})`,
      );
    } finally {
      await pool.close();
    }
  },
};
