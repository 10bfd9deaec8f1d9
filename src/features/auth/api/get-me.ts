import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { meResponseSchema, type PublicUser } from "@/shared/auth";

/** `GET /api/auth/me`: the signed-in user, or `null` for a guest. */
export async function getMe(signal?: AbortSignal): Promise<PublicUser | null> {
  const data = await api.get("/api/auth/me", { schema: meResponseSchema, signal });
  return data.user;
}

export const meQueryOptions = () =>
  queryOptions({ queryKey: queryKeys.auth.me(), queryFn: ({ signal }) => getMe(signal), staleTime: 60_000 });

export function useMe() {
  return useQuery(meQueryOptions());
}
