/**
 * What saved designs need from the template catalogue: does a template exist, and which version is
 * current. A port, so the designs area does not depend on how templates are stored; the app passes the
 * real catalogue and tests pass one whose versions they control.
 */
/** What a saved value of one parameter must be: a number, a text (choice or material key) or true/false. */
export type ParameterValueType = "number" | "text" | "boolean";

export interface CatalogueParameter {
  key: string;
  label: string;
  value: ParameterValueType;
}

export interface CatalogueEntry {
  id: string;
  /** The current published version (semantic version). */
  version: string;
  name: string;
  /** The current version's parameters; when given, saved values are checked against them. */
  parameters?: readonly CatalogueParameter[];
}

export interface TemplateCatalogue {
  /** The template as currently published, or null when the catalogue does not list it. */
  current(templateId: string): Promise<CatalogueEntry | null>;
}

/** A catalogue over a fixed list (tests; and an install with no templates yet). */
export function fixedCatalogue(entries: readonly CatalogueEntry[]): TemplateCatalogue {
  const byId = new Map(entries.map((e) => [e.id, e]));
  return { current: async (id) => byId.get(id) ?? null };
}
