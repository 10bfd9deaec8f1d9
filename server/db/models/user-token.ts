import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/**
 * One-time tokens mailed to a user: password reset and e-mail confirmation. The table is designed now
 * (migration 0003); the routes that issue and redeem tokens come with the mail service of a later issue.
 * Only a SHA-256 hash of the token is stored, so a copy of the database cannot be used to reset passwords.
 */
export const tokenPurposes = ["password_reset", "email_confirmation"] as const;
export type TokenPurpose = (typeof tokenPurposes)[number];

export function defineUserToken(sequelize: Sequelize) {
  class UserToken extends Model<InferAttributes<UserToken>, InferCreationAttributes<UserToken>> {
    declare id: CreationOptional<number>;
    declare userId: number;
    declare purpose: TokenPurpose;
    /** Hex SHA-256 of the token sent by mail. */
    declare tokenHash: string;
    declare expiresAt: Date;
    /** Set when redeemed; a used token never works again. */
    declare usedAt: CreationOptional<Date | null>;
    declare createdAt: CreationOptional<Date>;
  }
  UserToken.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "user_id" },
      purpose: { type: DataTypes.ENUM(...tokenPurposes), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true, field: "token_hash" },
      expiresAt: { type: DataTypes.DATE, allowNull: false, field: "expires_at" },
      usedAt: { type: DataTypes.DATE, allowNull: true, field: "used_at" },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
    },
    { sequelize, modelName: "UserToken", tableName: "user_tokens", updatedAt: false },
  );
  return UserToken;
}

export type UserTokenModel = ReturnType<typeof defineUserToken>;
