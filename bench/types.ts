import { builtInTemplates } from "@server/templates";
import type { CompiledTemplate } from "@/engine";

/** One area's benchmark: bench/index.ts runs every registered module in order (or the ones named). */
export interface BenchModule {
  /** Short name used to pick it: `npm run bench -- evaluate`. */
  name: string;
  summary: string;
  run(): Promise<void>;
}

/** Median and 95th percentile of a list of timings. */
export function percentiles(samples: number[]): { median: number; p95: number; min: number } {
  const s = [...samples].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))]!;
  return { median: at(0.5), p95: at(0.95), min: s[0]! };
}

export const ms = (v: number) => `${v.toFixed(3)} ms`;

/**
 * The built-in templates a bench runs over: all of them, or those named in BENCH_TEMPLATES (comma
 * separated ids), e.g. `BENCH_TEMPLATES=cam-vise-stop npm run bench -- http`.
 */
export function benchTemplates(): readonly CompiledTemplate[] {
  const all = builtInTemplates().list();
  const wanted = (process.env.BENCH_TEMPLATES ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  if (wanted.length === 0) return all;
  const unknown = wanted.filter((id) => !all.some((c) => c.template.id === id));
  if (unknown.length > 0) throw new Error(`BENCH_TEMPLATES names no built-in template: ${unknown.join(", ")} (known: ${all.map((c) => c.template.id).join(", ")})`);
  return all.filter((c) => wanted.includes(c.template.id));
}
