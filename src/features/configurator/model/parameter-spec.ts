import { z } from "zod";
import { PARAMETER_KINDS, type ParameterKind } from "@/engine/template/schema";

/**
 * A template parameter as the configurator reads it from `GET /api/templates/:id`. The template format
 * (src/engine/template/schema.ts) is the source of truth; this client view accepts extra fields the
 * server may add (labels of materials, for instance) so a richer answer never breaks the form.
 */
const choiceOption = z.union([z.string(), z.object({ value: z.string(), label: z.string() })]);
const materialOption = z.union([z.string(), z.object({ key: z.string(), name: z.string() })]);

export const parameterSpecSchema = z.object({
  key: z.string(),
  label: z.string(),
  kind: z.enum(PARAMETER_KINDS),
  group: z.string().optional(),
  help: z.string().optional(),
  default: z.union([z.number(), z.string(), z.boolean()]),
  min: z.number().optional(),
  max: z.number().optional(),
  step: z.number().optional(),
  choices: z.array(choiceOption).optional(),
  materials: z.array(materialOption).optional(),
});
export type ParameterSpecView = z.infer<typeof parameterSpecSchema>;

export type NumericKind = Extract<ParameterKind, "length" | "angle" | "force" | "ratio" | "count">;
const numericKinds = new Set<ParameterKind>(["length", "angle", "force", "ratio", "count"]);

export function isNumericKind(kind: ParameterKind): kind is NumericKind {
  return numericKinds.has(kind);
}

export interface Option {
  value: string;
  label: string;
}

/** Choices of a choice parameter, or the materials of a material parameter, as value/label pairs. */
export function optionsOf(
  spec: ParameterSpecView,
  materialNames: Readonly<Record<string, string>> = {},
): Option[] {
  if (spec.kind === "choice") {
    return (spec.choices ?? []).map((c) => (typeof c === "string" ? { value: c, label: c } : c));
  }
  if (spec.kind === "material") {
    return (spec.materials ?? []).map((m) =>
      typeof m === "string" ? { value: m, label: materialNames[m] ?? m } : { value: m.key, label: m.name },
    );
  }
  return [];
}

/** The parameters in their groups, in the order the template lists them (a group appears where its first parameter does). */
export function groupParameters(
  specs: readonly ParameterSpecView[],
): Array<{ name: string; parameters: ParameterSpecView[] }> {
  const groups: Array<{ name: string; parameters: ParameterSpecView[] }> = [];
  const byName = new Map<string, ParameterSpecView[]>();
  for (const spec of specs) {
    const name = spec.group ?? "Other settings";
    let list = byName.get(name);
    if (!list) {
      list = [];
      byName.set(name, list);
      groups.push({ name, parameters: list });
    }
    list.push(spec);
  }
  return groups;
}
