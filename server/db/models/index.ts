import type { Sequelize } from "sequelize";
import { defineUser } from "./user";
import { defineUserToken } from "./user-token";
import { defineSession } from "./session";
import { defineVise } from "./vise";
import { defineMachine } from "./machine";
import { defineDesign } from "./design";
import { defineShareLink } from "./share-link";

/** Defines every model on `sequelize` and wires their associations. Add new models here. */
export function defineModels(sequelize: Sequelize) {
  const User = defineUser(sequelize);
  const UserToken = defineUserToken(sequelize);
  const Session = defineSession(sequelize);
  User.hasMany(UserToken, { foreignKey: "userId", onDelete: "CASCADE" });
  UserToken.belongsTo(User, { foreignKey: "userId" });
  const Vise = defineVise(sequelize);
  const Machine = defineMachine(sequelize);
  const Design = defineDesign(sequelize);
  const ShareLink = defineShareLink(sequelize);
  Design.hasMany(ShareLink, { foreignKey: "designId", as: "shareLinks", onDelete: "CASCADE" });
  ShareLink.belongsTo(Design, { foreignKey: "designId", as: "design" });
  return { User, UserToken, Session, Vise, Machine, Design, ShareLink };
}

export type Models = ReturnType<typeof defineModels>;
export type { UserRecord, UserModel } from "./user";
