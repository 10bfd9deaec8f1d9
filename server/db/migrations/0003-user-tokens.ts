import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/**
 * One-time tokens for password reset and e-mail confirmation (designed now; the routes come with the
 * mail service). Only the SHA-256 of a token is kept; deleting a user deletes their tokens.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "user_tokens",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
        onUpdate: "CASCADE",
      },
      purpose: { type: DataTypes.ENUM("password_reset", "email_confirmation"), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("user_tokens", ["token_hash"], { unique: true, name: "user_tokens_hash_unique" });
  await qi.addIndex("user_tokens", ["user_id", "purpose"], { name: "user_tokens_user_purpose" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("user_tokens");
};
