/**
 * Runs a template's own checks. A check whose condition or message cannot be evaluated (because a value it
 * needs failed, or an analysis refused its inputs) is reported as NOT passed with the reason: a check that
 * cannot be shown to pass must never look as if it did.
 */
import { ExpressionEvaluationError, type Scope } from "../expressions";
import type { CompiledCheck } from "../template/compile";
import { renderMessage, type RenderContext } from "../template/message";
import type { CheckResult } from "./types";

function truthy(value: unknown, source: string): boolean {
  if (typeof value !== "boolean") throw new ExpressionEvaluationError(source, `a check condition must be true or false, got ${JSON.stringify(value)}`);
  return value;
}

function reasonOf(err: unknown): string {
  if (err instanceof ExpressionEvaluationError) return err.reason;
  return err instanceof Error ? err.message : String(err);
}

export function runTemplateChecks(checks: readonly CompiledCheck[], scope: Scope, ctx: RenderContext): CheckResult[] {
  const out: CheckResult[] = [];
  for (const check of checks) {
    const { spec } = check;
    try {
      if (check.when !== undefined) {
        const applies = typeof check.when === "boolean" ? check.when : truthy(check.when.evaluate(scope), check.when.source);
        if (!applies) continue;
      }
    } catch (err) {
      out.push({ id: spec.id, severity: spec.severity, passed: false, message: `This check could not be worked out for these values: ${reasonOf(err)}.`, parameters: [...spec.parameters] });
      continue;
    }
    let passed: boolean;
    try {
      passed = typeof check.condition === "boolean" ? check.condition : truthy(check.condition.evaluate(scope), check.condition.source);
    } catch (err) {
      out.push({ id: spec.id, severity: spec.severity, passed: false, message: `This check could not be worked out for these values: ${reasonOf(err)}.`, parameters: [...spec.parameters] });
      continue;
    }
    const template = !passed && check.failMessage ? check.failMessage : check.message;
    let message: string;
    try {
      message = renderMessage(template, scope, ctx);
    } catch (err) {
      message = `${template.source} (the numbers could not be shown: ${reasonOf(err)})`;
    }
    out.push({ id: spec.id, severity: spec.severity, passed, message, parameters: [...spec.parameters] });
  }
  return out;
}
