/**
 * The calculator registry. Each calculator module registers itself here by being listed in `all`.
 * Consumers: template analyses, `POST /api/calculators/:kind`, `cli calc <kind>`.
 */
import type { Calculator } from "./types";

const entries = new Map<string, Calculator>();

/** Adds a calculator; a duplicate kind is a programming error. */
export function registerCalculator(calculator: Calculator): void {
  if (entries.has(calculator.kind)) throw new Error(`Calculator "${calculator.kind}" is registered twice.`);
  entries.set(calculator.kind, calculator);
}

export function getCalculator(kind: string): Calculator | undefined {
  return entries.get(kind);
}

export function listCalculators(): Calculator[] {
  return [...entries.values()];
}
