import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from "sequelize";
import type { BodyRegion } from "@/lib/domain/wellbeing";
import type { Athlete } from "./athlete";
import type { Team } from "./team";

/** Pain or discomfort the athlete reported with a session's log: where, how bad (0–10), whether it stopped them. */
export class PainReport extends Model<InferAttributes<PainReport>, InferCreationAttributes<PainReport>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  /** The session it was reported with; null once the coach deleted that session (the report stays). */
  declare sessionId: number | null;
  declare date: string;
  declare region: BodyRegion;
  declare severity: number;
  declare stoppedSession: boolean;
  /** The physio alert it raised, if it was ever above the team's line. */
  declare alertId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PainReport.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        sessionId: { type: DataTypes.INTEGER, allowNull: true },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        region: { type: DataTypes.STRING(20), allowNull: false },
        severity: { type: DataTypes.INTEGER, allowNull: false },
        stoppedSession: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        alertId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "pain_reports", underscored: true },
    );
  }
}
