import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SchoolClass } from "./school-class";
import type { User } from "./user";

export const ENROLLMENT_STATUSES = ["invited", "active", "removed"] as const;
export type EnrollmentStatus = (typeof ENROLLMENT_STATUSES)[number];

export class Enrollment extends Model<InferAttributes<Enrollment>, InferCreationAttributes<Enrollment>> {
  declare id: CreationOptional<number>;
  declare classId: ForeignKey<SchoolClass["id"]>;
  declare studentId: ForeignKey<User["id"]>;
  declare status: CreationOptional<EnrollmentStatus>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Enrollment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "active" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "enrollments", modelName: "Enrollment" },
    );
  }
}
