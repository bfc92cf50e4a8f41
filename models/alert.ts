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
import type { AlertBasis, AlertKind, AlertStatus } from "@/lib/domain/alerts";
import type { Athlete } from "./athlete";
import type { Team } from "./team";

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

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare athlete?: NonAttribute<Athlete>;
  declare static associations: {
    team: Association<Alert, Team>;
    athlete: Association<Alert, Athlete>;
  };

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
