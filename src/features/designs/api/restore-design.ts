import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `POST /api/designs/:id/restore`: the undo of a delete, inside the undo window. */
export async function restoreDesign(id: number): Promise<Design> {
  return (await api.post(`/api/designs/${id}/restore`, { schema: designResponseSchema })).design;
}

export function useRestoreDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.all }),
  });
}
