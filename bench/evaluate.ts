/**
 * Evaluation time of every built-in template at its defaults and with changed values (the form's typical
 * load): median and p95 over many runs after a warm-up. Target: median under 2 ms.
 */
import { evaluateTemplate } from "@/engine";
import { benchTemplates, ms, percentiles, type BenchModule } from "./types";

const RUNS = 2000;
const WARM_UP = 500;
const TARGET_MS = 2;

export const evaluateBench: BenchModule = {
  name: "evaluate",
  summary: `template evaluation (median and p95 over ${RUNS} runs; target < ${TARGET_MS} ms median)`,
  async run() {
    for (const compiled of benchTemplates()) {
      const id = compiled.template.id;
      // Alternate between the defaults and each numeric parameter nudged, as a user typing would.
      const variants: Array<Record<string, unknown>> = [{}];
      for (const p of compiled.parameters) {
        if (p.kind === "length" || p.kind === "angle" || p.kind === "force" || p.kind === "ratio") {
          variants.push({ [p.key]: Math.min(p.max, p.default + (p.max - p.default) * 0.1) });
        }
      }
      for (let i = 0; i < WARM_UP; i++) evaluateTemplate(compiled, { parameters: variants[i % variants.length]! });
      const times: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const parameters = variants[i % variants.length]!;
        const t0 = performance.now();
        evaluateTemplate(compiled, { parameters });
        times.push(performance.now() - t0);
      }
      const { median, p95 } = percentiles(times);
      const verdict = median < TARGET_MS ? "ok" : "OVER TARGET";
      console.log(`  ${id.padEnd(28)} median ${ms(median)}  p95 ${ms(p95)}  (${verdict})`);
    }
  },
};
