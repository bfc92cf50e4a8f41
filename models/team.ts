import {
  DataTypes,
  Model,
  type Association,
  type CreationOptional,
  type HasManyGetAssociationsMixin,
  type HasOneGetAssociationMixin,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import { DEFAULT_PAIN_ALERT_ABOVE } from "@/lib/domain/wellbeing";
import type { Membership } from "./membership";
import type { TrainingGroup } from "./training-group";
import type { Athlete } from "./athlete";
import type { Invitation } from "./invitation";
import type { TeamLoadSettings } from "./team-load-settings";
import type { BlockTemplate } from "./block-template";
import type { PlannedSession } from "./planned-session";
import type { Alert } from "./alert";
import type { OutboxMessage } from "./outbox-message";
import type { CalendarToken } from "./calendar-token";
import type { NotificationSetting } from "./notification-setting";
import type { Restriction } from "./restriction";
import type { RestrictionOverride } from "./restriction-override";
import type { PainReport } from "./pain-report";
import type { CheckIn } from "./check-in";
import type { SessionLogChange } from "./session-log-change";

export class Team extends Model<InferAttributes<Team>, InferCreationAttributes<Team>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare timeZone: string;
  /** ISO weekday the training week starts on: 1 = Monday … 7 = Sunday. */
  declare weekStartDay: CreationOptional<number>;
  /** A pain report above this (0–10) raises a physio alert (migration 013). */
  declare painAlertAbove: CreationOptional<number>;
  /** Whether athletes are asked for the daily check-in (migration 013). */
  declare checkInsEnabled: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  // Filled only when a query includes the association (models/index.ts wires them).
  declare memberships?: NonAttribute<Membership[]>;
  declare groups?: NonAttribute<TrainingGroup[]>;
  declare athletes?: NonAttribute<Athlete[]>;
  declare invitations?: NonAttribute<Invitation[]>;
  declare loadSettings?: NonAttribute<TeamLoadSettings | null>;
  declare templates?: NonAttribute<BlockTemplate[]>;
  declare sessions?: NonAttribute<PlannedSession[]>;
  declare alerts?: NonAttribute<Alert[]>;
  declare outbox?: NonAttribute<OutboxMessage[]>;
  declare calendarTokens?: NonAttribute<CalendarToken[]>;
  declare notificationSettings?: NonAttribute<NotificationSetting[]>;
  declare restrictions?: NonAttribute<Restriction[]>;
  declare restrictionOverrides?: NonAttribute<RestrictionOverride[]>;
  declare painReports?: NonAttribute<PainReport[]>;
  declare checkIns?: NonAttribute<CheckIn[]>;
  declare logChanges?: NonAttribute<SessionLogChange[]>;
  declare getMemberships: HasManyGetAssociationsMixin<Membership>;
  declare getGroups: HasManyGetAssociationsMixin<TrainingGroup>;
  declare getAthletes: HasManyGetAssociationsMixin<Athlete>;
  declare getInvitations: HasManyGetAssociationsMixin<Invitation>;
  declare getLoadSettings: HasOneGetAssociationMixin<TeamLoadSettings>;
  declare getTemplates: HasManyGetAssociationsMixin<BlockTemplate>;
  declare getSessions: HasManyGetAssociationsMixin<PlannedSession>;
  declare getAlerts: HasManyGetAssociationsMixin<Alert>;
  declare getOutbox: HasManyGetAssociationsMixin<OutboxMessage>;
  declare getCalendarTokens: HasManyGetAssociationsMixin<CalendarToken>;
  declare getNotificationSettings: HasManyGetAssociationsMixin<NotificationSetting>;
  declare getRestrictions: HasManyGetAssociationsMixin<Restriction>;
  declare getRestrictionOverrides: HasManyGetAssociationsMixin<RestrictionOverride>;
  declare getPainReports: HasManyGetAssociationsMixin<PainReport>;
  declare getCheckIns: HasManyGetAssociationsMixin<CheckIn>;
  declare getLogChanges: HasManyGetAssociationsMixin<SessionLogChange>;
  declare static associations: {
    memberships: Association<Team, Membership>;
    groups: Association<Team, TrainingGroup>;
    athletes: Association<Team, Athlete>;
    invitations: Association<Team, Invitation>;
    loadSettings: Association<Team, TeamLoadSettings>;
    templates: Association<Team, BlockTemplate>;
    sessions: Association<Team, PlannedSession>;
    alerts: Association<Team, Alert>;
    outbox: Association<Team, OutboxMessage>;
    calendarTokens: Association<Team, CalendarToken>;
    notificationSettings: Association<Team, NotificationSetting>;
    restrictions: Association<Team, Restriction>;
    restrictionOverrides: Association<Team, RestrictionOverride>;
    painReports: Association<Team, PainReport>;
    checkIns: Association<Team, CheckIn>;
    logChanges: Association<Team, SessionLogChange>;
  };

  static initModel(sequelize: Sequelize) {
    Team.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        weekStartDay: {
          type: DataTypes.INTEGER,
          allowNull: false,
          defaultValue: 1,
          validate: { isInt: true, min: 1, max: 7 },
        },
        painAlertAbove: { type: DataTypes.INTEGER, allowNull: false, defaultValue: DEFAULT_PAIN_ALERT_ABOVE },
        checkInsEnabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: "teams", underscored: true },
    );
  }
}
