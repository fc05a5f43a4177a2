import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { AssignmentItem } from "./assignment-item";
import type { User } from "./user";

export const PROBLEM_STATUSES = ["open", "solved", "failed"] as const;
export type ProblemStatus = (typeof PROBLEM_STATUSES)[number];

export class PracticeProblem extends Model<InferAttributes<PracticeProblem>, InferCreationAttributes<PracticeProblem>> {
  declare id: string;
  declare userId: ForeignKey<User["id"]> | null;
  declare visitorId: string | null;
  /** Set when this problem is one student's variant of an assignment item. */
  declare assignmentItemId: CreationOptional<ForeignKey<AssignmentItem["id"]> | null>;
  declare variant: CreationOptional<number | null>;
  declare kind: string;
  declare level: number;
  declare seed: number;
  declare attemptsAllowed: number;
  declare attemptsUsed: CreationOptional<number>;
  declare status: CreationOptional<ProblemStatus>;
  declare finishedAt: CreationOptional<Date | null>;
  /** The time of the newest try (written with it), so scores need not read every try for it. */
  declare lastTryAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PracticeProblem.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        visitorId: { type: DataTypes.STRING(36), allowNull: true },
        variant: { type: DataTypes.INTEGER, allowNull: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        level: { type: DataTypes.INTEGER, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        attemptsAllowed: { type: DataTypes.INTEGER, allowNull: false },
        attemptsUsed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "open" },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        lastTryAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "practice_problems", modelName: "PracticeProblem" },
    );
  }
}
