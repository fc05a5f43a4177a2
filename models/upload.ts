import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Assignment } from "./assignment";
import type { User } from "./user";

/** A shop photo a student attached to an assignment; the files live under the data folder. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: string;
  declare assignmentId: ForeignKey<Assignment["id"]>;
  declare studentId: ForeignKey<User["id"]>;
  declare storedName: string;
  declare thumbName: string;
  declare mime: string;
  declare bytes: number;
  declare width: number;
  declare height: number;
  declare originalName: string;
  declare comment: CreationOptional<string | null>;
  declare commentBy: CreationOptional<ForeignKey<User["id"]> | null>;
  declare commentedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Upload.init(
      {
        id: { type: DataTypes.STRING(36), primaryKey: true },
        storedName: { type: DataTypes.STRING(80), allowNull: false },
        thumbName: { type: DataTypes.STRING(80), allowNull: false },
        mime: { type: DataTypes.STRING(40), allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        originalName: { type: DataTypes.STRING(120), allowNull: false },
        comment: { type: DataTypes.STRING(1000), allowNull: true },
        commentedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "uploads", modelName: "Upload" },
    );
  }
}
