import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { SpeedStartType, SpeedTestKind } from "@/lib/domain/speed";
import type { Athlete } from "./athlete";
import type { PlannedSession } from "./planned-session";
import type { SpeedUpload } from "./speed-upload";
import type { Team } from "./team";
import type { User } from "./user";

/** One speed test of one athlete: the measurements as entered and what the speed lab computed from them. */
export class SpeedTest extends Model<InferAttributes<SpeedTest>, InferCreationAttributes<SpeedTest>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare uploadId: ForeignKey<SpeedUpload["id"]> | null;
  declare plannedSessionId: ForeignKey<PlannedSession["id"]> | null;
  declare createdByUserId: ForeignKey<User["id"]> | null;
  declare kind: SpeedTestKind;
  /** Local calendar date, YYYY-MM-DD. */
  declare testDate: string;
  declare startType: SpeedStartType | null;
  declare bodyMassKg: number | null;
  /** JSON text of the measurements. */
  declare data: string;
  /** JSON text of the computed result. */
  declare result: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpeedTest.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        testDate: { type: DataTypes.DATEONLY, allowNull: false },
        startType: { type: DataTypes.STRING(20), allowNull: true },
        bodyMassKg: { type: DataTypes.FLOAT, allowNull: true },
        data: { type: DataTypes.TEXT, allowNull: false },
        result: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "speed_tests", underscored: true },
    );
  }
}
