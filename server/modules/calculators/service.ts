/**
 * The shop calculators over HTTP and the CLI: list them with their input schemas, run one. Input is
 * validated by the calculator's own zod schema (one detail per bad field); a `CalculatorInputError`
 * (input the schema cannot rule out, e.g. an eccentricity larger than the cam) is a 400 naming its field.
 */
import { z } from "zod";
import "@/engine/calculators";
import { getCalculator, listCalculators } from "@/engine/calculators/registry";
import { CalculatorInputError, type Calculator, type Source } from "@/engine/calculators/types";
import { badRequest, notFound } from "@server/lib/errors";
import { zodDetails } from "@server/middleware/validate";

export interface CalculatorDto {
  kind: string;
  label: string;
  summary: string;
  /** Input keys (camelCase; the CLI takes them as --kebab-case). */
  inputs: string[];
  /** JSON Schema of the input, for forms and scripts. */
  inputSchema: unknown;
  sources: Source[];
}

function inputKeys(calculator: Calculator): string[] {
  const shape = (calculator.inputSchema as { shape?: Record<string, unknown> }).shape;
  return shape ? Object.keys(shape) : [];
}

function jsonSchemaOf(calculator: Calculator): unknown {
  try {
    return z.toJSONSchema(calculator.inputSchema, { io: "input", unrepresentable: "any" });
  } catch {
    return { type: "object" };
  }
}

export function calculatorsService() {
  const find = (kind: string): Calculator => {
    const calculator = getCalculator(kind);
    if (!calculator) throw notFound(`There is no calculator "${kind}". Known: ${listCalculators().map((c) => c.kind).join(", ")}.`);
    return calculator;
  };
  return {
    has: (kind: string) => getCalculator(kind) !== undefined,
    list(): CalculatorDto[] {
      return listCalculators().map((c) => ({ kind: c.kind, label: c.label, summary: c.summary, inputs: inputKeys(c), inputSchema: jsonSchemaOf(c), sources: c.sources }));
    },
    describe(kind: string): CalculatorDto {
      const c = find(kind);
      return { kind: c.kind, label: c.label, summary: c.summary, inputs: inputKeys(c), inputSchema: jsonSchemaOf(c), sources: c.sources };
    },
    /** Runs a calculator. @throws HttpError 404 for an unknown kind, 400 for bad input. */
    run(kind: string, input: unknown): object {
      const c = find(kind);
      const parsed = c.inputSchema.safeParse(input);
      if (!parsed.success) {
        const details = zodDetails(parsed.error);
        throw badRequest(details.length === 1 ? `${details[0]!.path || "input"}: ${details[0]!.message}` : `The ${c.label.toLowerCase()} inputs are not valid.`, details);
      }
      try {
        return c.compute(parsed.data);
      } catch (err) {
        if (err instanceof CalculatorInputError) throw badRequest(err.message, [{ path: err.field ?? "", message: err.message }]);
        throw err;
      }
    },
  };
}

export type CalculatorsService = ReturnType<typeof calculatorsService>;
