import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { machineResponseSchema, type UpdateMachineBody, type Machine } from "@/shared/profiles";
import { profileKeys } from "./keys";

export interface UpdateMachineInput {
  id: number;
  changes: UpdateMachineBody;
}

/** `PATCH /api/machines/:id` with only the changed fields. */
export async function updateMachine({ id, changes }: UpdateMachineInput): Promise<Machine> {
  return (await api.patch(`/api/machines/${id}`, { body: changes, schema: machineResponseSchema })).machine;
}

export function useUpdateMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMachine,
    onSuccess: async (machine) => {
      queryClient.setQueryData<Machine[]>(profileKeys.machines(), (old) =>
        old?.map((v) => (v.id === machine.id ? machine : v)),
      );
      await queryClient.invalidateQueries({ queryKey: profileKeys.machines() });
    },
  });
}
