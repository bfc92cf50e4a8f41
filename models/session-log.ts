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
import type { Completion } from "@/lib/domain/sessions";
import type { Athlete } from "./athlete";
import type { PlannedSession } from "./planned-session";

/** What the athlete actually did in a planned session. */
export class SessionLog extends Model<InferAttributes<SessionLog>, InferCreationAttributes<SessionLog>> {
  declare id: CreationOptional<number>;
  declare sessionId: ForeignKey<PlannedSession["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  declare completion: Completion;
  /** Session RPE on the CR-10 scale, about 30 min after the session (Foster et al. 2001). */
  declare rpe: number | null;
  declare minutes: number | null;
  /** Reps done per session-block id; absent means "as prescribed, scaled by completion". */
  declare completedReps: Record<string, number> | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare session?: NonAttribute<PlannedSession>;
  declare athlete?: NonAttribute<Athlete>;
  declare static associations: {
    session: Association<SessionLog, PlannedSession>;
    athlete: Association<SessionLog, Athlete>;
  };

  static initModel(sequelize: Sequelize) {
    SessionLog.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        completion: { type: DataTypes.STRING(8), allowNull: false },
        rpe: { type: DataTypes.FLOAT, allowNull: true },
        minutes: { type: DataTypes.INTEGER, allowNull: true },
        completedReps: { type: DataTypes.JSON, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "session_logs", underscored: true },
    );
  }
}
