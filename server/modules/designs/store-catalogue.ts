import type { ParameterSpec } from "@/engine";
import type { TemplateStore } from "@server/templates";
import type { CatalogueEntry, ParameterValueType, TemplateCatalogue } from "./template-catalogue";

const valueTypes: Record<ParameterSpec["kind"], ParameterValueType> = {
  length: "number",
  angle: "number",
  force: "number",
  ratio: "number",
  count: "number",
  choice: "text",
  material: "text",
  boolean: "boolean",
};

/** The designs area's view of the compiled template store (server/templates): id, current version, name, parameters. */
export function storeCatalogue(store: TemplateStore): TemplateCatalogue {
  return {
    current: async (id): Promise<CatalogueEntry | null> => {
      const compiled = store.get(id);
      if (!compiled) return null;
      const { template } = compiled;
      return {
        id: template.id,
        version: template.version,
        name: template.name,
        parameters: compiled.parameters.map((p) => ({
          key: p.key,
          label: p.label,
          value: valueTypes[p.kind],
        })),
      };
    },
  };
}
