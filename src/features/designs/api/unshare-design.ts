import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import type { Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `DELETE /api/designs/:id/share`: revokes the link; it never works again. */
export async function unshareDesign(id: number): Promise<void> {
  await api.delete(`/api/designs/${id}/share`);
}

export function useUnshareDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: unshareDesign,
    onSuccess: async (_void, id) => {
      queryClient.setQueryData<Design[]>(designKeys.list(), (old) =>
        old?.map((d) => (d.id === id ? { ...d, share: null } : d)),
      );
      await queryClient.invalidateQueries({ queryKey: designKeys.all });
    },
  });
}
