import type { DesignParameters } from "@/shared/designs";
import type { ErrorDetail } from "@/shared/errors";
import type { CatalogueEntry } from "./template-catalogue";

/**
 * Checks saved values against a template's parameters: every name must be one of the template's, and
 * each value of the right type. Limits are NOT checked here: a design may hold values the configurator
 * flags, so the person can come back and fix them; evaluation reports those.
 * Returns one detail per bad parameter (`parameters.<key>`); empty when all fit or the entry lists none.
 */
export function parameterProblems(parameters: DesignParameters, entry: CatalogueEntry): ErrorDetail[] {
  if (!entry.parameters) return [];
  const byKey = new Map(entry.parameters.map((p) => [p.key, p]));
  const details: ErrorDetail[] = [];
  for (const [key, value] of Object.entries(parameters)) {
    const spec = byKey.get(key);
    const path = `parameters.${key}`;
    if (!spec) {
      details.push({ path, message: `The template "${entry.name}" has no parameter "${key}".` });
      continue;
    }
    const actual = typeof value === "number" ? "number" : typeof value === "boolean" ? "boolean" : "text";
    if (actual !== spec.value) {
      const want =
        spec.value === "number" ? "a number" : spec.value === "boolean" ? "true or false" : "a text value";
      details.push({ path, message: `${spec.label} must be ${want}.` });
    }
  }
  return details;
}
