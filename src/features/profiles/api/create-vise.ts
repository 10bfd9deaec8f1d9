import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { viseResponseSchema, type CreateViseBody, type Vise } from "@/shared/profiles";
import { profileKeys } from "./keys";

/** `POST /api/vises`. */
export async function createVise(body: CreateViseBody): Promise<Vise> {
  return (await api.post("/api/vises", { body, schema: viseResponseSchema })).vise;
}

export function useCreateVise() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVise,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: profileKeys.vises() }),
  });
}
