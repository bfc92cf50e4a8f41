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
import type { SessionStatus } from "@/lib/domain/sessions";
import type { Athlete } from "./athlete";
import type { SessionBlock } from "./session-block";
import type { Team } from "./team";
import type { SessionLog } from "./session-log";

export class PlannedSession extends Model<InferAttributes<PlannedSession>, InferCreationAttributes<PlannedSession>> {
  declare id: CreationOptional<number>;
  declare teamId: ForeignKey<Team["id"]>;
  declare athleteId: ForeignKey<Athlete["id"]>;
  /** Local calendar date in the team's time zone, YYYY-MM-DD. */
  declare date: string;
  /** Local wall-clock start, HH:MM. */
  declare startTime: string;
  declare durationMin: number;
  declare title: string;
  /** Planned session RPE on the CR-10 scale (Foster et al. 2001). */
  declare plannedRpe: number;
  declare status: CreationOptional<SessionStatus>;
  declare notes: string | null;
  /** Optimistic-locking counter: every write must send the version it read. */
  declare version: CreationOptional<number>;
  /** iCalendar SEQUENCE (RFC 5545 §3.8.7.4), bumped when a published session changes. */
  declare sequence: CreationOptional<number>;
  declare publishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare team?: NonAttribute<Team>;
  declare athlete?: NonAttribute<Athlete>;
  declare blocks?: NonAttribute<SessionBlock[]>;
  declare log?: NonAttribute<SessionLog | null>;
  declare static associations: {
    team: Association<PlannedSession, Team>;
    athlete: Association<PlannedSession, Athlete>;
    blocks: Association<PlannedSession, SessionBlock>;
    log: Association<PlannedSession, SessionLog>;
  };

  static initModel(sequelize: Sequelize) {
    PlannedSession.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        startTime: { type: DataTypes.STRING(5), allowNull: false, defaultValue: "16:00" },
        durationMin: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        plannedRpe: { type: DataTypes.FLOAT, allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "draft" },
        notes: { type: DataTypes.TEXT, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        sequence: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        publishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "planned_sessions", underscored: true },
    );
  }
}
