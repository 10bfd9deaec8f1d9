import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type CreateDesignBody, type Design } from "@/shared/designs";
import { designKeys } from "./keys";

/** `POST /api/designs`: saves a configuration, pinned by the server to the template's current version. */
export async function createDesign(body: CreateDesignBody): Promise<Design> {
  return (await api.post("/api/designs", { body, schema: designResponseSchema })).design;
}

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.all }),
  });
}
