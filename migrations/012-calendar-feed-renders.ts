import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// The last rendered calendar feed of each athlete, with the stamp of what it was rendered from: a poll whose
// stamp matches is answered from here (or with 304) by any app server, so nothing is cached in a process.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("calendar_feed_renders", {
    athlete_id: {
      type: DataTypes.INTEGER,
      primaryKey: true,
      references: { model: "athletes", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    stamp: { type: DataTypes.STRING(64), allowNull: false },
    ics: { type: DataTypes.TEXT, allowNull: false },
    rendered_at: { type: DataTypes.DATE, allowNull: false },
  });
  // sign_in_limits (006) holds epoch milliseconds in `expire`: INTEGER is 64-bit in SQLite, 32-bit in PostgreSQL.
  if (qi.sequelize.getDialect() === "postgres") {
    await qi.sequelize.query("ALTER TABLE sign_in_limits ALTER COLUMN expire TYPE BIGINT");
    // Migration 011's ledger marks are SQLite triggers; the same marks in PL/pgSQL.
    for (const sql of PG_LEDGER_MARKS) await qi.sequelize.query(sql);
  }
};

const PG_MARK_FN = `CREATE OR REPLACE FUNCTION load_ledger_mark(a integer, d text) RETURNS void AS $$
BEGIN
  IF a IS NULL THEN RETURN; END IF;
  INSERT INTO load_ledger_dirty (athlete_id, from_date) VALUES (a, d)
    ON CONFLICT (athlete_id) DO UPDATE SET from_date = LEAST(load_ledger_dirty.from_date, EXCLUDED.from_date);
END $$ LANGUAGE plpgsql`;

// One trigger function per table; TG_OP tells insert, update and delete apart (OLD/NEW as in 011).
const PG_TRIGGER_FNS: Record<string, string> = {
  planned_sessions: `IF TG_OP <> 'INSERT' THEN PERFORM load_ledger_mark(OLD.athlete_id, to_char(OLD.date, 'YYYY-MM-DD')); END IF;
    IF TG_OP <> 'DELETE' THEN PERFORM load_ledger_mark(NEW.athlete_id, to_char(NEW.date, 'YYYY-MM-DD')); END IF;`,
  session_blocks: `IF TG_OP <> 'INSERT' THEN PERFORM load_ledger_mark(s.athlete_id, to_char(s.date, 'YYYY-MM-DD'))
      FROM planned_sessions s WHERE s.id = OLD.session_id; END IF;
    IF TG_OP <> 'DELETE' THEN PERFORM load_ledger_mark(s.athlete_id, to_char(s.date, 'YYYY-MM-DD'))
      FROM planned_sessions s WHERE s.id = NEW.session_id; END IF;`,
  session_logs: `IF TG_OP <> 'INSERT' THEN PERFORM load_ledger_mark(s.athlete_id, to_char(s.date, 'YYYY-MM-DD'))
      FROM planned_sessions s WHERE s.id = OLD.session_id; END IF;
    IF TG_OP <> 'DELETE' THEN PERFORM load_ledger_mark(s.athlete_id, to_char(s.date, 'YYYY-MM-DD'))
      FROM planned_sessions s WHERE s.id = NEW.session_id; END IF;`,
  athletes: `PERFORM load_ledger_mark(NEW.id, '0000-01-01');`,
  team_load_settings: `IF TG_OP <> 'INSERT' THEN
      PERFORM load_ledger_mark(a.id, '0000-01-01') FROM athletes a WHERE a.team_id = OLD.team_id; END IF;
    IF TG_OP <> 'DELETE' THEN
      PERFORM load_ledger_mark(a.id, '0000-01-01') FROM athletes a WHERE a.team_id = NEW.team_id; END IF;`,
};
const PG_TRIGGER_ON: Record<string, string> = {
  planned_sessions: "AFTER INSERT OR DELETE OR UPDATE OF athlete_id, date, status, duration_min, planned_rpe",
  session_blocks: "AFTER INSERT OR UPDATE OR DELETE",
  session_logs: "AFTER INSERT OR UPDATE OR DELETE",
  athletes: "AFTER UPDATE OF vmax_ms, tau_s, step_length_m, plyo_level",
  team_load_settings: "AFTER INSERT OR UPDATE OR DELETE",
};
const PG_LEDGER_MARKS = [
  PG_MARK_FN,
  ...Object.entries(PG_TRIGGER_FNS).flatMap(([table, body]) => [
    `CREATE OR REPLACE FUNCTION load_ledger_mark_${table}() RETURNS trigger AS $$
BEGIN
  ${body}
  RETURN NULL;
END $$ LANGUAGE plpgsql`,
    `CREATE TRIGGER load_ledger_${table} ${PG_TRIGGER_ON[table]} ON ${table} FOR EACH ROW
      EXECUTE FUNCTION load_ledger_mark_${table}()`,
  ]),
];

// BIGINT stays on the way down: narrowing could fail on stored values and is harmless to keep.
export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  if (qi.sequelize.getDialect() === "postgres") {
    for (const table of Object.keys(PG_TRIGGER_FNS)) {
      await qi.sequelize.query(`DROP TRIGGER IF EXISTS load_ledger_${table} ON ${table}`);
      await qi.sequelize.query(`DROP FUNCTION IF EXISTS load_ledger_mark_${table}()`);
    }
    await qi.sequelize.query("DROP FUNCTION IF EXISTS load_ledger_mark(integer, text)");
  }
  await qi.dropTable("calendar_feed_renders");
};
