import { queryOptions, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { userListResponseSchema, type PublicUser } from "@/shared/auth";

/** `GET /api/admin/users` (admins only), ordered by id. */
export async function getUsers(signal?: AbortSignal): Promise<PublicUser[]> {
  const data = await api.get("/api/admin/users", { schema: userListResponseSchema, signal });
  return data.users;
}

export const usersQueryOptions = () =>
  queryOptions({ queryKey: queryKeys.admin.users(), queryFn: ({ signal }) => getUsers(signal) });

export function useUsers() {
  return useQuery(usersQueryOptions());
}
