/**
 * The text a person is typing into one row of a profile table, and how it becomes a checked record.
 * Pure functions: the table component holds the state, these do the parsing, checking and diffing, with
 * the SAME zod schema the server validates with (src/shared/profiles.ts), so messages match.
 */
import type { ZodType } from "zod";

export type FieldKind = "text" | "number" | "choice";

export interface FieldSpec {
  key: string;
  /** Column header and input label, without the unit. */
  label: string;
  /** Shown in the header and beside the input ("mm", "rpm"). */
  unit?: string;
  kind: FieldKind;
  choices?: ReadonlyArray<{ value: string; label: string }>;
  /** Smallest step the spin buttons move by (numbers only). */
  step?: string;
}

/** Field key → the text in its input. */
export type Draft = Record<string, string>;
/** Field key → its problem; `""` holds a problem with the row as a whole. */
export type DraftErrors = Record<string, string>;

export function emptyDraft(fields: readonly FieldSpec[]): Draft {
  return Object.fromEntries(
    fields.map((f) => [f.key, f.kind === "choice" ? (f.choices?.[0]?.value ?? "") : ""]),
  );
}

export function draftOf(record: Record<string, unknown>, fields: readonly FieldSpec[]): Draft {
  return Object.fromEntries(
    fields.map((f) => [f.key, record[f.key] === undefined ? "" : String(record[f.key])]),
  );
}

/**
 * Reads a typed number. A decimal comma is accepted ("12,5" is 12.5, as many shop drawings write it);
 * empty text gives undefined and anything else unreadable gives NaN, which the schema refuses with its
 * own message.
 */
export function parseNumber(text: string): number | undefined {
  const t = text.trim();
  if (t === "") return undefined;
  const normalised = /^[+-]?\d*,\d+$/.test(t) ? t.replace(",", ".") : t;
  return Number(normalised);
}

export function valuesOf(draft: Draft, fields: readonly FieldSpec[]): Record<string, unknown> {
  return Object.fromEntries(
    fields.map((f) => [f.key, f.kind === "number" ? parseNumber(draft[f.key] ?? "") : (draft[f.key] ?? "")]),
  );
}

export type DraftCheck<T> = { ok: true; value: T } | { ok: false; errors: DraftErrors };

/** Checks a draft against the shared schema: the parsed record, or one message per bad field. */
export function checkDraft<T>(schema: ZodType<T>, draft: Draft, fields: readonly FieldSpec[]): DraftCheck<T> {
  const r = schema.safeParse(valuesOf(draft, fields));
  if (r.success) return { ok: true, value: r.data };
  const errors: DraftErrors = {};
  for (const issue of r.error.issues) {
    const key = issue.path.length > 0 ? String(issue.path[0]) : "";
    if (!(key in errors)) errors[key] = issue.message;
  }
  return { ok: false, errors };
}

/** The fields of `next` that differ from `original` (what a PATCH should send). */
export function changedFields<T extends Record<string, unknown>>(
  original: Record<string, unknown>,
  next: T,
): Partial<T> {
  const out: Partial<T> = {};
  for (const key of Object.keys(next) as Array<keyof T & string>) {
    if (original[key] !== next[key]) out[key] = next[key];
  }
  return out;
}
