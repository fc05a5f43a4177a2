import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SchoolClass } from "./school-class";
import type { User } from "./user";

/** A co-instructor of a class; the lead instructor is `classes.instructor_id`. */
export class ClassInstructor extends Model<InferAttributes<ClassInstructor>, InferCreationAttributes<ClassInstructor>> {
  declare id: CreationOptional<number>;
  declare classId: ForeignKey<SchoolClass["id"]>;
  declare userId: ForeignKey<User["id"]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ClassInstructor.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "class_instructors", modelName: "ClassInstructor" },
    );
  }
}
