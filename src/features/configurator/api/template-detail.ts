import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { FAMILIES } from "@/engine/template/schema";
import { api } from "@/lib/api-client";
import { parameterSpecSchema } from "../model/parameter-spec";
import { configuratorKeys } from "./keys";

/**
 * `GET /api/templates/:id`: everything the form needs. Read leniently (extra fields are kept out of the
 * way), so the form is built from the template's own parameter list and nothing else.
 */
export const templateDetailSchema = z.object({
  id: z.string(),
  version: z.string(),
  name: z.string(),
  family: z.enum(FAMILIES).or(z.string()),
  summary: z.string(),
  units: z.enum(["mm", "in"]),
  parameters: z.array(parameterSpecSchema),
  /** Material key → shop name, when the server sends it. */
  materialNames: z.record(z.string(), z.string()).optional(),
  cautions: z.array(z.string()).optional(),
  /** The template's analyses, for their labels. */
  analyses: z
    .array(z.object({ id: z.string(), label: z.string().optional(), calculator: z.string().optional() }))
    .optional(),
});
export type TemplateDetail = z.infer<typeof templateDetailSchema>;

/** The route may wrap the template (`{ template }`) or send it bare; both are accepted. */
const responseSchema = z.union([
  z.object({ template: templateDetailSchema }).transform((r) => r.template),
  templateDetailSchema,
]);

export async function getTemplate(id: string, signal?: AbortSignal): Promise<TemplateDetail> {
  return api.get(`/api/templates/${encodeURIComponent(id)}`, { schema: responseSchema, signal });
}

export const templateDetailQueryOptions = (id: string) =>
  queryOptions({
    queryKey: configuratorKeys.detail(id),
    queryFn: ({ signal }) => getTemplate(id, signal),
    staleTime: 5 * 60_000,
  });

export function useTemplateDetail(id: string) {
  return useQuery(templateDetailQueryOptions(id));
}
