/** Client routes in one place, so links and the router cannot drift apart. */
export const paths = {
  home: "/",
  signIn: "/sign-in",
  register: "/register",
  admin: "/admin",
  camCheck: "/cam-check",
} as const;

/**
 * A `next` target taken from the URL, accepted only when it is a path on this site
 * (never `//host` or `https://…`, which would make the sign-in page an open redirect).
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return paths.home;
  return next;
}
