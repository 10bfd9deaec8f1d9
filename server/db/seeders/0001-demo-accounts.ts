import { Op } from "sequelize";
import type { Database } from "../index";
import type { MigrationModule } from "../migrator";
import { hashPassword } from "@server/modules/auth/passwords";
import { demoAccounts } from "./demo-accounts";

/** One demo account per role (see demo-accounts.ts). Skips any e-mail that already has an account. */
export function demoAccountsSeeder(db: Database): MigrationModule {
  const { User } = db.models;
  return {
    name: "0001-demo-accounts",
    up: async () => {
      for (const a of demoAccounts) {
        if (await User.findOne({ where: { email: a.email } })) continue;
        await User.create({
          email: a.email,
          displayName: a.displayName,
          role: a.role,
          passwordHash: await hashPassword(a.password),
        });
      }
    },
    down: async () => {
      await User.destroy({ where: { email: { [Op.in]: demoAccounts.map((a) => a.email) } } });
    },
  };
}
