import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { viseListResponseSchema, type Vise } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `GET /api/vises`: the signed-in user's vises, by name. */
export async function getVises(signal?: AbortSignal): Promise<Vise[]> {
  return (await api.get("/api/vises", { schema: viseListResponseSchema, signal })).vises;
}

export const visesQueryOptions = () =>
  queryOptions({ queryKey: profileKeys.vises(), queryFn: ({ signal }) => getVises(signal) });

export function useVises() {
  return useQuery(visesQueryOptions());
}
