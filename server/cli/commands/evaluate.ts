/**
 * `evaluate <template-id> [--set key=value]… [--units mm|in]`: one JSON object
 * `{ template, units, parameters, derived, analyses, checks, ok }`. Exit 0 when ok, 1 when an error check
 * fails, 2 on bad input (message on stderr). Values are read by the parameter's kind: numbers for lengths,
 * angles, forces, ratios and counts; true/false for booleans; text for choices and materials. No database.
 */
import { evaluateTemplate, evaluationContract, ParameterResolutionError, type CompiledTemplate } from "@/engine";
import { builtInTemplates } from "@server/templates";
import { CliUsageError, parseArgs, rejectUnknown, single, type CliCommand, type ParsedArgs } from "../args";

const USAGE = "evaluate <template-id> [--set key=value]… [--units mm|in]";

/** Turns `--set` strings into typed values using the template's parameter kinds. */
export function typedSets(compiled: CompiledTemplate, sets: readonly string[]): Record<string, unknown> {
  const kinds = new Map(compiled.parameters.map((p) => [p.key, p.kind]));
  const out: Record<string, unknown> = {};
  for (const set of sets) {
    const eq = set.indexOf("=");
    if (eq <= 0) throw new CliUsageError(`--set needs key=value, got "${set}".`);
    const key = set.slice(0, eq).trim();
    const raw = set.slice(eq + 1).trim();
    if (Object.prototype.hasOwnProperty.call(out, key)) throw new CliUsageError(`--set ${key} was given more than once.`);
    const kind = kinds.get(key);
    if (kind === "length" || kind === "angle" || kind === "force" || kind === "ratio" || kind === "count") {
      const n = raw === "" ? NaN : Number(raw);
      // Left as text when it is not a number, so the parameter check names the parameter and its range.
      out[key] = Number.isFinite(n) ? n : raw;
    } else if (kind === "boolean") {
      out[key] = raw === "true" ? true : raw === "false" ? false : raw;
    } else out[key] = raw;
  }
  return out;
}

/**
 * The template, `--units` and `--set` values of a command that names one template (`evaluate`, `model`);
 * a usage error for a missing or unknown template, extra arguments or bad units.
 */
export function templateArguments(parsed: ParsedArgs, usage: string): { compiled: CompiledTemplate; units: "mm" | "in" | undefined; parameters: Record<string, unknown> } {
  const [id, ...extra] = parsed.positional;
  if (!id) throw new CliUsageError(`Name a template.\nUsage: npm run -s cli -- ${usage}`);
  if (extra.length > 0) throw new CliUsageError(`Unexpected argument${extra.length > 1 ? "s" : ""}: ${extra.join(" ")}.`);
  const store = builtInTemplates();
  const compiled = store.get(id);
  if (!compiled) throw new CliUsageError(`There is no template "${id}". Templates: ${store.list().map((c) => c.template.id).join(", ")}.`);
  const units = single(parsed, "units");
  if (units !== undefined && units !== "mm" && units !== "in") throw new CliUsageError(`--units must be mm or in, not "${units}".`);
  return { compiled, units, parameters: typedSets(compiled, parsed.options.get("set") ?? []) };
}

export const evaluateCommand: CliCommand = {
  name: "evaluate",
  usage: USAGE,
  summary: "Evaluate a template: parameters, derived values, analyses and checks as one JSON object (exit 1 when an error check fails).",
  async run(args) {
    const parsed = parseArgs(args);
    rejectUnknown(parsed, ["set", "units"]);
    const { compiled, units, parameters } = templateArguments(parsed, USAGE);
    try {
      const evaluation = evaluateTemplate(compiled, { parameters, ...(units ? { units } : {}) });
      process.stdout.write(`${JSON.stringify(evaluationContract(evaluation), null, 2)}\n`);
      return evaluation.ok ? 0 : 1;
    } catch (err) {
      if (err instanceof ParameterResolutionError) throw new CliUsageError(err.issues.map((i) => i.message).join("\n"));
      throw err;
    }
  },
};
