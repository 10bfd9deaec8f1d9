import { useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { viseListResponseSchema, type Vise } from "@/shared/profiles";

/**
 * `GET /api/vises` for "fill from my vise". The key is the one the profiles pages use
 * (["profiles", "vises"], same data: the user's vises by name), so both share one cache entry and a
 * vise added there shows here at once.
 */
export const visesKey = ["profiles", "vises"] as const;

export async function getMyVises(signal?: AbortSignal): Promise<Vise[]> {
  return (await api.get("/api/vises", { schema: viseListResponseSchema, signal })).vises;
}

export function useMyVises(enabled: boolean) {
  return useQuery({ queryKey: visesKey, queryFn: ({ signal }) => getMyVises(signal), enabled });
}
