import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";

/**
 * Sign-in sessions, read and written by connect-session-sequelize (it is handed this model, so its own
 * `sync()` is never used; migration 0002 makes the table). Column names are the ones the store expects.
 */
export function defineSession(sequelize: Sequelize) {
  class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
    declare sid: string;
    declare expires: Date | null;
    declare data: string | null;
    declare createdAt: CreationOptional<Date>;
    declare updatedAt: CreationOptional<Date>;
  }
  Session.init(
    {
      sid: { type: DataTypes.STRING(64), primaryKey: true },
      expires: { type: DataTypes.DATE, allowNull: true },
      data: { type: DataTypes.TEXT("medium"), allowNull: true },
      createdAt: { type: DataTypes.DATE, field: "created_at" },
      updatedAt: { type: DataTypes.DATE, field: "updated_at" },
    },
    { sequelize, modelName: "Session", tableName: "sessions" },
  );
  return Session;
}

export type SessionModel = ReturnType<typeof defineSession>;
