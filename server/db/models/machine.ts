import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { unitPreferences, type UnitPreference } from "@/shared/profiles";

/** A machine profile (table `machines`, migration 0011). */
export function defineMachine(sequelize: Sequelize) {
  class Machine extends Model<InferAttributes<Machine>, InferCreationAttributes<Machine>> {
    declare id: CreationOptional<number>;
    declare ownerId: number;
    declare name: string;
    declare maxSpindleRpm: number;
    declare units: UnitPreference;
    declare createdAt: CreationOptional<Date>;
    declare updatedAt: CreationOptional<Date>;
  }
  Machine.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "owner_id" },
      name: { type: DataTypes.STRING(80), allowNull: false },
      maxSpindleRpm: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, field: "max_spindle_rpm" },
      units: { type: DataTypes.ENUM(...unitPreferences), allowNull: false },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      updatedAt: { type: DataTypes.DATE, field: "updated_at" },
    },
    { sequelize, modelName: "Machine", tableName: "machines" },
  );
  return Machine;
}

export type MachineModel = ReturnType<typeof defineMachine>;
export type MachineRecord = InstanceType<MachineModel>;
