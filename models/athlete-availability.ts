import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { AvailabilityLevel } from "@/lib/availability/levels";
import type { Athlete } from "./athlete";
import type { Restriction } from "./restriction";
import type { Team } from "./team";

/** One availability setting of an athlete by the medical staff; the newest row is the current one. */
export class AthleteAvailability extends Model<
  InferAttributes<AthleteAvailability>,
  InferCreationAttributes<AthleteAvailability>
> {
  declare id: CreationOptional<number>;
  declare teamId: Team["id"];
  declare athleteId: Athlete["id"];
  declare level: AvailabilityLevel;
  declare startsOn: string;
  declare returnOn: string | null;
  declare note: string;
  /** The restriction the guard checks for this level (lifted when a newer setting replaces it). */
  declare restrictionId: Restriction["id"] | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AthleteAvailability.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        teamId: { type: DataTypes.INTEGER, allowNull: false },
        athleteId: { type: DataTypes.INTEGER, allowNull: false },
        level: { type: DataTypes.STRING(12), allowNull: false },
        startsOn: { type: DataTypes.DATEONLY, allowNull: false },
        returnOn: { type: DataTypes.DATEONLY, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: false },
        restrictionId: { type: DataTypes.INTEGER, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "athlete_availability", underscored: true },
    );
  }
}
