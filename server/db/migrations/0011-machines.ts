import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/**
 * Machine profiles: name, maximum spindle speed (rpm) and the unit system its owner works in on it.
 * Deleting the account deletes its machines.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "machines",
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
      max_spindle_rpm: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      units: { type: DataTypes.ENUM("mm", "in"), allowNull: false, defaultValue: "mm" },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("machines", ["owner_id", "name"], { name: "machines_owner_name" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("machines");
};
