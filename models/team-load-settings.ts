import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { Team } from "./team";

/** Per-team thresholds the load engine reads; defaults and sources: lib/load/README.md. */
export class TeamLoadSettings extends Model<
  InferAttributes<TeamLoadSettings>,
  InferCreationAttributes<TeamLoadSettings>
> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare hsrSpeedMs: CreationOptional<number>;
  declare nearMaxPct: CreationOptional<number>;
  declare acwrMethod: CreationOptional<"ewma" | "rolling_coupled" | "rolling_uncoupled">;
  declare acwrMetric: CreationOptional<string>;
  declare spikeRatio: CreationOptional<number>;
  declare risingRatio: CreationOptional<number>;
  declare lowRatio: CreationOptional<number>;
  declare weeklyChangeLimitPct: CreationOptional<number>;
  declare recoveryHours: CreationOptional<number>;
  declare speedZones: CreationOptional<string>;
  declare hsrPct: CreationOptional<number>;
  declare sprintSpeedMs: CreationOptional<number>;
  declare maximalPct: CreationOptional<number>;
  /** JSON array text of RecoveryWork values. */
  declare recoveryWork: CreationOptional<string>;
  declare missingLogs: CreationOptional<string>;
  declare monotonyLimit: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    TeamLoadSettings.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        hsrSpeedMs: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 5.5 },
        nearMaxPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 90 },
        acwrMethod: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "ewma" },
        acwrMetric: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "srpe" },
        spikeRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 1.5 },
        risingRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 1.3 },
        lowRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0.8 },
        weeklyChangeLimitPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 15 },
        recoveryHours: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 48 },
        // Migration 009: the sprint-specific model's team choices.
        speedZones: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "absolute" },
        hsrPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 75 },
        sprintSpeedMs: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 7 },
        maximalPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 95 },
        recoveryWork: {
          type: DataTypes.TEXT,
          allowNull: false,
          defaultValue: '["max_velocity","max_acceleration","speed_endurance","high_plyo"]',
        },
        missingLogs: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "estimate" },
        monotonyLimit: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 2 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "team_load_settings", underscored: true },
    );
  }
}
