/**
 * Errors raised by the expression sandbox. Every message names the expression, where it sits in the template
 * (`context`, e.g. `derived.slotLength`) and, for refusals, the 1-based character position.
 */

function where(context: string | undefined): string {
  return context ? ` (${context})` : "";
}

/** The expression is refused before it ever runs: syntax error, forbidden construct, unknown name, too long. */
export class ExpressionError extends Error {
  constructor(
    readonly expression: string,
    /** 1-based character position of the offending token (1 when the whole expression is at fault). */
    readonly position: number,
    readonly reason: string,
    readonly context?: string,
  ) {
    super(`Expression "${shorten(expression)}"${where(context)} refused at character ${position}: ${reason}`);
    this.name = "ExpressionError";
  }
}

/** The expression is valid but cannot produce a value for these inputs (division by zero, sqrt of −1…). */
export class ExpressionEvaluationError extends Error {
  constructor(
    readonly expression: string,
    readonly reason: string,
    readonly context?: string,
  ) {
    super(`Expression "${shorten(expression)}"${where(context)} could not be evaluated: ${reason}`);
    this.name = "ExpressionEvaluationError";
  }
}

/** A name the expression needs has no value because an earlier step failed (its reason is carried along). */
export class UnavailableValueError extends ExpressionEvaluationError {
  constructor(
    expression: string,
    readonly missingName: string,
    readonly missingReason: string,
    context?: string,
  ) {
    super(expression, `"${missingName}" has no value (${missingReason})`, context);
    this.name = "UnavailableValueError";
  }
}

/** Keeps messages readable when someone submits a 10 kB expression. */
export function shorten(text: string, max = 80): string {
  return text.length <= max ? text : `${text.slice(0, max)}… (${text.length} characters)`;
}
