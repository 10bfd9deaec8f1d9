import { DataTypes } from "sequelize";
import type { Migration } from "../migrator";

/**
 * Read-only share links of designs. The token is random (24 bytes from node:crypto, base64url) and kept
 * as is, so the owner can see and copy the link again; revoking sets `revoked_at` and the link never
 * works again. Deleting a design deletes its links.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable(
    "share_links",
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      design_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: "designs", key: "id" },
        onDelete: "CASCADE",
        onUpdate: "CASCADE",
      },
      token: { type: DataTypes.STRING(64, true), allowNull: false },
      created_at: { type: DataTypes.DATE, allowNull: false },
      revoked_at: { type: DataTypes.DATE, allowNull: true },
    },
    { charset: "utf8mb4", collate: "utf8mb4_unicode_ci" },
  );
  await qi.addIndex("share_links", ["token"], { unique: true, name: "share_links_token_unique" });
  await qi.addIndex("share_links", ["design_id", "revoked_at"], { name: "share_links_design_active" });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable("share_links");
};
