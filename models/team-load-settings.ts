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
import { DEFAULT_TEAM_LOAD_SETTINGS as DEFAULTS } from "@/lib/load/types";
import type { Team } from "./team";

/**
 * Per-team thresholds the load engine reads. The defaults are DEFAULT_TEAM_LOAD_SETTINGS (lib/load/types.ts;
 * sources: lib/load/README.md); migrations 002 and 009 wrote the same values as they stood then.
 */
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

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare static associations: {
    team: Association<TeamLoadSettings, Team>;
  };

  static initModel(sequelize: Sequelize) {
    TeamLoadSettings.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        hsrSpeedMs: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.hsrSpeedMs },
        nearMaxPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.nearMaxPct },
        acwrMethod: { type: DataTypes.STRING(20), allowNull: false, defaultValue: DEFAULTS.acwrMethod },
        acwrMetric: { type: DataTypes.STRING(20), allowNull: false, defaultValue: DEFAULTS.acwrMetric },
        spikeRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.spikeRatio },
        risingRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.risingRatio },
        lowRatio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.lowRatio },
        weeklyChangeLimitPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.weeklyChangeLimitPct },
        recoveryHours: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.recoveryHours },
        // Migration 009: the sprint-specific model's team choices.
        speedZones: { type: DataTypes.STRING(10), allowNull: false, defaultValue: DEFAULTS.speedZones },
        hsrPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.hsrPct },
        sprintSpeedMs: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.sprintSpeedMs },
        maximalPct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.maximalPct },
        recoveryWork: {
          type: DataTypes.TEXT,
          allowNull: false,
          defaultValue: JSON.stringify(DEFAULTS.recoveryWork),
        },
        missingLogs: { type: DataTypes.STRING(10), allowNull: false, defaultValue: DEFAULTS.missingLogs },
        monotonyLimit: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULTS.monotonyLimit },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "team_load_settings", underscored: true },
    );
  }
}
