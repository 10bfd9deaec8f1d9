import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import { userResponseSchema, type PublicUser, type Role } from "@/shared/auth";

export interface SetRoleInput {
  userId: number;
  role: Role;
}

/** `PATCH /api/admin/users/:id/role`; the server refuses (409) to demote the last admin. */
export async function setRole({ userId, role }: SetRoleInput): Promise<PublicUser> {
  const data = await api.patch(`/api/admin/users/${userId}/role`, {
    body: { role },
    schema: userResponseSchema,
  });
  return data.user;
}

export function useSetRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setRole,
    onSuccess: async (user) => {
      queryClient.setQueryData<PublicUser[]>(queryKeys.admin.users(), (old) =>
        old?.map((u) => (u.id === user.id ? user : u)),
      );
      // An admin may have changed their own role: who-am-I must be asked again.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: queryKeys.admin.users() }),
        queryClient.invalidateQueries({ queryKey: queryKeys.auth.me() }),
      ]);
    },
  });
}
