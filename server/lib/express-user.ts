import type { Role } from "@/shared/auth";

/**
 * What `req.user` holds once passport has loaded the signed-in user from the database
 * (fresh on every request, so a role change takes effect at once). Never the password hash.
 */
declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: number;
      email: string;
      displayName: string;
      role: Role;
      createdAt: Date;
    }
  }
}

export {};
