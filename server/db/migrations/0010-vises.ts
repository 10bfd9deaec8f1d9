import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/**
 * Vise profiles ("my vises"): one row per vise a user owns. Sizes are millimetres (DOUBLE, so the API
 * gives back exactly the number it was sent). Deleting the account deletes its vises.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "vises",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      owner_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "users", key: "id" },
        onDelete: "CASCADE",
        onUpdate: "CASCADE",
      },
      name: { type: DataTypes.STRING(80), allowNull: false },
      jaw_width_mm: { type: DataTypes.DOUBLE, allowNull: false },
      jaw_height_mm: { type: DataTypes.DOUBLE, allowNull: false },
      jaw_thickness_mm: { type: DataTypes.DOUBLE, allowNull: false },
      max_opening_mm: { type: DataTypes.DOUBLE, allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("vises", ["owner_id", "name"], { name: "vises_owner_name" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("vises");
};
