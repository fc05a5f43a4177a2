import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Assignment } from "./assignment";

export const TOLERANCES = ["half", "full"] as const;
export type Tolerance = (typeof TOLERANCES)[number];

/** One line of an assignment: so many problems of one kind and level, each worth `points`. */
export class AssignmentItem extends Model<InferAttributes<AssignmentItem>, InferCreationAttributes<AssignmentItem>> {
  declare id: CreationOptional<number>;
  declare assignmentId: ForeignKey<Assignment["id"]>;
  declare position: number;
  declare kind: string;
  declare level: number;
  declare problemCount: number;
  declare tolerance: CreationOptional<Tolerance>;
  declare points: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AssignmentItem.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        level: { type: DataTypes.INTEGER, allowNull: false },
        problemCount: { type: DataTypes.INTEGER, allowNull: false },
        tolerance: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "half" },
        points: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "assignment_items", modelName: "AssignmentItem" },
    );
  }
}
