import type { Transaction } from "sequelize";
import type { Role } from "@/shared/auth";
import type { Models, UserRecord } from "@server/db/models";

/** Data access for users: the only code in the auth and admin areas that touches the User model. */
export function userRepository(models: Models) {
  const { User } = models;
  return {
    findById: (id: number, transaction?: Transaction) => User.findByPk(id, { transaction }),
    findByEmail: (email: string) => User.findOne({ where: { email } }),
    create: (input: { email: string; displayName: string; passwordHash: string; role: Role }) =>
      User.create(input),
    list: () => User.findAll({ order: [["id", "ASC"]] }),
    /** Locks the admin rows until the transaction ends, so two demotions cannot both pass the last-admin check. */
    lockAdmins: (transaction: Transaction) =>
      User.findAll({ where: { role: "admin" }, lock: true, transaction }),
    setRole: async (user: UserRecord, role: Role, transaction?: Transaction) => {
      user.role = role;
      await user.save({ transaction });
      return user;
    },
    setPasswordHash: async (user: UserRecord, passwordHash: string) => {
      user.passwordHash = passwordHash;
      await user.save();
      return user;
    },
    transaction: <T>(fn: (t: Transaction) => Promise<T>) => User.sequelize!.transaction(fn),
  };
}

export type UserRepository = ReturnType<typeof userRepository>;
