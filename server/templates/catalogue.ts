/**
 * The built-in template catalogue: every `templates/**\/*.yaml` loaded, validated and compiled ONCE at start.
 * A built-in template that fails validation stops the server (and the CLI) with every reason listed —
 * shipping a broken built-in template is a bug, never a runtime condition.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import "@/engine/calculators";
import { getCalculator } from "@/engine/calculators/registry";
import { loadAndCompileTemplate, MAX_TEMPLATE_BYTES, TemplateValidationError, type CompiledTemplate } from "@/engine";

export const defaultTemplatesDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../templates");

export interface TemplateStore {
  /** Compiled templates in catalogue order (family, then name). */
  list(): readonly CompiledTemplate[];
  get(id: string): CompiledTemplate | undefined;
  /** Where each template was read from (for messages). */
  sourceOf(id: string): string | undefined;
  /**
   * A published version of a template, current or earlier, when this store still holds it (saved designs
   * pinned to an earlier version are compared with it). The built-in catalogue holds only the version in
   * its YAML file; a store that keeps earlier versions answers for those too.
   */
  getVersion?(id: string, version: string): CompiledTemplate | undefined;
}

/** Thrown at start-up when a built-in template is broken; the message lists every file and reason. */
export class CatalogueLoadError extends Error {
  constructor(readonly failures: Array<{ file: string; error: TemplateValidationError | Error }>) {
    super(`Built-in templates failed to load:\n${failures.map((f) => `${f.file}: ${f.error.message}`).join("\n")}`);
    this.name = "CatalogueLoadError";
  }
}

function yamlFiles(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...yamlFiles(full));
    else if (entry.isFile() && /\.ya?ml$/i.test(entry.name)) out.push(full);
  }
  return out.sort();
}

/** Reads and compiles every YAML template under `dir`. @throws CatalogueLoadError */
export function loadTemplateStore(dir = defaultTemplatesDir): TemplateStore {
  const byId = new Map<string, CompiledTemplate>();
  const sources = new Map<string, string>();
  const failures: Array<{ file: string; error: TemplateValidationError | Error }> = [];
  for (const file of yamlFiles(dir)) {
    const rel = path.relative(dir, file);
    try {
      const size = fs.statSync(file).size;
      if (size > MAX_TEMPLATE_BYTES) throw new Error(`the file is ${Math.ceil(size / 1024)} KB; the limit is ${MAX_TEMPLATE_BYTES / 1024} KB`);
      const compiled = loadAndCompileTemplate(fs.readFileSync(file, "utf8"), { getCalculator }, rel);
      const id = compiled.template.id;
      if (byId.has(id)) throw new Error(`the id "${id}" is also used by ${sources.get(id)}`);
      byId.set(id, compiled);
      sources.set(id, rel);
    } catch (err) {
      failures.push({ file: rel, error: err instanceof Error ? err : new Error(String(err)) });
    }
  }
  if (failures.length > 0) throw new CatalogueLoadError(failures);
  const ordered = [...byId.values()].sort((a, b) => a.template.family.localeCompare(b.template.family) || a.template.name.localeCompare(b.template.name));
  return {
    list: () => ordered,
    get: (id) => byId.get(id),
    sourceOf: (id) => sources.get(id),
    getVersion: (id, version) => {
      const compiled = byId.get(id);
      return compiled?.template.version === version ? compiled : undefined;
    },
  };
}

let builtIn: TemplateStore | undefined;

/** The built-in catalogue, loaded on first use and cached for the life of the process. */
export function builtInTemplates(): TemplateStore {
  builtIn ??= loadTemplateStore();
  return builtIn;
}
