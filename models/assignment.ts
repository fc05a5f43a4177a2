import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SchoolClass } from "./school-class";
import type { User } from "./user";

export const ASSIGNMENT_STATUSES = ["draft", "published"] as const;
export type AssignmentStatus = (typeof ASSIGNMENT_STATUSES)[number];
export const LATE_POLICIES = ["none", "until", "penalty"] as const;
export type LatePolicy = (typeof LATE_POLICIES)[number];
export const REVEAL_RULES = ["when-final", "after-due"] as const;
export type RevealRule = (typeof REVEAL_RULES)[number];

export class Assignment extends Model<InferAttributes<Assignment>, InferCreationAttributes<Assignment>> {
  declare id: CreationOptional<number>;
  declare classId: ForeignKey<SchoolClass["id"]>;
  declare title: string;
  declare instructions: CreationOptional<string>;
  declare opensAt: Date;
  declare dueAt: Date;
  declare latePolicy: CreationOptional<LatePolicy>;
  declare lateUntil: CreationOptional<Date | null>;
  declare latePenaltyPercent: CreationOptional<number | null>;
  declare attemptsAllowed: CreationOptional<number>;
  declare reveal: CreationOptional<RevealRule>;
  declare status: CreationOptional<AssignmentStatus>;
  declare publishedAt: CreationOptional<Date | null>;
  declare createdBy: ForeignKey<User["id"]> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Assignment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        title: { type: DataTypes.STRING(160), allowNull: false },
        instructions: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        opensAt: { type: DataTypes.DATE, allowNull: false },
        dueAt: { type: DataTypes.DATE, allowNull: false },
        latePolicy: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "none" },
        lateUntil: { type: DataTypes.DATE, allowNull: true },
        latePenaltyPercent: { type: DataTypes.INTEGER, allowNull: true },
        attemptsAllowed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
        reveal: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "when-final" },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "draft" },
        publishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "assignments", modelName: "Assignment" },
    );
  }
}
