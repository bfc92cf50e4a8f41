import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Athlete } from "./athlete";
import type { Team } from "./team";

export const ALERT_KINDS = ["spike", "weekly_jump", "plyo_volume", "recovery", "restriction_override"] as const;
export type AlertKind = (typeof ALERT_KINDS)[number];
export const ALERT_STATUSES = ["open", "acknowledged", "resolved"] as const;
export type AlertStatus = (typeof ALERT_STATUSES)[number];
export type AlertBasis = "planned" | "actual";

/** A load flag the engine raised for one athlete and week, for the physio (and opted-in coaches) to handle. */
export class Alert extends Model<InferAttributes<Alert>, InferCreationAttributes<Alert>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare kind: AlertKind;
  declare level: "alert" | "caution" | "info";
  declare metric: string | null;
  declare value: number;
  declare threshold: number;
  /** The day the flag concerns, YYYY-MM-DD (team zone). */
  declare date: string;
  /** First day of the flag's week: the de-duplication key with athlete and kind. */
  declare weekStart: string;
  declare basis: AlertBasis;
  declare reason: string;
  declare provisional: CreationOptional<boolean>;
  /** Still raised at the last evaluation of its week. */
  declare flagged: CreationOptional<boolean>;
  declare status: CreationOptional<AlertStatus>;
  declare note: string | null;
  declare acknowledgedBy: number | null;
  declare acknowledgedAt: Date | null;
  declare resolvedBy: number | null;
  declare resolvedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Alert.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(24), allowNull: false },
        level: { type: DataTypes.STRING(10), allowNull: false },
        metric: { type: DataTypes.STRING(20), allowNull: true },
        value: { type: DataTypes.FLOAT, allowNull: false },
        threshold: { type: DataTypes.FLOAT, allowNull: false },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        weekStart: { type: DataTypes.DATEONLY, allowNull: false },
        basis: { type: DataTypes.STRING(8), allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        provisional: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        flagged: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        status: { type: DataTypes.STRING(14), allowNull: false, defaultValue: "open" },
        note: { type: DataTypes.TEXT, allowNull: true },
        acknowledgedBy: { type: DataTypes.INTEGER, allowNull: true },
        acknowledgedAt: { type: DataTypes.DATE, allowNull: true },
        resolvedBy: { type: DataTypes.INTEGER, allowNull: true },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "alerts", underscored: true },
    );
  }
}
