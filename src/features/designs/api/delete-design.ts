import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { deleteDesignResponseSchema, type DeleteDesignResponse, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `DELETE /api/designs/:id`: hides the design; it can be restored until `restoreUntil`. */
export async function deleteDesign(id: number): Promise<DeleteDesignResponse["deleted"]> {
  return (await api.delete(`/api/designs/${id}`, { schema: deleteDesignResponseSchema })).deleted;
}

export function useDeleteDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDesign,
    onSuccess: async (_deleted, id) => {
      queryClient.setQueryData<Design[]>(designKeys.list(), (old) => old?.filter((d) => d.id !== id));
      await queryClient.invalidateQueries({ queryKey: designKeys.all });
    },
  });
}
