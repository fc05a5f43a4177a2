import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { PracticeProblem } from "./practice-problem";
import type { AssignmentItem } from "./assignment-item";
import type { User } from "./user";

export class Attempt extends Model<InferAttributes<Attempt>, InferCreationAttributes<Attempt>> {
  declare id: CreationOptional<number>;
  declare problemId: ForeignKey<PracticeProblem["id"]>;
  declare userId: ForeignKey<User["id"]> | null;
  declare assignmentItemId: CreationOptional<ForeignKey<AssignmentItem["id"]> | null>;
  declare kind: string;
  declare level: number;
  declare seed: number;
  declare submission: number;
  declare part: string;
  declare raw: string;
  declare value: string;
  declare expected: string;
  declare verdict: string;
  declare pattern: string | null;
  declare timeMs: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Attempt.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        level: { type: DataTypes.INTEGER, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        submission: { type: DataTypes.INTEGER, allowNull: false },
        part: { type: DataTypes.STRING(40), allowNull: false },
        raw: { type: DataTypes.STRING(80), allowNull: false },
        value: { type: DataTypes.STRING(80), allowNull: false },
        expected: { type: DataTypes.STRING(80), allowNull: false },
        verdict: { type: DataTypes.STRING(12), allowNull: false },
        pattern: { type: DataTypes.STRING(40), allowNull: true },
        timeMs: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      // Attempts are a ledger: written once, never updated.
      { sequelize, tableName: "attempts", modelName: "Attempt", updatedAt: false },
    );
  }
}
