import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import { DEFAULT_PAIN_ALERT_ABOVE } from "@/lib/domain/wellbeing";

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare timeZone: string;
  /** ISO weekday the training week starts on: 1 = Monday … 7 = Sunday. */
  declare weekStartDay: CreationOptional<number>;
  /** A pain report above this (0–10) raises a physio alert (migration 013). */
  declare painAlertAbove: CreationOptional<number>;
  /** Whether athletes are asked for the daily check-in (migration 013). */
  declare checkInsEnabled: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Team.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        weekStartDay: {
          type: DataTypes.INTEGER,
          allowNull: false,
          defaultValue: 1,
          validate: { isInt: true, min: 1, max: 7 },
        },
        painAlertAbove: { type: DataTypes.INTEGER, allowNull: false, defaultValue: DEFAULT_PAIN_ALERT_ABOVE },
        checkInsEnabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "teams", underscored: true },
    );
  }
}
