import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// The athlete's own reports: pain or discomfort with a session log, the optional daily check-in, and the history
// of every log change (who and when, also a coach reopening a locked log). Two team settings go on `teams`.

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const cascade = { onDelete: "CASCADE", onUpdate: "CASCADE" } as const;
const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;
const team = { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade };
const athlete = { type: DataTypes.INTEGER, allowNull: false, references: { model: "athletes", key: "id" }, ...cascade };
const userOrNull = { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, ...setNull };
// Medical reports and the log history outlive a session the coach deletes: the link goes, the date stays.
const sessionOrNull = {
  type: DataTypes.INTEGER,
  allowNull: true,
  references: { model: "planned_sessions", key: "id" },
  ...setNull,
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("pain_reports", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    session_id: sessionOrNull,
    date: { type: DataTypes.DATEONLY, allowNull: false },
    // lib/domain/wellbeing.ts BODY_REGIONS
    region: { type: DataTypes.STRING(20), allowNull: false },
    // 0–10
    severity: { type: DataTypes.INTEGER, allowNull: false },
    stopped_session: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    // The physio alert this report raised (once, the first time it was above the team's line).
    alert_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "alerts", key: "id" }, ...setNull },
    ...timestamps,
  });
  // One report per session (the log sheet's); several sessions a day each keep theirs.
  await qi.addIndex("pain_reports", ["session_id"], { unique: true, name: "pain_reports_session" });
  await qi.addIndex("pain_reports", ["athlete_id", "date"], { name: "pain_reports_athlete_date" });
  await qi.addIndex("pain_reports", ["team_id", "date"], { name: "pain_reports_team_date" });

  await qi.createTable("check_ins", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    date: { type: DataTypes.DATEONLY, allowNull: false },
    // 1–5 each, 5 the best (lib/domain/wellbeing.ts CHECK_IN_SCALE)
    sleep: { type: DataTypes.INTEGER, allowNull: false },
    fatigue: { type: DataTypes.INTEGER, allowNull: false },
    soreness: { type: DataTypes.INTEGER, allowNull: false },
    stress: { type: DataTypes.INTEGER, allowNull: false },
    mood: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex("check_ins", ["athlete_id", "date"], { unique: true, name: "check_ins_athlete_date" });
  await qi.addIndex("check_ins", ["team_id", "date"], { name: "check_ins_team_date" });

  await qi.createTable("session_log_changes", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    session_id: sessionOrNull,
    session_date: { type: DataTypes.DATEONLY, allowNull: false },
    // lib/domain/wellbeing.ts LOG_CHANGE_ACTIONS
    action: { type: DataTypes.STRING(10), allowNull: false },
    // JSON of the log (and its pain report) after the change; null for a removal or an unlock.
    after: { type: DataTypes.TEXT, allowNull: true },
    user_id: userOrNull,
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("session_log_changes", ["session_id", "id"], { name: "session_log_changes_session" });
  await qi.addIndex("session_log_changes", ["athlete_id", "id"], { name: "session_log_changes_athlete" });

  await qi.addColumn("teams", "pain_alert_above", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 });
  await qi.addColumn("teams", "check_ins_enabled", { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  // Native DROP COLUMN (SQLite 3.35+): Sequelize's removeColumn rebuilds the table, and dropping the old `teams`
  // would cascade to every membership, athlete and session.
  await qi.sequelize.query("ALTER TABLE teams DROP COLUMN check_ins_enabled");
  await qi.sequelize.query("ALTER TABLE teams DROP COLUMN pain_alert_above");
  for (const table of ["session_log_changes", "check_ins", "pain_reports"]) await qi.dropTable(table);
};
