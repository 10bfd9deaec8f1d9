import type { Sequelize } from "sequelize";
import { defineUser } from "./user";
import { defineUserToken } from "./user-token";
import { defineSession } from "./session";

/** Defines every model on `sequelize` and wires their associations. Add new models here. */
export function defineModels(sequelize: Sequelize) {
  const User = defineUser(sequelize);
  const UserToken = defineUserToken(sequelize);
  const Session = defineSession(sequelize);
  User.hasMany(UserToken, { foreignKey: "userId", onDelete: "CASCADE" });
  UserToken.belongsTo(User, { foreignKey: "userId" });
  return { User, UserToken, Session };
}

export type Models = ReturnType<typeof defineModels>;
export type { UserRecord, UserModel } from "./user";
