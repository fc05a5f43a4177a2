import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Assignment } from "./assignment";
import type { User } from "./user";

/**
 * One change an instructor made to a student's score on an assignment. Rows are never edited:
 * the newest per (assignment, student) is in force. Points are hundredths of a point.
 */
export class ScoreOverride extends Model<InferAttributes<ScoreOverride>, InferCreationAttributes<ScoreOverride>> {
  declare id: CreationOptional<number>;
  declare assignmentId: ForeignKey<Assignment["id"]>;
  declare studentId: ForeignKey<User["id"]>;
  declare points: number | null;
  declare excused: boolean;
  declare cleared: boolean;
  declare reason: string;
  declare fromPoints: number | null;
  declare toPoints: number | null;
  declare createdBy: ForeignKey<User["id"]> | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ScoreOverride.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        points: { type: DataTypes.INTEGER, allowNull: true },
        excused: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        cleared: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        reason: { type: DataTypes.STRING(500), allowNull: false },
        fromPoints: { type: DataTypes.INTEGER, allowNull: true },
        toPoints: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: "score_overrides", modelName: "ScoreOverride", updatedAt: false },
    );
  }
}
