import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `POST /api/designs/:id/duplicate`: a copy on the same pinned version, named "Copy of …", never shared. */
export async function duplicateDesign(id: number): Promise<Design> {
  return (await api.post(`/api/designs/${id}/duplicate`, { schema: designResponseSchema })).design;
}

export function useDuplicateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.all }),
  });
}
