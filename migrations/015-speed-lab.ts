import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// The speed lab (lib/speed/README.md): uploaded files kept as they came, the tests read from them (or typed in)
// with their computed results, and each athlete's speed profile history (what was in force from which date,
// accepted by whom and when).
const ref = (model: string, onDelete: "CASCADE" | "SET NULL") => ({
  references: { model, key: "id" },
  onDelete,
  onUpdate: "CASCADE",
});
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("speed_uploads", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("teams", "CASCADE") },
    uploaded_by_user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("users", "SET NULL") },
    file_name: { type: DataTypes.STRING(200), allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    size_bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    content: { type: DataTypes.TEXT, allowNull: false },
    ...stamps,
  });
  await qi.createTable("speed_tests", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("teams", "CASCADE") },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("athletes", "CASCADE") },
    upload_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("speed_uploads", "SET NULL") },
    planned_session_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("planned_sessions", "SET NULL") },
    created_by_user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("users", "SET NULL") },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    test_date: { type: DataTypes.DATEONLY, allowNull: false },
    start_type: { type: DataTypes.STRING(20), allowNull: true },
    body_mass_kg: { type: DataTypes.FLOAT, allowNull: true },
    /** JSON: the measurements as entered (gates, trace samples, contacts). */
    data: { type: DataTypes.TEXT, allowNull: false },
    /** JSON: what the speed lab computed from them. */
    result: { type: DataTypes.TEXT, allowNull: false },
    ...stamps,
  });
  await qi.addIndex("speed_tests", ["athlete_id", "test_date"], { name: "speed_tests_athlete_date" });
  await qi.addIndex("speed_tests", ["team_id", "test_date"], { name: "speed_tests_team_date" });
  await qi.createTable("speed_profile_entries", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("teams", "CASCADE") },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("athletes", "CASCADE") },
    /** First day the profile is in force; the athlete's hand-typed values before any test start at 0001-01-01. */
    effective_from: { type: DataTypes.DATEONLY, allowNull: false },
    speed_test_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("speed_tests", "SET NULL") },
    accepted_by_user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("users", "SET NULL") },
    accepted_at: { type: DataTypes.DATE, allowNull: false },
    vmax_ms: { type: DataTypes.FLOAT, allowNull: true },
    tau_s: { type: DataTypes.FLOAT, allowNull: true },
    step_length_m: { type: DataTypes.FLOAT, allowNull: true },
    f0_n: { type: DataTypes.FLOAT, allowNull: true },
    pmax_w: { type: DataTypes.FLOAT, allowNull: true },
    step_frequency_hz: { type: DataTypes.FLOAT, allowNull: true },
    contact_time_s: { type: DataTypes.FLOAT, allowNull: true },
    stance_force_bw: { type: DataTypes.FLOAT, allowNull: true },
    ...stamps,
  });
  await qi.addIndex("speed_profile_entries", ["athlete_id", "effective_from"], {
    name: "speed_profile_entries_athlete_from",
    unique: true,
  });
  // Its own table, not a team_load_settings column: every change there marks the whole load ledger (011).
  await qi.createTable("speed_lab_settings", {
    team_id: { type: DataTypes.INTEGER, primaryKey: true, ...ref("teams", "CASCADE") },
    /** Weeks without a timing test after which an athlete is due a re-test. */
    retest_weeks: { type: DataTypes.INTEGER, allowNull: false },
    ...stamps,
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("speed_lab_settings");
  await qi.dropTable("speed_profile_entries");
  await qi.dropTable("speed_tests");
  await qi.dropTable("speed_uploads");
};
