/**
 * The HTTP bench's load generator, run in a child process (`node --import tsx bench/load-runner.ts
 * '<spec json>'`) so it never shares the server's thread. Prints autocannon's result as JSON on stdout.
 *
 * With `vary`, every request carries a new value of one parameter (spread over its allowed range by the
 * golden ratio, so values do not repeat within a run): the server can never answer from its cache of
 * recent evaluations, which measures the evaluation itself. Without it, every request repeats one body.
 */
import autocannon from "autocannon";

export interface LoadSpec {
  url: string;
  method: "GET" | "POST";
  headers: Record<string, string>;
  body?: string;
  vary?: { key: string; min: number; max: number };
  connections: number;
  seconds: number;
}

const spec = JSON.parse(process.argv[2] ?? "{}") as LoadSpec;
let n = 0;
const next = (): string => {
  const { key, min, max } = spec.vary!;
  n += 1;
  const fraction = (n * 0.6180339887498949) % 1;
  return JSON.stringify({ parameters: { [key]: Number((min + (max - min) * fraction).toFixed(6)) } });
};

autocannon(
  {
    url: spec.url,
    connections: spec.connections,
    duration: spec.seconds,
    requests: [
      {
        method: spec.method,
        headers: spec.headers,
        ...(spec.vary ? { setupRequest: (req: Record<string, unknown>) => ({ ...req, body: next() }) } : spec.body !== undefined ? { body: spec.body } : {}),
      },
    ],
  },
  (err: unknown, result: unknown) => {
    if (err) {
      console.error(err instanceof Error ? err.message : String(err));
      process.exitCode = 1;
      return;
    }
    process.stdout.write(JSON.stringify(result));
  },
);
