import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client";

/** One published template as `GET /api/templates` lists it. */
export const templateSummarySchema = z.object({
  id: z.string(),
  version: z.string(),
  name: z.string(),
  family: z.string(),
  summary: z.string(),
});
export type TemplateSummary = z.infer<typeof templateSummarySchema>;

/** The route may answer `{ templates: [...] }` or a bare list; both are accepted. */
const listSchema = z.union([
  z.object({ templates: z.array(templateSummarySchema) }).transform((r) => r.templates),
  z.array(templateSummarySchema),
]);

export async function getTemplates(signal?: AbortSignal): Promise<TemplateSummary[]> {
  return api.get("/api/templates", { schema: listSchema, signal });
}

export const catalogueKeys = {
  all: ["templates"] as const,
  list: () => ["templates", "list"] as const,
};

export const templatesQueryOptions = () =>
  queryOptions({
    queryKey: catalogueKeys.list(),
    queryFn: ({ signal }) => getTemplates(signal),
    staleTime: 5 * 60_000,
  });

export function useTemplates() {
  return useQuery(templatesQueryOptions());
}
