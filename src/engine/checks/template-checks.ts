/**
 * Runs a template's own checks. A check whose condition or message cannot be evaluated (because a value it
 * needs failed, or an analysis refused its inputs) is reported as NOT passed with the reason: a check that
 * cannot be shown to pass must never look as if it did.
 */
import { ExpressionEvaluationError, type Scope } from "../expressions";
import type { CompiledCheck } from "../template/compile";
import { freezeUnderTest } from "../freeze";
import { rememberResult, scopeKey } from "../template/compile";
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

/**
 * Results of the template's checks, in order. Each check's result is remembered by the values it reads
 * and the units (a one-value change re-runs only the checks that read it); results are shared, frozen
 * under test.
 */
export function runTemplateChecks(checks: readonly CompiledCheck[], scope: Scope, ctx: RenderContext): CheckResult[] {
  const out: CheckResult[] = [];
  const units = `${ctx.templateUnits}>${ctx.userUnits}`;
  for (const check of checks) {
    const key = scopeKey(check.reads, scope, units);
    let result = check.recent.get(key) as CheckResult | null | undefined;
    if (result === undefined) result = rememberResult<unknown>(check, key, freezeUnderTest(runCheck(check, scope, ctx))) as CheckResult | null;
    if (result) out.push(result);
  }
  return out;
}

/** One check's result, or null when its `when` says it does not apply. */
function runCheck(check: CompiledCheck, scope: Scope, ctx: RenderContext): CheckResult | null {
  const { spec } = check;
  try {
    if (check.when !== undefined) {
      const applies = typeof check.when === "boolean" ? check.when : truthy(check.when.evaluate(scope), check.when.source);
      if (!applies) return null;
    }
  } catch (err) {
    return { id: spec.id, severity: spec.severity, passed: false, message: `This check could not be worked out for these values: ${reasonOf(err)}.`, parameters: [...spec.parameters] };
  }
  let passed: boolean;
  try {
    passed = typeof check.condition === "boolean" ? check.condition : truthy(check.condition.evaluate(scope), check.condition.source);
  } catch (err) {
    return { id: spec.id, severity: spec.severity, passed: false, message: `This check could not be worked out for these values: ${reasonOf(err)}.`, parameters: [...spec.parameters] };
  }
  const template = !passed && check.failMessage ? check.failMessage : check.message;
  let message: string;
  try {
    message = renderMessage(template, scope, ctx);
  } catch (err) {
    message = `${template.source} (the numbers could not be shown: ${reasonOf(err)})`;
  }
  return { id: spec.id, severity: spec.severity, passed, message, parameters: [...spec.parameters] };
}
