import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Vise } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `DELETE /api/vises/:id` (204). */
export async function deleteVise(id: number): Promise<void> {
  await api.delete(`/api/vises/${id}`);
}

export function useDeleteVise() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteVise,
    onSuccess: async (_void, id) => {
      queryClient.setQueryData<Vise[]>(profileKeys.vises(), (old) => old?.filter((v) => v.id !== id));
      await queryClient.invalidateQueries({ queryKey: profileKeys.vises() });
    },
  });
}
