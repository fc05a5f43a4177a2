import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { SchoolClass } from "./school-class";
import type { User } from "./user";

/** An invitation to join a class, sent to an e-mail address; only a SHA-256 hash of its token is kept. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare classId: ForeignKey<SchoolClass["id"]>;
  declare email: string;
  declare name: CreationOptional<string | null>;
  declare tokenHash: string;
  declare invitedBy: ForeignKey<User["id"]> | null;
  declare acceptedBy: CreationOptional<ForeignKey<User["id"]> | null>;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.STRING(254), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "invitations", modelName: "Invitation" },
    );
  }
}
