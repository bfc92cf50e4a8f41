import { mkdirSync } from "node:fs";
import { dirname } from "node:path";
import { Sequelize, Transaction } from "sequelize";
import { queueWrites, sqliteDriver, writeQueue } from "@/lib/db/sqlite";
import { openPostgres } from "@/lib/db/postgres";
import { databaseDialect, databaseStorage, env } from "@/lib/env";
import { Alert } from "./alert";
import { Athlete } from "./athlete";
import { AthleteAvailability } from "./athlete-availability";
import { AuthSession } from "./auth-session";
import { BlockTemplate } from "./block-template";
import { CalendarFeedRender } from "./calendar-feed-render";
import { CalendarToken } from "./calendar-token";
import { CheckIn } from "./check-in";
import { Invitation } from "./invitation";
import { LoadLedgerDay } from "./load-ledger-day";
import { Meet } from "./meet";
import { Membership } from "./membership";
import { NotificationSetting } from "./notification-setting";
import { OutboxMessage } from "./outbox-message";
import { PainReport } from "./pain-report";
import { PlannedSession } from "./planned-session";
import { Restriction } from "./restriction";
import { RestrictionOverride } from "./restriction-override";
import { SeasonPhase } from "./season-phase";
import { SessionBlock } from "./session-block";
import { SessionLog } from "./session-log";
import { SessionLogChange } from "./session-log-change";
import { SpeedLabSettings } from "./speed-lab-settings";
import { SpeedProfileEntry } from "./speed-profile-entry";
import { SpeedProfileReplacement } from "./speed-profile-replacement";
import { SpeedTest } from "./speed-test";
import { SpeedUpload } from "./speed-upload";
import { SessionMessage } from "./session-message";
import { Team } from "./team";
import { TeamLoadSettings } from "./team-load-settings";
import { TrainingGroup } from "./training-group";
import { User } from "./user";

export { Alert, OutboxMessage, Restriction, RestrictionOverride };
export { CheckIn, PainReport };
export { SpeedTest };
export { AthleteAvailability };
export { Meet, SeasonPhase };
export { BlockTemplate, Invitation, PlannedSession, SessionBlock, SessionLog, TeamLoadSettings };

const models = {
  AuthSession,
  CalendarFeedRender,
  Alert,
  CalendarToken,
  NotificationSetting,
  OutboxMessage,
  Restriction,
  RestrictionOverride,
  Athlete,
  BlockTemplate,
  Invitation,
  LoadLedgerDay,
  Membership,
  PlannedSession,
  SessionBlock,
  SessionLog,
  Team,
  TeamLoadSettings,
  TrainingGroup,
  User,
  // Athlete reports (migration 013).
  CheckIn,
  PainReport,
  SessionLogChange,
  SpeedLabSettings,
  SpeedProfileEntry,
  SpeedTest,
  SpeedUpload,
  // Same-day results replaced in a speed profile (migration 026): plain id columns.
  SpeedProfileReplacement,
  // Availability and session threads (migration 014): plain id columns, no associations needed.
  AthleteAvailability,
  SessionMessage,
  // The season plan (migration 023).
  Meet,
  SeasonPhase,
};
type Models = typeof models;
export type Db = Models & { sequelize: Sequelize };

