import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/**
 * A read-only share link of a design (table `share_links`, migration 0013). The token column compares
 * case-sensitively (binary collation), as base64url needs.
 */
export function defineShareLink(sequelize: Sequelize) {
  class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
    declare id: CreationOptional<number>;
    declare designId: number;
    declare token: string;
    declare createdAt: CreationOptional<Date>;
    /** Set when the owner revokes the link; a revoked link never works again. */
    declare revokedAt: CreationOptional<Date | null>;
  }
  ShareLink.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      designId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "design_id" },
      token: { type: DataTypes.STRING(64, true), allowNull: false, unique: true },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      revokedAt: { type: DataTypes.DATE, allowNull: true, field: "revoked_at" },
    },
    { sequelize, modelName: "ShareLink", tableName: "share_links", updatedAt: false },
  );
  return ShareLink;
}

export type ShareLinkModel = ReturnType<typeof defineShareLink>;
export type ShareLinkRecord = InstanceType<ShareLinkModel>;
