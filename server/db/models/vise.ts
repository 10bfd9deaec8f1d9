import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/** A vise profile (table `vises`, migration 0010). Sizes in millimetres. */
export function defineVise(sequelize: Sequelize) {
  class Vise extends Model<InferAttributes<Vise>, InferCreationAttributes<Vise>> {
    declare id: CreationOptional<number>;
    declare ownerId: number;
    declare name: string;
    declare jawWidthMm: number;
    declare jawHeightMm: number;
    declare jawThicknessMm: number;
    declare maxOpeningMm: number;
    declare createdAt: CreationOptional<Date>;
    declare updatedAt: CreationOptional<Date>;
  }
  Vise.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "owner_id" },
      name: { type: DataTypes.STRING(80), allowNull: false },
      jawWidthMm: { type: DataTypes.DOUBLE, allowNull: false, field: "jaw_width_mm" },
      jawHeightMm: { type: DataTypes.DOUBLE, allowNull: false, field: "jaw_height_mm" },
      jawThicknessMm: { type: DataTypes.DOUBLE, allowNull: false, field: "jaw_thickness_mm" },
      maxOpeningMm: { type: DataTypes.DOUBLE, allowNull: false, field: "max_opening_mm" },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      updatedAt: { type: DataTypes.DATE, field: "updated_at" },
    },
    { sequelize, modelName: "Vise", tableName: "vises" },
  );
  return Vise;
}

export type ViseModel = ReturnType<typeof defineVise>;
export type ViseRecord = InstanceType<ViseModel>;
