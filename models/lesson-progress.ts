import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { User } from "./user";

export const PROGRESS_STATUSES = ["opened", "completed", "practised"] as const;
export type ProgressStatus = (typeof PROGRESS_STATUSES)[number];

export class LessonProgress extends Model<InferAttributes<LessonProgress>, InferCreationAttributes<LessonProgress>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  declare lessonSlug: string;
  declare status: ProgressStatus;
  declare openedAt: Date;
  declare completedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    LessonProgress.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        lessonSlug: { type: DataTypes.STRING(80), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        openedAt: { type: DataTypes.DATE, allowNull: false },
        completedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "lesson_progress", modelName: "LessonProgress" },
    );
  }
}
