/**
 * Template format migrations: one small named step per format change, keyed by the version it upgrades
 * FROM. A document is upgraded step by step to {@link CURRENT_FORMAT_VERSION} before it is validated, so a
 * designer's older upload and a saved design keep working after the format moves on.
 *
 * Format 0 is the pre-release draft format: parameters said `type:` instead of `kind:`, checks said
 * `level:` instead of `severity:` and `concerns:` instead of `parameters:`, and the document had no
 * `formatVersion` at all. Step 0 → 1 renames those fields.
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
