import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { sessionChanged } from "./session-changed";

/** `POST /api/auth/logout`: ends the session. */
export async function signOut(): Promise<void> {
  await api.post("/api/auth/logout");
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signOut, onSuccess: () => sessionChanged(queryClient, null) });
}
