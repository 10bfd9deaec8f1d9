import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/**
 * Saved designs: a template configuration pinned to the template version it was saved against.
 * `parameters` is JSON text (MariaDB's JSON is LONGTEXT with a JSON_VALID check). `deleted_at` marks a
 * design deleted but still restorable (undo); the service purges it once the undo window has passed.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "designs",
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
      notes: { type: DataTypes.TEXT, allowNull: false },
      template_id: { type: DataTypes.STRING(60), allowNull: false },
      template_version: { type: DataTypes.STRING(40), allowNull: false },
      parameters: { type: DataTypes.JSON, allowNull: false },
      units: { type: DataTypes.ENUM("mm", "in"), allowNull: false, defaultValue: "mm" },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
      deleted_at: { type: DataTypes.DATE, allowNull: true },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("designs", ["owner_id", "deleted_at", "updated_at"], { name: "designs_owner_live" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("designs");
};
