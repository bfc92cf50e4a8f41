import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type ForeignKey,
  type HasManyGetAssociationsMixin,
  type HasOneGetAssociationMixin,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { PlyoLevel, Sex } from "@/lib/domain/athletes";
import type { Team } from "./team";
import type { TrainingGroup } from "./training-group";
import type { User } from "./user";
import type { PlannedSession } from "./planned-session";
import type { SessionLog } from "./session-log";
import type { Alert } from "./alert";
import type { CalendarToken } from "./calendar-token";
import type { Restriction } from "./restriction";
import type { RestrictionOverride } from "./restriction-override";
import type { CalendarFeedRender } from "./calendar-feed-render";
import type { LoadLedgerDay } from "./load-ledger-day";
import type { PainReport } from "./pain-report";
import type { CheckIn } from "./check-in";
import type { SessionLogChange } from "./session-log-change";

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
  declare sessions?: NonAttribute<PlannedSession[]>;
  declare logs?: NonAttribute<SessionLog[]>;
  declare alerts?: NonAttribute<Alert[]>;
  declare calendarTokens?: NonAttribute<CalendarToken[]>;
  declare restrictions?: NonAttribute<Restriction[]>;
  declare restrictionOverrides?: NonAttribute<RestrictionOverride[]>;
  declare feedRender?: NonAttribute<CalendarFeedRender | null>;
  declare ledger?: NonAttribute<LoadLedgerDay[]>;
  declare painReports?: NonAttribute<PainReport[]>;
  declare checkIns?: NonAttribute<CheckIn[]>;
  declare logChanges?: NonAttribute<SessionLogChange[]>;
  declare getSessions: HasManyGetAssociationsMixin<PlannedSession>;
  declare getLogs: HasManyGetAssociationsMixin<SessionLog>;
  declare getAlerts: HasManyGetAssociationsMixin<Alert>;
  declare getCalendarTokens: HasManyGetAssociationsMixin<CalendarToken>;
  declare getRestrictions: HasManyGetAssociationsMixin<Restriction>;
  declare getRestrictionOverrides: HasManyGetAssociationsMixin<RestrictionOverride>;
  declare getFeedRender: HasOneGetAssociationMixin<CalendarFeedRender>;
  declare getLedger: HasManyGetAssociationsMixin<LoadLedgerDay>;
  declare getPainReports: HasManyGetAssociationsMixin<PainReport>;
  declare getCheckIns: HasManyGetAssociationsMixin<CheckIn>;
  declare getLogChanges: HasManyGetAssociationsMixin<SessionLogChange>;
  declare static associations: {
    team: Association<Athlete, Team>;
    group: Association<Athlete, TrainingGroup>;
    user: Association<Athlete, User>;
    sessions: Association<Athlete, PlannedSession>;
    logs: Association<Athlete, SessionLog>;
    alerts: Association<Athlete, Alert>;
    calendarTokens: Association<Athlete, CalendarToken>;
    restrictions: Association<Athlete, Restriction>;
    restrictionOverrides: Association<Athlete, RestrictionOverride>;
    feedRender: Association<Athlete, CalendarFeedRender>;
    ledger: Association<Athlete, LoadLedgerDay>;
    painReports: Association<Athlete, PainReport>;
    checkIns: Association<Athlete, CheckIn>;
    logChanges: Association<Athlete, SessionLogChange>;
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
