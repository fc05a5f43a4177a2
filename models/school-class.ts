import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { User } from "./user";

/** A class as a school runs it (CARP 110, spring term); `Class` is a reserved word in TypeScript. */
export class SchoolClass extends Model<InferAttributes<SchoolClass>, InferCreationAttributes<SchoolClass>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare term: string;
  declare program: CreationOptional<string | null>;
  declare sectionCode: CreationOptional<string | null>;
  declare joinCode: string;
  declare instructorId: ForeignKey<User["id"]>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SchoolClass.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(160), allowNull: false },
        term: { type: DataTypes.STRING(60), allowNull: false },
        program: { type: DataTypes.STRING(160), allowNull: true },
        sectionCode: { type: DataTypes.STRING(20), allowNull: true },
        joinCode: { type: DataTypes.STRING(12), allowNull: false, unique: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "classes", modelName: "SchoolClass" },
    );
  }
}
