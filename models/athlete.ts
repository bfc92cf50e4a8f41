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
import type { PlyoLevel, Sex } from "@/lib/domain/athletes";
import type { Team } from "./team";
import type { TrainingGroup } from "./training-group";
import type { User } from "./user";

export class Athlete extends Model<InferAttributes<Athlete>, InferCreationAttributes<Athlete>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare userId: ForeignKey<User["id"]> | null;
  declare groupId: ForeignKey<TrainingGroup["id"]> | null;
  declare name: string;
  declare sex: Sex | null;
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
  declare plyoLevel: CreationOptional<PlyoLevel>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare group?: NonAttribute<TrainingGroup>;
  declare user?: NonAttribute<User>;
  declare static associations: {
    team: Association<Athlete, Team>;
    group: Association<Athlete, TrainingGroup>;
    user: Association<Athlete, User>;
  };

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