function associate() {
  const cascade = { onDelete: "CASCADE" as const, onUpdate: "CASCADE" as const };
  const setNull = { onDelete: "SET NULL" as const, onUpdate: "CASCADE" as const };

  Team.hasMany(Membership, { foreignKey: "teamId", as: "memberships", ...cascade });
  Membership.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  User.hasMany(Membership, { foreignKey: "userId", as: "memberships", ...cascade });
  Membership.belongsTo(User, { foreignKey: "userId", as: "user" });

  Team.hasMany(TrainingGroup, { foreignKey: "teamId", as: "groups", ...cascade });
  TrainingGroup.belongsTo(Team, { foreignKey: "teamId", as: "team" });

  Team.hasMany(Athlete, { foreignKey: "teamId", as: "athletes", ...cascade });
  Athlete.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  TrainingGroup.hasMany(Athlete, { foreignKey: "groupId", as: "athletes", ...setNull });
  Athlete.belongsTo(TrainingGroup, { foreignKey: "groupId", as: "group" });
  User.hasMany(Athlete, { foreignKey: "userId", as: "athleteProfiles", ...setNull });
  Athlete.belongsTo(User, { foreignKey: "userId", as: "user" });

  Team.hasMany(Invitation, { foreignKey: "teamId", as: "invitations", ...cascade });
  Invitation.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  User.hasMany(Invitation, { foreignKey: "userId", as: "invitations", ...cascade });
  Invitation.belongsTo(User, { foreignKey: "userId", as: "user" });

  Team.hasOne(TeamLoadSettings, { foreignKey: "teamId", as: "loadSettings", ...cascade });
  TeamLoadSettings.belongsTo(Team, { foreignKey: "teamId", as: "team" });

  Team.hasMany(BlockTemplate, { foreignKey: "teamId", as: "templates", ...cascade });
  BlockTemplate.belongsTo(Team, { foreignKey: "teamId", as: "team" });

  Team.hasMany(PlannedSession, { foreignKey: "teamId", as: "sessions", ...cascade });
  PlannedSession.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Athlete.hasMany(PlannedSession, { foreignKey: "athleteId", as: "sessions", ...cascade });
  PlannedSession.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });

  PlannedSession.hasMany(SessionBlock, { foreignKey: "sessionId", as: "blocks", ...cascade });
  SessionBlock.belongsTo(PlannedSession, { foreignKey: "sessionId", as: "session" });
  BlockTemplate.hasMany(SessionBlock, { foreignKey: "templateId", as: "copies", ...setNull });
  SessionBlock.belongsTo(BlockTemplate, { foreignKey: "templateId", as: "template" });

  PlannedSession.hasOne(SessionLog, { foreignKey: "sessionId", as: "log", ...cascade });
  SessionLog.belongsTo(PlannedSession, { foreignKey: "sessionId", as: "session" });
  Athlete.hasMany(SessionLog, { foreignKey: "athleteId", as: "logs", ...cascade });
  SessionLog.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });

  // Notices (migration 003).
  Team.hasMany(Alert, { foreignKey: "teamId", as: "alerts", ...cascade });
  Alert.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Athlete.hasMany(Alert, { foreignKey: "athleteId", as: "alerts", ...cascade });
  Alert.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });
  Team.hasMany(OutboxMessage, { foreignKey: "teamId", as: "outbox", ...setNull });
  OutboxMessage.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Athlete.hasMany(CalendarToken, { foreignKey: "athleteId", as: "calendarTokens", ...cascade });
  CalendarToken.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });
  Team.hasMany(CalendarToken, { foreignKey: "teamId", as: "calendarTokens", ...cascade });
  CalendarToken.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  User.hasMany(NotificationSetting, { foreignKey: "userId", as: "notificationSettings", ...cascade });
  NotificationSetting.belongsTo(User, { foreignKey: "userId", as: "user" });
  Team.hasMany(NotificationSetting, { foreignKey: "teamId", as: "notificationSettings", ...cascade });
  NotificationSetting.belongsTo(Team, { foreignKey: "teamId", as: "team" });

  // Restrictions (migration 004).
  Athlete.hasMany(Restriction, { foreignKey: "athleteId", as: "restrictions", ...cascade });
  Restriction.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });
  Team.hasMany(Restriction, { foreignKey: "teamId", as: "restrictions", ...cascade });
  Restriction.belongsTo(Team, { foreignKey: "teamId", as: "team" });
  Restriction.hasMany(RestrictionOverride, { foreignKey: "restrictionId", as: "overrides", ...cascade });
  RestrictionOverride.belongsTo(Restriction, { foreignKey: "restrictionId", as: "restriction" });
  Athlete.hasMany(RestrictionOverride, { foreignKey: "athleteId", as: "restrictionOverrides", ...cascade });
  RestrictionOverride.belongsTo(Athlete, { foreignKey: "athleteId", as: "athlete" });
  Team.hasMany(RestrictionOverride, { foreignKey: "teamId", as: "restrictionOverrides", ...cascade });
  RestrictionOverride.belongsTo(Team, { foreignKey: "teamId", as: "team" });

  Athlete.hasOne(CalendarFeedRender, { foreignKey: "athleteId", as: "feedRender", ...cascade });

  Team.hasMany(SpeedUpload, { foreignKey: "teamId", as: "speedUploads", ...cascade });
  User.hasMany(SpeedUpload, { foreignKey: "uploadedByUserId", as: "speedUploads", ...setNull });
  Team.hasMany(SpeedTest, { foreignKey: "teamId", as: "speedTests", ...cascade });
  Athlete.hasMany(SpeedTest, { foreignKey: "athleteId", as: "speedTests", ...cascade });
  SpeedUpload.hasMany(SpeedTest, { foreignKey: "uploadId", as: "tests", ...setNull });
  PlannedSession.hasMany(SpeedTest, { foreignKey: "plannedSessionId", as: "speedTests", ...setNull });
  User.hasMany(SpeedTest, { foreignKey: "createdByUserId", as: "speedTests", ...setNull });
  Team.hasMany(SpeedProfileEntry, { foreignKey: "teamId", as: "speedProfileEntries", ...cascade });
  Athlete.hasMany(SpeedProfileEntry, { foreignKey: "athleteId", as: "speedProfileEntries", ...cascade });
  SpeedTest.hasMany(SpeedProfileEntry, { foreignKey: "speedTestId", as: "profileEntries", ...setNull });
  User.hasMany(SpeedProfileEntry, { foreignKey: "acceptedByUserId", as: "acceptedSpeedEntries", ...setNull });
  // Every association names its alias: without one Sequelize takes the class name, which the production bundle
  // minifies (an empty or short name made a has-one getter replace Model#get and every write failed).
  Team.hasOne(SpeedLabSettings, { foreignKey: "teamId", as: "speedLabSettings", ...cascade });

  // Load ledger (migration 011).
  Athlete.hasMany(LoadLedgerDay, { foreignKey: "athleteId", as: "ledger", ...cascade });

  // Athlete reports (migration 013): the session link of reports and history is kept as a plain column.
  Athlete.hasMany(PainReport, { foreignKey: "athleteId", as: "painReports", ...cascade });
  Team.hasMany(PainReport, { foreignKey: "teamId", as: "painReports", ...cascade });
  Athlete.hasMany(CheckIn, { foreignKey: "athleteId", as: "checkIns", ...cascade });
  Team.hasMany(CheckIn, { foreignKey: "teamId", as: "checkIns", ...cascade });
  Athlete.hasMany(SessionLogChange, { foreignKey: "athleteId", as: "logChanges", ...cascade });
  Team.hasMany(SessionLogChange, { foreignKey: "teamId", as: "logChanges", ...cascade });

  // Sign-in sessions (migration 006).
  User.hasMany(AuthSession, { foreignKey: "userId", as: "sessions", ...cascade });
  AuthSession.belongsTo(User, { foreignKey: "userId", as: "user" });
}

