import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { User } from "./user";

export class SavedLayout extends Model<InferAttributes<SavedLayout>, InferCreationAttributes<SavedLayout>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User["id"]>;
  declare kind: string;
  declare name: string;
  declare params: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SavedLayout.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(32), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        params: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "saved_layouts", modelName: "SavedLayout" },
    );
  }
}
