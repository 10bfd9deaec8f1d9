/**
 * Parsing with mathjs, locked down.
 *
 * The mathjs instance below is built from the parser's own dependencies only and never exported: the
 * engine uses it to turn text into an abstract syntax tree and nothing else. Evaluation does NOT go through
 * mathjs at all — `compile.ts` walks the tree, refuses every node type and function that is not on the
 * whitelist, and turns the rest into plain closures over a plain scope object. So even a construct the
 * whitelist walk missed could not reach `import`, `createUnit`, `evaluate` or any other mathjs function.
 *
 * Limits (checked before mathjs sees the text, so hostile input is refused in microseconds):
 * {@link MAX_EXPRESSION_LENGTH} characters and {@link MAX_NESTING} levels of brackets.
 */
import { create, parseDependencies, type FactoryFunctionMap, type MathNode } from "mathjs";
import { MAX_EXPRESSION_LENGTH } from "../parts/features";
import { ExpressionError } from "./errors";

export { MAX_EXPRESSION_LENGTH };
/** Deepest allowed nesting of parentheses, brackets and braces. */
export const MAX_NESTING = 32;

const math = create({ parseDependencies } as FactoryFunctionMap, {});
const mathParse = math.parse;
// Belt and braces: the instance is private, but make its extension points inert anyway.
const refuse = () => {
  throw new Error("Disabled in the Jigwright expression sandbox.");
};
math.import({ import: refuse, createUnit: refuse, evaluate: refuse, parse: refuse, config: refuse }, { override: true, silent: true });

/**
 * Replaces the inside of string literals by spaces (quotes kept), so token searches and bracket counting
 * never look inside text.
 */
export function maskStrings(text: string): string {
  let out = "";
  let quote: string | null = null;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quote) {
      if (c === "\\" && i + 1 < text.length) {
        out += "  ";
        i++;
        continue;
      }
      if (c === quote) {
        quote = null;
        out += c;
      } else out += " ";
    } else {
      if (c === '"' || c === "'") quote = c;
      out += c;
    }
  }
  return out;
}

/** Parses one expression; throws {@link ExpressionError} with a position for anything mathjs refuses. */
export function parseExpression(text: string, context?: string): MathNode {
  if (typeof text !== "string") throw new ExpressionError(String(text), 1, "an expression must be text", context);
  if (text.length > MAX_EXPRESSION_LENGTH) {
    throw new ExpressionError(text, MAX_EXPRESSION_LENGTH + 1, `it is ${text.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}`, context);
  }
  if (text.trim() === "") throw new ExpressionError(text, 1, "it is empty", context);
  const masked = maskStrings(text);
  let depth = 0;
  for (let i = 0; i < masked.length; i++) {
    const c = masked[i]!;
    if (c === "(" || c === "[" || c === "{") {
      depth++;
      if (depth > MAX_NESTING) throw new ExpressionError(text, i + 1, `brackets are nested more than ${MAX_NESTING} deep`, context);
    } else if (c === ")" || c === "]" || c === "}") depth--;
    else if (c === ";" || c === "\n" || c === "\r") throw new ExpressionError(text, i + 1, "only one expression is allowed (no ';' or line breaks)", context);
  }
  try {
    return mathParse(text);
  } catch (err) {
    const char = (err as { char?: unknown }).char;
    const position = typeof char === "number" && char > 0 ? char : 1;
    const reason = err instanceof Error ? err.message.replace(/\s*\(char \d+\)\s*$/, "") : "syntax error";
    throw new ExpressionError(text, position, `syntax error: ${reason}`, context);
  }
}
