/**
 * The built-in templates on disk (templates/<family>/<id>.yaml), loaded and validated once per process,
 * for the export CLI and routes until templates are served from the database catalogue.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { loadTemplate } from "@/engine/template/load";
import type { Template } from "@/engine/template/schema";

export const TEMPLATES_DIR = fileURLToPath(new URL("../../templates", import.meta.url));

let cache: Map<string, Template> | undefined;

function yamlFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return yamlFiles(full);
    return /\.ya?ml$/i.test(name) ? [full] : [];
  });
}

/** Every built-in template by id. A file that does not validate throws with its name. */
export function builtInTemplates(dir = TEMPLATES_DIR): Map<string, Template> {
  if (cache && dir === TEMPLATES_DIR) return cache;
  const map = new Map<string, Template>();
  for (const file of yamlFiles(dir)) {
    const t = loadTemplate(readFileSync(file, "utf8"), path.relative(dir, file));
    map.set(t.id, t);
  }
  if (dir === TEMPLATES_DIR) cache = map;
  return map;
}

export function builtInTemplate(id: string): Template | undefined {
  return builtInTemplates().get(id);
}
