import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designListResponseSchema, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `GET /api/designs`: the signed-in user's saved designs, most recently changed first. */
export async function getDesigns(signal?: AbortSignal): Promise<Design[]> {
  return (await api.get("/api/designs", { schema: designListResponseSchema, signal })).designs;
}

export const designsQueryOptions = () =>
  queryOptions({ queryKey: designKeys.list(), queryFn: ({ signal }) => getDesigns(signal) });

export function useDesigns() {
  return useQuery(designsQueryOptions());
}
