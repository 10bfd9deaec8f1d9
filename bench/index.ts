/**
 * `npm run bench [-- <name>…]`: runs the benchmark modules (all, or the named ones) and prints their
 * figures. Benchmarks are scripts, not tests: nothing here fails a build. Each area adds its module to the
 * list below (one import, one entry).
 */
import { evaluateBench } from "./evaluate";
import { httpBench } from "./http";
import { kernelBench } from "./kernel";
import { drawingsBench } from "./drawings";
import os from "node:os";
import type { BenchModule } from "./types";

const modules: BenchModule[] = [evaluateBench, httpBench, kernelBench, drawingsBench];

async function main(names: string[]): Promise<void> {
  const chosen = names.length > 0 ? modules.filter((m) => names.includes(m.name)) : modules;
  const unknown = names.filter((n) => !modules.some((m) => m.name === n));
  if (unknown.length > 0) {
    console.error(`Unknown benchmark${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}. Known: ${modules.map((m) => m.name).join(", ")}.`);
    process.exitCode = 2;
    return;
  }
  const load = os.loadavg().map((l) => l.toFixed(1)).join(" ");
  console.log(`machine: ${os.cpus().length} cores, load average ${load} (timings on a busy machine run long)`);
  for (const m of chosen) {
    console.log(`${m.name}: ${m.summary}`);
    await m.run();
  }
}

main(process.argv.slice(2)).catch((err: unknown) => {
  console.error(err instanceof Error ? (err.stack ?? err.message) : String(err));
  process.exitCode = 1;
});
