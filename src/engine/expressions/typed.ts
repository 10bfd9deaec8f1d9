/** Evaluate a compiled expression and insist on the kind of value the caller needs. */
import type { CompiledExpression, Scope } from "./compile";
import { ExpressionEvaluationError } from "./errors";

function wrong(expr: CompiledExpression, want: string, got: unknown, context?: string): never {
  const shown = typeof got === "string" ? `the text "${got}"` : typeof got === "object" ? "a record" : String(got);
  throw new ExpressionEvaluationError(expr.source, `it should give ${want}, but gives ${shown}`, context);
}

/** A finite number (the compiler already refuses NaN and ±Infinity). */
export function evaluateNumber(expr: CompiledExpression, scope: Scope, context?: string): number {
  const v = expr.evaluate(scope);
  if (typeof v !== "number") wrong(expr, "a number", v, context);
  return v;
}

export function evaluateBoolean(expr: CompiledExpression, scope: Scope, context?: string): boolean {
  const v = expr.evaluate(scope);
  if (typeof v !== "boolean") wrong(expr, "true or false", v, context);
  return v;
}

export function evaluateText(expr: CompiledExpression, scope: Scope, context?: string): string {
  const v = expr.evaluate(scope);
  if (typeof v !== "string") wrong(expr, "text", v, context);
  return v;
}
