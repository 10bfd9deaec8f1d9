/**
 * `calc <kind> --<input> <value>…`: runs one calculator and prints its JSON. Inputs are the calculator
 * schema's keys in kebab-case (`--pivot-diameter 8`); each value is read as a number, true/false or text,
 * whichever the schema accepts for that key. Exit 2 with a clear message for bad input. No database.
 */
import "@/engine/calculators";
import { getCalculator, listCalculators } from "@/engine/calculators/registry";
import { CalculatorInputError } from "@/engine/calculators/types";
import type { ZodType } from "zod";
import { CliUsageError, parseArgs, type CliCommand } from "../args";

const USAGE = "calc <kind> --<input> <value>…";

export const kebabToCamel = (s: string) => s.replace(/-([a-z0-9])/g, (_, c: string) => c.toUpperCase());
export const camelToKebab = (s: string) => s.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

/** The candidates a command-line word can stand for, most specific first. */
function candidates(raw: string): unknown[] {
  const out: unknown[] = [];
  if (raw.trim() !== "" && Number.isFinite(Number(raw))) out.push(Number(raw));
  if (raw === "true") out.push(true);
  if (raw === "false") out.push(false);
  out.push(raw);
  return out;
}

export const calcCommand: CliCommand = {
  name: "calc",
  usage: USAGE,
  summary: "Run a shop calculator (eccentric-cam, fit, thread, general-tolerance, beam, cutting-speed, …) and print its JSON.",
  async run(args) {
    const parsed = parseArgs(args);
    const [kind, ...extra] = parsed.positional;
    const kinds = listCalculators().map((c) => c.kind);
    if (!kind) throw new CliUsageError(`Name a calculator: ${kinds.join(", ")}.\nUsage: npm run -s cli -- ${USAGE}`);
    if (extra.length > 0) throw new CliUsageError(`Unexpected argument${extra.length > 1 ? "s" : ""}: ${extra.join(" ")}.`);
    const calculator = getCalculator(kind);
    if (!calculator) throw new CliUsageError(`There is no calculator "${kind}". Calculators: ${kinds.join(", ")}.`);
    const shape = ((calculator.inputSchema as { shape?: Record<string, ZodType> }).shape ?? {}) as Record<string, ZodType>;
    const known = Object.keys(shape);
    const input: Record<string, unknown> = {};
    for (const [option, values] of parsed.options) {
      const key = kebabToCamel(option);
      if (!known.includes(key)) {
        throw new CliUsageError(`The ${kind} calculator has no input --${option}. Its inputs: ${known.map((k) => `--${camelToKebab(k)}`).join(" ")}.`);
      }
      if (values.length > 1) throw new CliUsageError(`--${option} was given more than once.`);
      const raw = values[0]!;
      const field = shape[key]!;
      const options = candidates(raw);
      input[key] = options.find((v) => field.safeParse(v).success) ?? options[0];
    }
    const result = calculator.inputSchema.safeParse(input);
    if (!result.success) {
      const lines = result.error.issues.map((i) => {
        const path = i.path.map(String).join(".");
        return path ? `--${camelToKebab(path)}: ${i.message}` : i.message;
      });
      throw new CliUsageError(`Bad input for ${kind}:\n  ${lines.join("\n  ")}`);
    }
    try {
      process.stdout.write(`${JSON.stringify(calculator.compute(result.data), null, 2)}\n`);
      return 0;
    } catch (err) {
      if (err instanceof CalculatorInputError) throw new CliUsageError(`Bad input for ${kind}${err.field ? ` (--${camelToKebab(err.field)})` : ""}: ${err.message}`);
      throw err;
    }
  },
};
