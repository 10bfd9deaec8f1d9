/**
 * Loading a template from YAML text, safely: the same path serves built-in templates and designer uploads.
 *
 * Defences, cheapest first, so hostile input is refused in well under a millisecond per kilobyte:
 *  1. size limit ({@link MAX_TEMPLATE_BYTES});
 *  2. a pre-scan for nesting deeper than {@link MAX_YAML_DEPTH} (flow brackets or indentation), which would
 *     otherwise make the YAML parser recurse for seconds;
 *  3. the `yaml` parser with the YAML 1.2 core schema, no custom tags, merge keys (`<<`) off, unique keys,
 *     and any explicit tag (`!foo`, `!!binary`, `!!js/function`…) refused;
 *  4. alias expansion capped at {@link MAX_ALIAS_COUNT} ("billion laughs" bombs stop at once);
 *  5. format migration, then the zod schema, then compilation (names, limits, calculators, expressions).
 * Every refusal lists path + reason.
 */
import { isNode, parseDocument, visit } from "yaml";
import { migrateTemplateDocument, MigrationError } from "./migrations";
import { templateSchema, type Template } from "./schema";
import { compileTemplate, type CompileDeps, type CompiledTemplate } from "./compile";
import { TemplateValidationError, type TemplateIssue } from "./issues";
import { zodIssuesToTemplateIssues } from "./zod-issues";

export const MAX_TEMPLATE_BYTES = 256 * 1024;
export const MAX_ALIAS_COUNT = 20;
export const MAX_YAML_DEPTH = 64;

function byteLength(text: string): number {
  return new TextEncoder().encode(text).length;
}

/** Refuses documents nested deeper than the limit, by brackets or by indentation, before parsing. */
function prescanDepth(text: string): TemplateIssue | undefined {
  let depth = 0;
  let line = 1;
  let quote: string | null = null;
  let lineStart = true;
  let indent = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === "\n") {
      line++;
      lineStart = true;
      indent = 0;
      quote = null;
      continue;
    }
    if (lineStart) {
      if (c === " ") {
        indent++;
        // Two spaces per level is the usual YAML style; allow generous slack.
        if (indent > MAX_YAML_DEPTH * 3) return { path: "", message: `line ${line} is indented more than ${MAX_YAML_DEPTH * 3} spaces; the template is nested too deeply` };
        continue;
      }
      lineStart = false;
    }
    if (quote) {
      if (c === quote) quote = null;
      continue;
    }
    if (c === "#") {
      while (i + 1 < text.length && text[i + 1] !== "\n") i++;
      continue;
    }
    // A quote opens a quoted scalar only where a scalar can start (as in YAML); `it's` stays plain text.
    if ((c === '"' || c === "'") && /[\s:,[{?-]/.test(text[i - 1] ?? " ")) quote = c;
    else if (c === "[" || c === "{") {
      depth++;
      if (depth > MAX_YAML_DEPTH) return { path: "", message: `line ${line}: brackets are nested more than ${MAX_YAML_DEPTH} deep` };
    } else if (c === "]" || c === "}") depth = Math.max(0, depth - 1);
  }
  return undefined;
}

/**
 * Parses YAML text into plain data with the limits above.
 * @throws TemplateValidationError
 */
export function parseTemplateYaml(text: string, sourceName?: string): unknown {
  if (typeof text !== "string") throw new TemplateValidationError([{ path: "", message: "the template must be text" }], sourceName);
  const bytes = byteLength(text);
  if (bytes > MAX_TEMPLATE_BYTES) {
    throw new TemplateValidationError([{ path: "", message: `the file is ${Math.ceil(bytes / 1024)} KB; the limit is ${MAX_TEMPLATE_BYTES / 1024} KB` }], sourceName);
  }
  const deep = prescanDepth(text);
  if (deep) throw new TemplateValidationError([deep], sourceName);

  const doc = parseDocument(text, {
    schema: "core",
    customTags: [],
    merge: false,
    uniqueKeys: true,
    strict: true,
    prettyErrors: true,
    stringKeys: true,
  });
  const problems: TemplateIssue[] = [...doc.errors, ...doc.warnings].map((e) => ({ path: "", message: `YAML ${e.code}: ${e.message.split("\n")[0]}` }));
  visit(doc, {
    Node(_key, node) {
      if (isNode(node) && node.tag) problems.push({ path: "", message: `YAML tags are not allowed (found ${node.tag}); write plain values` });
    },
  });
  if (problems.length > 0) throw new TemplateValidationError(problems.slice(0, 20), sourceName);
  try {
    return doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    throw new TemplateValidationError([{ path: "", message: `YAML aliases refused: ${message}` }], sourceName);
  }
}

/** Migrates and validates already-parsed data (e.g. JSON from an upload) against the schema. */
export function validateTemplateData(data: unknown, sourceName?: string): Template {
  let document: Record<string, unknown>;
  try {
    document = migrateTemplateDocument(data).document;
  } catch (err) {
    if (err instanceof MigrationError) throw new TemplateValidationError([{ path: err.path, message: err.message }], sourceName);
    throw err;
  }
  const result = templateSchema.safeParse(document);
  if (!result.success) throw new TemplateValidationError(zodIssuesToTemplateIssues(result.error), sourceName);
  return result.data;
}

/** YAML text → validated template (not compiled). */
export function loadTemplate(text: string, sourceName?: string): Template {
  return validateTemplateData(parseTemplateYaml(text, sourceName), sourceName);
}

/** YAML text → compiled template, ready to evaluate. */
export function loadAndCompileTemplate(text: string, deps: CompileDeps, sourceName?: string): CompiledTemplate {
  const template = loadTemplate(text, sourceName);
  try {
    return compileTemplate(template, deps);
  } catch (err) {
    if (err instanceof TemplateValidationError && sourceName && !err.source) throw new TemplateValidationError(err.issues, sourceName);
    throw err;
  }
}

export type ValidationOutcome = { ok: true; compiled: CompiledTemplate } | { ok: false; issues: TemplateIssue[] };

/** Like {@link loadAndCompileTemplate} but returns the reasons instead of throwing (CLI `validate`, uploads). */
export function validateTemplateText(text: string, deps: CompileDeps): ValidationOutcome {
  try {
    return { ok: true, compiled: loadAndCompileTemplate(text, deps) };
  } catch (err) {
    if (err instanceof TemplateValidationError) return { ok: false, issues: err.issues };
    throw err;
  }
}
