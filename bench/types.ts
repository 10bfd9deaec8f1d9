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
