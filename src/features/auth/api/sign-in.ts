import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { userResponseSchema, type LoginBody, type PublicUser } from "@/shared/auth";
import { sessionChanged } from "./session-changed";

/** `POST /api/auth/login`. Wrong credentials answer 401 `invalid_credentials`; too many tries 429. */
export async function signIn(body: LoginBody): Promise<PublicUser> {
  const data = await api.post("/api/auth/login", { body, schema: userResponseSchema });
  return data.user;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signIn, onSuccess: (user) => sessionChanged(queryClient, user) });
}
