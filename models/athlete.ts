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
import type { TrainingGroup } from "./training-group";
import type { User } from "./user";

export const SEXES = ["female", "male"] as const;
export const PLYO_LEVELS = ["beginner", "intermediate", "advanced"] as const;

export class Athlete extends Model<InferAttributes<Athlete>, InferCreationAttributes<Athlete>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare userId: ForeignKey<User["id"]> | null;
  declare groupId: ForeignKey<TrainingGroup["id"]> | null;
  declare name: string;
  declare sex: (typeof SEXES)[number] | null;
  /** Local calendar date, YYYY-MM-DD. */
  declare birthDate: string | null;
  declare bodyMassKg: number | null;
  /** Tested maximal velocity, m/s (e.g. from a flying 20–30 m). */
  declare vmaxMs: number | null;
  declare vmaxTestedOn: string | null;
  /** Acceleration time constant τ of v(t) = vmax(1 − e^(−t/τ)), s. */
  declare tauS: number | null;
  /** Step length at top speed, m. */
  declare stepLengthM: number | null;
  declare plyoLevel: CreationOptional<(typeof PLYO_LEVELS)[number]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Athlete.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        sex: { type: DataTypes.STRING(10), allowNull: true },
        birthDate: { type: DataTypes.DATEONLY, allowNull: true },
        bodyMassKg: { type: DataTypes.FLOAT, allowNull: true },
        vmaxMs: { type: DataTypes.FLOAT, allowNull: true },
        vmaxTestedOn: { type: DataTypes.DATEONLY, allowNull: true },
        tauS: { type: DataTypes.FLOAT, allowNull: true },
        stepLengthM: { type: DataTypes.FLOAT, allowNull: true },
        plyoLevel: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "beginner" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "athletes", underscored: true },
    );
  }
}
