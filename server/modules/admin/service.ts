import type { Role } from "@/shared/auth";
import { conflict, notFound } from "@server/lib/errors";
import type { UserRepository } from "@server/modules/auth/repository";
import { toSessionUser } from "@server/modules/auth/public-user";

/** User management for admins. */
export function adminService(users: UserRepository) {
  return {
    async listUsers(): Promise<Express.User[]> {
      return (await users.list()).map(toSessionUser);
    },

    /**
     * Changes a user's role. Refuses to take the admin role from the last admin (409), so an install can
     * never lock itself out. The admin rows are locked for the check, so two concurrent demotions cannot
     * both succeed.
     */
    async setRole(userId: number, role: Role): Promise<Express.User> {
      return users.transaction(async (t) => {
        const admins = await users.lockAdmins(t);
        const user = await users.findById(userId, t);
        if (!user) throw notFound(`There is no user with id ${userId}.`);
        if (user.role === "admin" && role !== "admin" && admins.length <= 1) {
          throw conflict("This is the last admin; make another user an admin first.", [
            { path: "role", message: "The last admin cannot lose the admin role." },
          ]);
        }
        if (user.role !== role) await users.setRole(user, role, t);
        return toSessionUser(user);
      });
    },
  };
}

export type AdminService = ReturnType<typeof adminService>;
