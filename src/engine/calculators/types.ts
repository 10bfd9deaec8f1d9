/**
 * The contract every shop calculator follows: one registered entry per kind, pure, with its sources.
 */
import type { z } from "zod";

/** A published source or a labelled trade fact a calculator relies on. */
export interface Source {
  /** Short citation, e.g. "ISO 286-2:2010, Table 2 (IT grades)". */
  title: string;
  /** "standard" | "handbook" | "textbook" | "common practice" | "from memory" (say which). */
  kind: "standard" | "handbook" | "textbook" | "common practice" | "from memory";
  note?: string;
}

/** Every calculator result carries cautions (PRODUCT.md "Safety") and the sources used. */
export interface CalculatorResultMeta {
  cautions: string[];
  sources: Source[];
}

export interface Calculator<S extends z.ZodType = z.ZodType, O extends object = object> {
  /** Stable kind used by templates (`analyses[].calculator`), the CLI (`calc <kind>`) and HTTP. */
  kind: string;
  label: string;
  summary: string;
  /** Input schema: an object schema; its keys (camelCase) are the CLI's `--kebab-case` options. */
  inputSchema: S;
  /** Pure: same input, same output. Throws `CalculatorInputError` for input the schema cannot express. */
  compute(input: z.infer<S>): O & CalculatorResultMeta;
  sources: Source[];
}

/** Raised for input that passes the schema but makes no physical sense (e.g. eccentricity ≥ radius). */
export class CalculatorInputError extends Error {
  constructor(
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = "CalculatorInputError";
  }
}

/** The standard caution shown beside any figure that feeds a real setup. */
export const SETUP_CAUTION =
  "These figures assume the stated friction, materials and dimensions; they are estimates, not guarantees. " +
  "Check the workholding on the machine before cutting, and follow the machine maker's guidance, local " +
  "regulations and your shop's own practice.";
