import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { roles, type Role } from "@/shared/auth";

/** Attributes of a row of `users`; the schema itself is made by migration 0001. */
export interface UserAttributes {
  id: number;
  email: string;
  displayName: string;
  passwordHash: string;
  role: Role;
  /** When the owner proved the address (null until the mail service of a later issue confirms it). */
  emailConfirmedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

/**
 * Defines the User model on one Sequelize instance. A factory (not a module-level class) so several
 * databases can be open in one process, as the fault test does.
 */
export function defineUser(sequelize: Sequelize) {
  class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> implements UserAttributes {
    declare id: CreationOptional<number>;
    declare email: string;
    declare displayName: string;
    declare passwordHash: string;
    declare role: CreationOptional<Role>;
    declare emailConfirmedAt: CreationOptional<Date | null>;
    declare createdAt: CreationOptional<Date>;
    declare updatedAt: CreationOptional<Date>;
  }
  User.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      displayName: { type: DataTypes.STRING(80), allowNull: false, field: "display_name" },
      passwordHash: { type: DataTypes.STRING(255), allowNull: false, field: "password_hash" },
      role: { type: DataTypes.ENUM(...roles), allowNull: false, defaultValue: "machinist" },
      emailConfirmedAt: { type: DataTypes.DATE, allowNull: true, field: "email_confirmed_at" },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      updatedAt: { type: DataTypes.DATE, field: "updated_at" },
    },
    { sequelize, modelName: "User", tableName: "users" },
  );
  return User;
}

export type UserModel = ReturnType<typeof defineUser>;
export type UserRecord = InstanceType<UserModel>;
