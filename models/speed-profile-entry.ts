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
import type { SpeedTest } from "./speed-test";
import type { Team } from "./team";
import type { User } from "./user";

/** An athlete's speed profile in force from `effectiveFrom` until the next entry (lib/speed/README.md §4). */
export class SpeedProfileEntry extends Model<
  InferAttributes<SpeedProfileEntry>,
  InferCreationAttributes<SpeedProfileEntry>
> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  /** YYYY-MM-DD; 0001-01-01 for the hand-typed values in force before the first accepted test. */
  declare effectiveFrom: string;
  declare speedTestId: ForeignKey<SpeedTest["id"]> | null;
  declare acceptedByUserId: ForeignKey<User["id"]> | null;
  declare acceptedAt: Date;
  declare vmaxMs: number | null;
  declare tauS: number | null;
  declare stepLengthM: number | null;
  declare f0N: number | null;
  declare pmaxW: number | null;
  declare stepFrequencyHz: number | null;
  declare contactTimeS: number | null;
  declare stanceForceBw: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    // A new object per attribute: init() writes each attribute's column name into its definition.
    const value = () => ({ type: DataTypes.FLOAT, allowNull: true });
    SpeedProfileEntry.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        effectiveFrom: { type: DataTypes.DATEONLY, allowNull: false },
        acceptedAt: { type: DataTypes.DATE, allowNull: false },
        vmaxMs: value(),
        tauS: value(),
        stepLengthM: value(),
        f0N: { ...value(), field: "f0_n" },
        pmaxW: value(),
        stepFrequencyHz: value(),
        contactTimeS: value(),
        stanceForceBw: value(),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "speed_profile_entries", underscored: true },
    );
  }
}
