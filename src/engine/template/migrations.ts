/**
 * Template format migrations: one small named step per format change, keyed by the version it upgrades
 * FROM. A document is upgraded step by step to {@link CURRENT_FORMAT_VERSION} before it is validated, so a
 * designer's older upload and a saved design keep working after the format moves on.
 *
 * Format 0 is the pre-release draft format: parameters said `type:` instead of `kind:`, checks said
 * `level:` instead of `severity:` and `concerns:` instead of `parameters:`, and the document had no
 * `formatVersion` at all. Step 0 → 1 renames those fields.
 *
 * Format 2 reads drawing notes as messages with placeholders (template/notes.ts), so a length can be shown
 * in the drawing's units. Step 1 → 2 doubles the braces of format-1 notes, which were plain text, so they
 * print exactly as before.
 */
import { CURRENT_FORMAT_VERSION } from "./schema";

export interface Migration {
  from: number;
  to: number;
  description: string;
  migrate(document: Record<string, unknown>): Record<string, unknown>;
}

function renameKey(obj: unknown, from: string, to: string): unknown {
  if (!obj || typeof obj !== "object" || Array.isArray(obj)) return obj;
  const record = obj as Record<string, unknown>;
  if (!(from in record) || to in record) return obj;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(record)) out[k === from ? to : k] = v;
  return out;
}

/** Format-1 notes were literal: double their braces so format 2 prints them unchanged. `=` notes are expressions. */
function literalNotes(notes: unknown): unknown {
  if (!Array.isArray(notes)) return notes;
  return notes.map((n) => (typeof n === "string" && !n.startsWith("=") ? n.replace(/[{}]/g, (c) => c + c) : n));
}

function withNotes(holder: unknown): unknown {
  if (!holder || typeof holder !== "object" || Array.isArray(holder)) return holder;
  const h = holder as Record<string, unknown>;
  return "notes" in h ? { ...h, notes: literalNotes(h.notes) } : holder;
}

export const migrations: readonly Migration[] = [
  {
    from: 0,
    to: 1,
    description: "parameters[].type → kind, checks[].level → severity, checks[].concerns → parameters",
    migrate(doc) {
      const out: Record<string, unknown> = { ...doc, formatVersion: 1 };
      if (Array.isArray(doc.parameters)) out.parameters = doc.parameters.map((p) => renameKey(p, "type", "kind"));
      if (Array.isArray(doc.checks)) out.checks = doc.checks.map((c) => renameKey(renameKey(c, "level", "severity"), "concerns", "parameters"));
      return out;
    },
  },
  {
    from: 1,
    to: 2,
    description: "drawing notes take placeholders: braces in drawing.notes, assembly.notes and parts[].drawing.notes doubled",
    migrate(doc) {
      const out: Record<string, unknown> = { ...doc, formatVersion: 2 };
      if ("drawing" in doc) out.drawing = withNotes(doc.drawing);
      if ("assembly" in doc) out.assembly = withNotes(doc.assembly);
      if (Array.isArray(doc.parts)) {
        out.parts = doc.parts.map((p) => {
          if (!p || typeof p !== "object" || Array.isArray(p) || !("drawing" in p)) return p;
          return { ...(p as Record<string, unknown>), drawing: withNotes((p as Record<string, unknown>).drawing) };
        });
      }
      return out;
    },
  },
];

export class MigrationError extends Error {
  constructor(
    message: string,
    readonly path = "formatVersion",
  ) {
    super(message);
    this.name = "MigrationError";
  }
}

export interface MigrationResult {
  document: Record<string, unknown>;
  fromVersion: number;
  /** Descriptions of the steps applied, oldest first (empty when the document was current). */
  applied: string[];
}

/** Upgrades a parsed document to the current format; a missing `formatVersion` counts as format 0. */
export function migrateTemplateDocument(raw: unknown): MigrationResult {
  if (!raw || typeof raw !== "object" || Array.isArray(raw)) throw new MigrationError("A template is a mapping of fields (id, name, parameters…).", "");
  let doc = raw as Record<string, unknown>;
  const declared = doc.formatVersion ?? 0;
  if (typeof declared !== "number" || !Number.isInteger(declared) || declared < 0) {
    throw new MigrationError(`formatVersion must be a whole number; got ${JSON.stringify(declared)}.`);
  }
  if (declared > CURRENT_FORMAT_VERSION) {
    throw new MigrationError(`formatVersion ${declared} is newer than this server understands (${CURRENT_FORMAT_VERSION}).`);
  }
  const applied: string[] = [];
  let version = declared;
  while (version < CURRENT_FORMAT_VERSION) {
    const step = migrations.find((m) => m.from === version);
    if (!step) throw new MigrationError(`No migration from formatVersion ${version}.`);
    doc = step.migrate(doc);
    applied.push(`${step.from} → ${step.to}: ${step.description}`);
    version = step.to;
  }
  return { document: doc, fromVersion: declared, applied };
}
