import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { sharedDesignResponseSchema, type SharedDesign } from "@/shared/designs";
import { designKeys } from "./keys";

/** `GET /api/shared/:token` (public): the read-only view of a shared design. */
export async function getSharedDesign(token: string, signal?: AbortSignal): Promise<SharedDesign> {
  return (
    await api.get(`/api/shared/${encodeURIComponent(token)}`, { schema: sharedDesignResponseSchema, signal })
  ).design;
}

export const sharedDesignQueryOptions = (token: string) =>
  queryOptions({
    queryKey: designKeys.shared(token),
    queryFn: ({ signal }) => getSharedDesign(token, signal),
  });

export function useSharedDesign(token: string) {
  return useQuery(sharedDesignQueryOptions(token));
}
