import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Machine } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `DELETE /api/machines/:id` (204). */
export async function deleteMachine(id: number): Promise<void> {
  await api.delete(`/api/machines/${id}`);
}

export function useDeleteMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteMachine,
    onSuccess: async (_void, id) => {
      queryClient.setQueryData<Machine[]>(profileKeys.machines(), (old) => old?.filter((v) => v.id !== id));
      await queryClient.invalidateQueries({ queryKey: profileKeys.machines() });
    },
  });
}
