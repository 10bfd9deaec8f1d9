/**
 * `export <template-id> [--set k=v]… [--units mm|in] [--projection first|third]
 *  --format pdf|svg|dxf|step|stl|csv|zip [--part <part-id>] --out <file>`
 *
 * Evaluates the template with the given values, builds the requested file with the same service the HTTP
 * routes use (kernel in this process) and writes it. Exit 0 when written; 1 when written but the
 * template's error checks fail (the drawings carry the "NOT CHECKED — ERRORS" stamp); 2 for bad input.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { evaluateTemplate } from "@/engine/evaluate";
import { ParameterResolutionError } from "@/engine/parameters";
import { buildExport, EXPORT_FORMATS, ExportInputError, type ExportFormat } from "@server/exporters/build-export";
import { builtInTemplates } from "@server/templates";
import { createInProcessKernel, KernelError } from "@server/kernel";
import { CliUsageError, parseArgs, rejectUnknown, single, type CliCommand } from "../args";

const USAGE =
  "export <template-id> [--set key=value]… [--units mm|in] [--projection first|third] --format pdf|svg|dxf|step|stl|csv|zip [--part <part-id>] --out <file>";

/** "12.5" → 12.5, "true"/"false" → booleans, anything else stays text (materials, choices). */
export function parseSetValue(raw: string): string | number | boolean {
  const t = raw.trim();
  if (t === "true") return true;
  if (t === "false") return false;
  if (t !== "" && Number.isFinite(Number(t))) return Number(t);
  return t;
}

/** Parses every `--set key=value` into a parameter map (refusing a repeated key or a missing "="). */
export function parseSets(values: string[]): Record<string, string | number | boolean> {
  const out: Record<string, string | number | boolean> = {};
  for (const v of values) {
    const eq = v.indexOf("=");
    if (eq <= 0) throw new CliUsageError(`--set needs key=value, got "${v}".`);
    const key = v.slice(0, eq).trim();
    if (key in out) throw new CliUsageError(`--set ${key} was given more than once.`);
    out[key] = parseSetValue(v.slice(eq + 1));
  }
  return out;
}

function choice<T extends string>(value: string | undefined, allowed: readonly T[], option: string, fallback?: T): T {
  if (value === undefined) {
    if (fallback !== undefined) return fallback;
    throw new CliUsageError(`--${option} is required: one of ${allowed.join(", ")}.`);
  }
  if (!(allowed as readonly string[]).includes(value)) throw new CliUsageError(`--${option} must be one of ${allowed.join(", ")}, not "${value}".`);
  return value as T;
}

function today(): string {
  const d = new Date();
  const p = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}`;
}

export const exportCommand: CliCommand = {
  name: "export",
  usage: USAGE,
  summary: "Write a drawing pack file (PDF, SVG, DXF, STEP, STL, cut list CSV or the ZIP of all) for a template.",
  async run(args) {
    const parsed = parseArgs(args);
    rejectUnknown(parsed, ["set", "units", "projection", "format", "part", "out"]);
    const [templateId, ...extra] = parsed.positional;
    if (!templateId) throw new CliUsageError(`Name a template.\nUsage: npm run -s cli -- ${USAGE}`);
    if (extra.length > 0) throw new CliUsageError(`Unexpected argument${extra.length > 1 ? "s" : ""}: ${extra.join(" ")}.`);
    const compiled = builtInTemplates().get(templateId);
    if (!compiled) throw new CliUsageError(`There is no template "${templateId}". Templates: ${builtInTemplates().list().map((t) => t.template.id).join(", ")}.`);
    const template = compiled.template;
    const format = choice<ExportFormat>(single(parsed, "format"), EXPORT_FORMATS, "format");
    const units = choice(single(parsed, "units"), ["mm", "in"] as const, "units", template.units);
    const projection = choice(single(parsed, "projection"), ["first", "third"] as const, "projection", units === "in" ? "third" : "first");
    const out = single(parsed, "out");
    if (!out) throw new CliUsageError("--out <file> is required.");
    const parameters = parseSets(parsed.options.get("set") ?? []);

    let evaluation;
    try {
      evaluation = evaluateTemplate(compiled, { parameters, units });
    } catch (err) {
      if (err instanceof ParameterResolutionError) throw new CliUsageError(err.message);
      throw err;
    }
    // The kernel (a few seconds to load) only when the format needs solids or views: not for the CSV.
    let pool: ReturnType<typeof createInProcessKernel> | undefined;
    const kernel = { run: <T>(task: string, input: unknown) => (pool ??= createInProcessKernel()).run<T>(task, input) };
    try {
      const file = await buildExport(
        { template, evaluation, format, units, projection, part: single(parsed, "part"), drawnBy: os.userInfo().username || "Jigwright", date: today() },
        { kernel },
      );
      mkdirSync(path.dirname(path.resolve(out)), { recursive: true });
      writeFileSync(out, file.body);
      process.stderr.write(`Wrote ${out} (${file.body.length} bytes, ${file.contentType}).\n`);
    } catch (err) {
      if (err instanceof ExportInputError) throw new CliUsageError(err.message);
      if (err instanceof KernelError && (err.code === "kernel_input" || err.code === "kernel_invalid" || err.code === "kernel_build")) throw new CliUsageError(err.message);
      throw err;
    } finally {
      await pool?.close();
    }
    if (!evaluation.ok) {
      const failing = evaluation.checks.filter((c) => c.severity === "error" && !c.passed);
      process.stderr.write(`Warning: ${failing.length} error check${failing.length === 1 ? "" : "s"} failed; the drawings are stamped NOT CHECKED:\n${failing.map((c) => `  - ${c.message}`).join("\n")}\n`);
      return 1;
    }
    return 0;
  },
};
