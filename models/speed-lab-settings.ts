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

/** A team's speed-lab settings: after how many weeks without a timing test an athlete is due a re-test. */
export class SpeedLabSettings extends Model<
  InferAttributes<SpeedLabSettings>,
  InferCreationAttributes<SpeedLabSettings>
> {
  declare teamId: ForeignKey<Team["id"]>;
  declare retestWeeks: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpeedLabSettings.init(
      {
        teamId: { type: DataTypes.INTEGER, primaryKey: true },
        retestWeeks: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "speed_lab_settings", underscored: true },
    );
  }
}
