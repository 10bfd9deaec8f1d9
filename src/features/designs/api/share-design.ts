import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { shareResponseSchema, type Design, type ShareLink } from "@/shared/designs";
import { designKeys } from "./keys";

/** `POST /api/designs/:id/share`: the design's read-only link (made once; asking again gives the same). */
export async function shareDesign(id: number): Promise<ShareLink> {
  return api.post(`/api/designs/${id}/share`, { schema: shareResponseSchema });
}

export function useShareDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareDesign,
    onSuccess: async (link, id) => {
      queryClient.setQueryData<Design[]>(designKeys.list(), (old) =>
        old?.map((d) => (d.id === id ? { ...d, share: link } : d)),
      );
      await queryClient.invalidateQueries({ queryKey: designKeys.all });
    },
  });
}
