import { UniqueConstraintError } from "sequelize";
import type { RegisterBody, Role } from "@/shared/auth";
import { conflict } from "@server/lib/errors";
import { burnPasswordCheck, hashPassword, verifyPassword } from "./passwords";
import type { UserRepository } from "./repository";
import { toSessionUser } from "./public-user";

const emailTaken = () =>
  conflict("An account with this e-mail already exists.", [
    { path: "email", message: "An account with this e-mail already exists. Sign in instead." },
  ]);

/** Registration and password checks; plain arguments in, users out, typed errors thrown. */
export function authService(users: UserRepository) {
  return {
    /** Creates an account; self-registered accounts are always machinists. */
    async register(input: RegisterBody, role: Role = "machinist"): Promise<Express.User> {
      if (await users.findByEmail(input.email)) throw emailTaken();
      const passwordHash = await hashPassword(input.password);
      try {
        return toSessionUser(await users.create({ ...input, passwordHash, role }));
      } catch (err) {
        // Two registrations raced past the check above: the unique index decides.
        if (err instanceof UniqueConstraintError) throw emailTaken();
        throw err;
      }
    },

    /** The user if e-mail and password match, else null (the caller must not say which part was wrong). */
    async verifyCredentials(email: string, password: string): Promise<Express.User | null> {
      const user = await users.findByEmail(email);
      if (!user) {
        await burnPasswordCheck(password);
        return null;
      }
      return (await verifyPassword(user.passwordHash, password)) ? toSessionUser(user) : null;
    },

    async findSessionUser(id: number): Promise<Express.User | null> {
      const user = await users.findById(id);
      return user ? toSessionUser(user) : null;
    },
  };
}

export type AuthService = ReturnType<typeof authService>;
