import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/** Accounts. The e-mail is unique (stored lower-cased by the API); the role defaults to machinist. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "users",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false },
      display_name: { type: DataTypes.STRING(80), allowNull: false },
      password_hash: { type: DataTypes.STRING(255), allowNull: false },
      role: {
        type: DataTypes.ENUM("machinist", "designer", "reviewer", "admin"),
        allowNull: false,
        defaultValue: "machinist",
      },
      email_confirmed_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("users", ["email"], { unique: true, name: "users_email_unique" });
  await qi.addIndex("users", ["role"], { name: "users_role" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("users");
};
