import type { PublicUser } from "@/shared/auth";

/** The API view of a user (a database row or `req.user`): never the password hash. */
export function toPublicUser(u: Express.User): PublicUser {
  return {
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    createdAt: u.createdAt.toISOString(),
  };
}

/** Narrows a database row to what `req.user` holds. */
export function toSessionUser(u: Express.User): Express.User {
  return { id: u.id, email: u.email, displayName: u.displayName, role: u.role, createdAt: u.createdAt };
}
