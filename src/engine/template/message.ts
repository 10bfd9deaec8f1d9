/**
 * Check messages with numbers in them: `"The slot adjusts {slotMin:len} to {slotMax:len}."`.
 *
 * A placeholder is `{expression}` or `{expression:format}`; `{{` and `}}` are literal braces.
 * Formats (each may end in `.N` for N decimals, and `.N` alone means a plain number with N decimals):
 *  - `len`   a length in the template's units, shown in the user's units with its symbol;
 *  - `angle` degrees with °;   `force` newtons, with lbf beside for inch users;
 *  - `num`   a plain number (default 3 decimals, trailing zeros trimmed);  `int` rounded to a whole number;
 *  - `pct`   a ratio shown as a percentage (0.25 → "25 %");
 *  - `yesno` true/false as "yes"/"no";  `text` the value as text.
 * Without a format, numbers are `num`, booleans `yesno`, text as is.
 */
import { compileExpression, type CompileOptions, type CompiledExpression, type Scope } from "../expressions";
import { formatAngle, formatForce, formatLength, formatNumber, formatPercent, type LengthUnit } from "../units";

export const MESSAGE_FORMATS = ["len", "angle", "force", "num", "int", "pct", "yesno", "text"] as const;
export type MessageFormat = (typeof MESSAGE_FORMATS)[number];

export interface Placeholder {
  expr: CompiledExpression;
  format?: MessageFormat;
  decimals?: number;
}
export type MessagePiece = string | Placeholder;
export interface CompiledMessage {
  source: string;
  pieces: MessagePiece[];
}

/** The names a message's placeholders read. */
export function messageNames(message: CompiledMessage | undefined): string[] {
  return (message?.pieces ?? []).flatMap((p) => (typeof p === "string" ? [] : p.expr.names));
}

const SPEC_RE = /^(?:(len|angle|force|num|int|pct|yesno|text)(?:\.(\d))?|\.(\d))$/;

export class MessageTemplateError extends Error {
  constructor(
    readonly template: string,
    readonly position: number,
    readonly reason: string,
  ) {
    super(`Message "${template.length > 80 ? `${template.slice(0, 80)}…` : template}" refused at character ${position}: ${reason}`);
    this.name = "MessageTemplateError";
  }
}

/** Splits a message into text and compiled placeholders; expression errors propagate as ExpressionError. */
export function compileMessage(source: string, options: CompileOptions): CompiledMessage {
  const pieces: MessagePiece[] = [];
  let text = "";
  let i = 0;
  while (i < source.length) {
    const c = source[i]!;
    if (c === "{" && source[i + 1] === "{") {
      text += "{";
      i += 2;
      continue;
    }
    if (c === "}" && source[i + 1] === "}") {
      text += "}";
      i += 2;
      continue;
    }
    if (c === "}") throw new MessageTemplateError(source, i + 1, "a '}' without its '{' (write '}}' for a literal brace)");
    if (c !== "{") {
      text += c;
      i++;
      continue;
    }
    const end = source.indexOf("}", i + 1);
    if (end < 0) throw new MessageTemplateError(source, i + 1, "a '{' is never closed");
    const inner = source.slice(i + 1, end);
    if (inner.includes("{")) throw new MessageTemplateError(source, i + 1, "placeholders cannot be nested");
    if (inner.trim() === "") throw new MessageTemplateError(source, i + 1, "an empty placeholder {}");
    let exprText = inner;
    let format: MessageFormat | undefined;
    let decimals: number | undefined;
    const colon = inner.lastIndexOf(":");
    if (colon >= 0) {
      const m = SPEC_RE.exec(inner.slice(colon + 1).trim());
      if (m) {
        exprText = inner.slice(0, colon);
        format = (m[1] as MessageFormat | undefined) ?? "num";
        const d = m[2] ?? m[3];
        if (d !== undefined) decimals = Number(d);
      }
    }
    if (text) pieces.push(text);
    text = "";
    const expr = compileExpression(exprText.trim(), { ...options, context: `${options.context ?? "message"} placeholder {${inner}}` });
    pieces.push({ expr, ...(format ? { format } : {}), ...(decimals !== undefined ? { decimals } : {}) });
    i = end + 1;
  }
  if (text) pieces.push(text);
  return { source, pieces };
}

export interface RenderContext {
  templateUnits: LengthUnit;
  userUnits: LengthUnit;
}

/** Renders a message; a placeholder that cannot be evaluated throws (the caller reports the check as failed). */
export function renderMessage(message: CompiledMessage, scope: Scope, ctx: RenderContext): string {
  let out = "";
  for (const piece of message.pieces) {
    if (typeof piece === "string") out += piece;
    else out += formatValue(piece.expr.evaluate(scope), piece.format, piece.decimals, ctx);
  }
  return out;
}

export function formatValue(value: unknown, format: MessageFormat | undefined, decimals: number | undefined, ctx: RenderContext): string {
  if (typeof value === "boolean") return format === "text" ? String(value) : value ? "yes" : "no";
  if (typeof value === "string") return value;
  if (typeof value !== "number") return "(not a number)";
  switch (format) {
    case "len":
      return formatLength(value, ctx.templateUnits, ctx.userUnits, decimals);
    case "angle":
      return formatAngle(value, decimals ?? 1);
    case "force":
      return formatForce(value, ctx.userUnits, decimals ?? 0);
    case "int":
      return formatNumber(Math.round(value), 0);
    case "pct":
      return formatPercent(value, decimals ?? 0);
    case "text":
      return String(value);
    case "yesno":
      return value ? "yes" : "no";
    default:
      return formatNumber(value, decimals ?? 3);
  }
}
