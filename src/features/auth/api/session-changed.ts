import type { QueryClient } from "@tanstack/react-query";
import { resetCsrfToken } from "@/lib/api-client";
import { queryKeys } from "@/lib/query-keys";
import type { PublicUser } from "@/shared/auth";

/**
 * After sign-in, registration or sign-out the session is a different one: its CSRF token is stale and
 * every cached answer that depended on who was signed in must go.
 */
export function sessionChanged(queryClient: QueryClient, user: PublicUser | null): void {
  resetCsrfToken();
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== queryKeys.auth.all[0] });
  queryClient.setQueryData(queryKeys.auth.me(), user);
}