/** Builds a Sequelize instance on an SQLite file with the pragmas the app relies on; its writes queue (lib/db/sqlite.ts). */
export async function openDatabase(storage: string): Promise<Sequelize> {
  if (storage !== ":memory:") mkdirSync(dirname(storage), { recursive: true });
  const sequelize = new Sequelize({
    dialect: "sqlite",
    storage,
    dialectModule: sqliteDriver,
    logging: false,
    // IMMEDIATE takes the write lock at BEGIN, so a transaction never fails halfway on a lock upgrade.
    transactionType: Transaction.TYPES.IMMEDIATE,
    // busy_timeout already waited; Sequelize's default retries SQLITE_BUSY 5 more times (25 s in all).
    retry: { max: 1 },
  });
  queueWrites(sequelize, writeQueue(storage));
  await sequelize.query("PRAGMA foreign_keys = ON");
  if (storage !== ":memory:") await sequelize.query("PRAGMA journal_mode = WAL");
  return sequelize;
}

function initModels(sequelize: Sequelize) {
  for (const model of Object.values(models)) model.initModel(sequelize);
  associate();
}

type Cache = { db?: Promise<Db> };
const cache = globalThis as typeof globalThis & { __sprintwrightDb?: Cache };
cache.__sprintwrightDb ??= {};

/**
 * The app's one database handle, created on first use and cached on globalThis across dev reloads: SQLite by
 * default, PostgreSQL when DATABASE_URL is a postgres:// URL (lib/db/postgres.ts).
 */
export function db(): Promise<Db> {
  const c = cache.__sprintwrightDb!;
  if (c.db) return c.db;
  // Open only on a cache miss: opening is a new connection (and on SQLite two PRAGMAs), never a side effect of a hit.
  const url = env().DATABASE_URL;
  const open = databaseDialect(url) === "postgres" ? openPostgres(url) : openDatabase(databaseStorage(url));
  c.db = open.then((sequelize) => {
    initModels(sequelize);
    return { ...models, sequelize };
  });
  return c.db;
}

/** Closes the cached handle (tests and scripts). */
export async function closeDb(): Promise<void> {
  const c = cache.__sprintwrightDb!;
  if (!c.db) return;
  const { sequelize } = await c.db;
  c.db = undefined;
  await sequelize.close();
}
