import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type Design, type UpdateDesignBody } from "@/shared/designs";
import { designKeys } from "./keys";

export interface UpdateDesignInput {
  id: number;
  changes: UpdateDesignBody;
}

/** `PATCH /api/designs/:id`: rename, notes, values, or `useCurrentTemplateVersion: true` to move the pin. */
export async function updateDesign({ id, changes }: UpdateDesignInput): Promise<Design> {
  return (await api.patch(`/api/designs/${id}`, { body: changes, schema: designResponseSchema })).design;
}

export function useUpdateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDesign,
    onSuccess: async (design) => {
      queryClient.setQueryData<Design[]>(designKeys.list(), (old) =>
        old?.map((d) => (d.id === design.id ? design : d)),
      );
      await queryClient.invalidateQueries({ queryKey: designKeys.all });
    },
  });
}
