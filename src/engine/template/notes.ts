/**
 * Drawing notes: as a template writes them (`drawing.notes`, `assembly.notes`, `parts[].drawing.notes`)
 * and as the evaluation hands them to the drawings.
 *
 * Written (format 2): plain text with the placeholders of check messages (message.ts), `{expr}` or
 * `{expr:format}`, `{{` and `}}` for literal braces. `{expr:len}` is a length in the template's units; the
 * drawing shows it in the drawing's own units (mm or decimal inches) without a unit symbol, because the
 * sheet states its units once (ISO 129-1), so no unit may follow it ("within {0.01:len} of the offset").
 * `.N` asks for at least N decimals in millimetres. A note starting with `=` is one expression giving the
 * whole text (a choice between wordings), taken literally.
 *
 * Resolved ("note text"): literal text with `{{`/`}}` for braces, and `{<mm>:len}` or `{<mm>:len.N}` where
 * a length in millimetres goes. `drawing/sheet/noteText.ts` renders it for a sheet in mm or inches; every
 * other placeholder is already rendered by then.
 */
import { compileExpression, type CompileOptions, type CompiledExpression, type Scope } from "../expressions";
import { compileMessage, formatValue, messageNames, MessageTemplateError, type CompiledMessage, type RenderContext } from "./message";

export interface CompiledNote {
  source: string;
  /** A note with placeholders (or none). */
  message?: CompiledMessage;
  /** A note written as `=expression`. */
  expr?: CompiledExpression;
}

const UNIT_AFTER_LENGTH = /\{[^{}]*:len(?:\.\d)?\}\s*(mm|millimetres?|in|inch|inches|")(?![A-Za-z])/;

/** Compiles a note; refuses a unit written after a length placeholder (the drawing shows its own). */
export function compileNote(source: string, options: CompileOptions): CompiledNote {
  if (source.startsWith("=")) return { source, expr: compileExpression(source.slice(1), options) };
  const unit = UNIT_AFTER_LENGTH.exec(source);
  if (unit) {
    throw new MessageTemplateError(
      source,
      unit.index + 1,
      `a length placeholder is shown in the drawing's own units (mm or inches) without a symbol; leave out the "${unit[1]}" after it`,
    );
  }
  return { source, message: compileMessage(source, options) };
}

/** The names a note's expression or placeholders read. */
export function noteNames(note: CompiledNote): string[] {
  return note.expr ? [...note.expr.names] : messageNames(note.message);
}

/** Literal text as note text (braces doubled). */
export function escapeNoteText(text: string): string {
  return text.replace(/[{}]/g, (c) => c + c);
}

export interface NoteContext {
  mmPerTemplateUnit: number;
  render: RenderContext;
}

/**
 * Evaluates a note's placeholders: lengths become `{<mm>:len}` markers, everything else final text. A
 * placeholder that cannot be worked out with these values reads "(not available)" rather than losing the
 * note.
 */
export function resolveNote(note: CompiledNote, scope: Scope, ctx: NoteContext): string {
  if (note.expr) {
    try {
      const v = note.expr.evaluate(scope);
      return escapeNoteText(typeof v === "string" ? v : formatValue(v, undefined, undefined, ctx.render));
    } catch {
      return escapeNoteText("(note not available with these values)");
    }
  }
  let out = "";
  for (const piece of note.message!.pieces) {
    if (typeof piece === "string") {
      out += escapeNoteText(piece);
      continue;
    }
    let v: unknown;
    try {
      v = piece.expr.evaluate(scope);
    } catch {
      out += "(not available)";
      continue;
    }
    if (piece.format === "len" && typeof v === "number" && Number.isFinite(v)) {
      out += `{${v * ctx.mmPerTemplateUnit}:len${piece.decimals !== undefined ? `.${piece.decimals}` : ""}}`;
    } else {
      out += escapeNoteText(formatValue(v, piece.format, piece.decimals, ctx.render));
    }
  }
  return out;
}
