import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { userResponseSchema, type PublicUser, type RegisterBody } from "@/shared/auth";
import { sessionChanged } from "./session-changed";

/** `POST /api/auth/register`: creates a machinist account and signs it in. */
export async function register(body: RegisterBody): Promise<PublicUser> {
  const data = await api.post("/api/auth/register", { body, schema: userResponseSchema });
  return data.user;
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: register, onSuccess: (user) => sessionChanged(queryClient, user) });
}
