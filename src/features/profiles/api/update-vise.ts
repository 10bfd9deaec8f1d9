import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { viseResponseSchema, type UpdateViseBody, type Vise } from "@/shared/profiles";
import { profileKeys } from "./keys";

export interface UpdateViseInput {
  id: number;
  changes: UpdateViseBody;
}

/** `PATCH /api/vises/:id` with only the changed fields. */
export async function updateVise({ id, changes }: UpdateViseInput): Promise<Vise> {
  return (await api.patch(`/api/vises/${id}`, { body: changes, schema: viseResponseSchema })).vise;
}

export function useUpdateVise() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateVise,
    onSuccess: async (vise) => {
      queryClient.setQueryData<Vise[]>(profileKeys.vises(), (old) =>
        old?.map((v) => (v.id === vise.id ? vise : v)),
      );
      await queryClient.invalidateQueries({ queryKey: profileKeys.vises() });
    },
  });
}
