import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { DesignParameters } from "@/shared/designs";
import { unitPreferences, type UnitPreference } from "@/shared/profiles";

/**
 * A saved design (table `designs`, migration 0012). Not a Sequelize "paranoid" model on purpose: the
 * repository filters `deletedAt` itself, so restoring and purging stay explicit and visible.
 */
export function defineDesign(sequelize: Sequelize) {
  class Design extends Model<InferAttributes<Design>, InferCreationAttributes<Design>> {
    declare id: CreationOptional<number>;
    declare ownerId: number;
    declare name: string;
    declare notes: string;
    declare templateId: string;
    declare templateVersion: string;
    declare parameters: DesignParameters;
    declare units: UnitPreference;
    declare createdAt: CreationOptional<Date>;
    declare updatedAt: CreationOptional<Date>;
    declare deletedAt: CreationOptional<Date | null>;
  }
  Design.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "owner_id" },
      name: { type: DataTypes.STRING(80), allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false },
      templateId: { type: DataTypes.STRING(60), allowNull: false, field: "template_id" },
      templateVersion: { type: DataTypes.STRING(40), allowNull: false, field: "template_version" },
      parameters: { type: DataTypes.JSON, allowNull: false },
      units: { type: DataTypes.ENUM(...unitPreferences), allowNull: false },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      updatedAt: { type: DataTypes.DATE, field: "updated_at" },
      deletedAt: { type: DataTypes.DATE, allowNull: true, field: "deleted_at" },
    },
    { sequelize, modelName: "Design", tableName: "designs" },
  );
  return Design;
}

export type DesignModel = ReturnType<typeof defineDesign>;
export type DesignRecord = InstanceType<DesignModel>;
