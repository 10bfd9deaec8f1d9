import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/** Sign-in sessions for connect-session-sequelize (columns as the store expects; see models/session.ts). */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "sessions",
    {
      sid: { type: DataTypes.STRING(64), primaryKey: true },
      expires: { type: DataTypes.DATE, allowNull: true },
      data: { type: DataTypes.TEXT("medium"), allowNull: true },
      created_at: { type: DataTypes.DATE, allowNull: false },
      updated_at: { type: DataTypes.DATE, allowNull: false },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  // The store deletes expired rows every 15 minutes by this column.
  await qi.addIndex("sessions", ["expires"], { name: "sessions_expires" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("sessions");
};
