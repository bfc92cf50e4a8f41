import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";
import { rebuildLedger } from "@/lib/data/ledger-rebuild";

// The load ledger (lib/load/README.md §12): one row per athlete × day from the athlete's first to last session,
// each value set and state a BLOB of six little-endian doubles in lib/load METRICS order (exact, and a seventh of
// the bind and read work of one column per number). load_ledger_dirty holds, per athlete, the first day whose
// row no longer matches the sessions, logs, profile or team settings: triggers write it on every change, so a
// change made by any code path (seeds, tests, a writer without the refresh) is noticed; writers refresh the
// ledger inside their own transaction and clear it, and readers refresh first when they find one.
const BLOB = { type: DataTypes.BLOB, allowNull: false };
const athlete = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: "athletes", key: "id" },
  onDelete: "CASCADE",
  onUpdate: "CASCADE",
} as const;

// "WHERE true" lets SQLite tell the upsert's ON CONFLICT from a join constraint.
const MARK_SELECT = (select: string) => `INSERT INTO load_ledger_dirty (athlete_id, from_date) ${select}
    ${select.includes(" WHERE ") ? "" : "WHERE true"}
    ON CONFLICT (athlete_id) DO UPDATE SET from_date = min(from_date, excluded.from_date);`;
const MARK = (athleteId: string, date: string) => MARK_SELECT(`SELECT ${athleteId}, ${date}`);
const MARK_SESSION = (sessionId: string) =>
  MARK_SELECT(`SELECT s.athlete_id, s.date FROM planned_sessions s WHERE s.id = ${sessionId}`);
const EVER = "'0000-01-01'";

// Only the columns that change a day's numbers mark the ledger (titles, notes, versions and times do not).
const TRIGGERS: Record<string, string> = {
  load_ledger_session_insert: `AFTER INSERT ON planned_sessions BEGIN ${MARK("NEW.athlete_id", "NEW.date")} END`,
  load_ledger_session_update: `AFTER UPDATE OF athlete_id, date, status, duration_min, planned_rpe ON planned_sessions BEGIN
    ${MARK("OLD.athlete_id", "OLD.date")} ${MARK("NEW.athlete_id", "NEW.date")} END`,
  load_ledger_session_delete: `AFTER DELETE ON planned_sessions BEGIN ${MARK("OLD.athlete_id", "OLD.date")} END`,
  load_ledger_block_insert: `AFTER INSERT ON session_blocks BEGIN ${MARK_SESSION("NEW.session_id")} END`,
  load_ledger_block_update: `AFTER UPDATE ON session_blocks BEGIN ${MARK_SESSION("OLD.session_id")} ${MARK_SESSION("NEW.session_id")} END`,
  load_ledger_block_delete: `AFTER DELETE ON session_blocks BEGIN ${MARK_SESSION("OLD.session_id")} END`,
  load_ledger_log_insert: `AFTER INSERT ON session_logs BEGIN ${MARK_SESSION("NEW.session_id")} END`,
  load_ledger_log_update: `AFTER UPDATE ON session_logs BEGIN ${MARK_SESSION("OLD.session_id")} ${MARK_SESSION("NEW.session_id")} END`,
  load_ledger_log_delete: `AFTER DELETE ON session_logs BEGIN ${MARK_SESSION("OLD.session_id")} END`,
  load_ledger_profile_update: `AFTER UPDATE OF vmax_ms, tau_s, step_length_m, plyo_level ON athletes BEGIN ${MARK("NEW.id", EVER)} END`,
  load_ledger_settings_insert: `AFTER INSERT ON team_load_settings BEGIN
    ${MARK_SELECT(`SELECT a.id, ${EVER} FROM athletes a WHERE a.team_id = NEW.team_id`)} END`,
  load_ledger_settings_update: `AFTER UPDATE ON team_load_settings BEGIN
    ${MARK_SELECT(`SELECT a.id, ${EVER} FROM athletes a WHERE a.team_id IN (OLD.team_id, NEW.team_id)`)} END`,
  load_ledger_settings_delete: `AFTER DELETE ON team_load_settings BEGIN
    ${MARK_SELECT(`SELECT a.id, ${EVER} FROM athletes a WHERE a.team_id = OLD.team_id`)} END`,
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("load_ledger", {
    athlete_id: { ...athlete, primaryKey: true },
    // lib/load/dates.ts dayIndex: days since 1970-01-01
    day: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    // LEDGER_LOGGED | LEDGER_MISSING | LEDGER_AHEAD_HAS (lib/load/ledger.ts)
    flags: { type: DataTypes.INTEGER, allowNull: false },
    on_record: { type: DataTypes.INTEGER, allowNull: false },
    kept: { type: DataTypes.INTEGER, allowNull: false },
    past: BLOB,
    today: BLOB,
    ahead: BLOB,
    planned: BLOB,
    cum: BLOB,
    acute: BLOB,
    chronic: BLOB,
    ratio: BLOB,
  });
  // No foreign key: deleting an athlete deletes their sessions, whose triggers then mark the athlete being deleted.
  await qi.createTable("load_ledger_dirty", {
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    from_date: { type: DataTypes.STRING(10), allowNull: false },
  });
  if (qi.sequelize.getDialect() === "sqlite") {
    for (const [name, body] of Object.entries(TRIGGERS)) await qi.sequelize.query(`CREATE TRIGGER ${name} ${body}`);
  }
  // Existing databases get their ledger now (the seed's rows were written before the triggers existed).
  await rebuildLedger({ sequelize: qi.sequelize, progress: process.env.NODE_ENV !== "test" && process.stderr.isTTY });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  if (qi.sequelize.getDialect() === "sqlite") {
    for (const name of Object.keys(TRIGGERS).reverse()) await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${name}`);
  }
  await qi.dropTable("load_ledger_dirty");
  await qi.dropTable("load_ledger");
};
