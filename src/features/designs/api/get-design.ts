import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `GET /api/designs/:id`: one of the signed-in user's designs (404 for anyone else's). */
export async function getDesign(id: number, signal?: AbortSignal): Promise<Design> {
  return (await api.get(`/api/designs/${id}`, { schema: designResponseSchema, signal })).design;
}

export const designQueryOptions = (id: number) =>
  queryOptions({ queryKey: designKeys.detail(id), queryFn: ({ signal }) => getDesign(id, signal) });

export function useDesign(id: number) {
  return useQuery(designQueryOptions(id));
}
