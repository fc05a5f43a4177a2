import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Assignment } from "./assignment";
import type { User } from "./user";

/** An accommodation for one student: a later due date and/or extra attempts per problem. */
export class AssignmentExtension extends Model<InferAttributes<AssignmentExtension>, InferCreationAttributes<AssignmentExtension>> {
  declare id: CreationOptional<number>;
  declare assignmentId: ForeignKey<Assignment["id"]>;
  declare studentId: ForeignKey<User["id"]>;
  declare dueAt: CreationOptional<Date | null>;
  declare extraAttempts: CreationOptional<number>;
  declare note: CreationOptional<string | null>;
  declare grantedBy: ForeignKey<User["id"]> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AssignmentExtension.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        dueAt: { type: DataTypes.DATE, allowNull: true },
        extraAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        note: { type: DataTypes.STRING(300), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "assignment_extensions", modelName: "AssignmentExtension" },
    );
  }
}
