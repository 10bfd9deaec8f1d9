import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { machineResponseSchema, type CreateMachineBody, type Machine } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `POST /api/machines`. */
export async function createMachine(body: CreateMachineBody): Promise<Machine> {
  return (await api.post("/api/machines", { body, schema: machineResponseSchema })).machine;
}

export function useCreateMachine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMachine,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: profileKeys.machines() }),
  });
}
