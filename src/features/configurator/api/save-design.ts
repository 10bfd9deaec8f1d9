import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { designResponseSchema, type CreateDesignBody, type Design } from "@/shared/designs";

/** `POST /api/designs`: keeps this configuration, pinned to the template's current version. */
export async function saveDesign(body: CreateDesignBody): Promise<Design> {
  return (await api.post("/api/designs", { body, schema: designResponseSchema })).design;
}

/** Saving refreshes every designs query (the saved-designs list lives under the `designs` root). */
export function useSaveDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDesign,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["designs"] }),
  });
}
