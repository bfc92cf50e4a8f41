import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { OutboxKind, OutboxStatus } from "@/lib/domain/outbox";
import type { Team } from "./team";

/** One e-mail to deliver, written in the same transaction as the change that caused it. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]> | null;
  declare kind: OutboxKind;
  declare toEmail: string;
  declare subject: string;
  declare html: string;
  declare text: string;
  declare icalMethod: "REQUEST" | "CANCEL" | null;
  declare icalContent: string | null;
  /** Same key twice → the second enqueue is skipped. */
  declare dedupeKey: string | null;
  declare status: CreationOptional<OutboxStatus>;
  declare attempts: CreationOptional<number>;
  declare maxAttempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  /** Set while one worker holds the row; another may take it over only after leaseUntil. */
  declare leaseToken: string | null;
  declare leaseUntil: Date | null;
  declare lastError: string | null;
  declare messageId: string | null;
  declare sentAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare static associations: {
    team: Association<OutboxMessage, Team>;
  };

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        toEmail: { type: DataTypes.STRING(254), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        icalMethod: { type: DataTypes.STRING(10), allowNull: true },
        icalContent: { type: DataTypes.TEXT, allowNull: true },
        dedupeKey: { type: DataTypes.STRING(200), allowNull: true, unique: true },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "pending" },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        maxAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
        leaseToken: { type: DataTypes.STRING(40), allowNull: true },
        leaseUntil: { type: DataTypes.DATE, allowNull: true },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        messageId: { type: DataTypes.STRING(200), allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "outbox_messages", underscored: true },
    );
  }
}
