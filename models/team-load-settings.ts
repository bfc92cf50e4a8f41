import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from "sequelize";
import type { Team } from "./team";

/** Per-team thresholds the load engine reads; defaults and sources: lib/load/README.md. */
export class TeamLoadSettings extends Model<InferAttributes<TeamLoadSettings>, InferCreationAttributes<TeamLoadSettings>> {
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
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "team_load_settings", underscored: true },
    );
  }
}
