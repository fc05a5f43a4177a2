import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";

export const OUTBOX_STATUSES = ["pending", "sending", "sent", "failed"] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/** One e-mail waiting to go, or gone; see lib/mail/outbox.ts. */
export class EmailOutbox extends Model<InferAttributes<EmailOutbox>, InferCreationAttributes<EmailOutbox>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare text: string;
  declare html: string;
  declare dedupeKey: CreationOptional<string | null>;
  declare status: CreationOptional<OutboxStatus>;
  declare tries: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare nextTryAt: Date;
  declare claimedAt: CreationOptional<Date | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    EmailOutbox.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(200), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: false },
        dedupeKey: { type: DataTypes.STRING(160), allowNull: true, unique: true },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "pending" },
        tries: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastError: { type: DataTypes.STRING(500), allowNull: true },
        nextTryAt: { type: DataTypes.DATE, allowNull: false },
        claimedAt: { type: DataTypes.DATE, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "email_outbox", modelName: "EmailOutbox" },
    );
  }
}
