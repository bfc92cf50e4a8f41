import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const cascade = { onDelete: "CASCADE", onUpdate: "CASCADE" } as const;
const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;
const team = { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade };

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("team_load_settings", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { ...team, unique: true },
    hsr_speed_ms: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 5.5 },
    near_max_pct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 90 },
    acwr_method: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "ewma" },
    acwr_metric: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "srpe" },
    spike_ratio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 1.5 },
    rising_ratio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 1.3 },
    low_ratio: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0.8 },
    weekly_change_limit_pct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 15 },
    recovery_hours: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 48 },
    ...timestamps,
  });

  await qi.createTable("block_templates", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    kind: { type: DataTypes.STRING(20), allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: false },
    running: { type: DataTypes.JSON, allowNull: true },
    drills: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    duration_min: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 60 },
    planned_rpe: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 5 },
    ...timestamps,
  });
  await qi.addIndex("block_templates", ["team_id"], { name: "block_templates_team" });

  await qi.createTable("planned_sessions", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "athletes", key: "id" }, ...cascade },
    date: { type: DataTypes.DATEONLY, allowNull: false },
    start_time: { type: DataTypes.STRING(5), allowNull: false, defaultValue: "16:00" },
    duration_min: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: false },
    planned_rpe: { type: DataTypes.FLOAT, allowNull: false },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "draft" },
    notes: { type: DataTypes.TEXT, allowNull: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    sequence: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    published_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("planned_sessions", ["team_id", "date"], { name: "planned_sessions_team_date" });
  await qi.addIndex("planned_sessions", ["athlete_id", "date"], { name: "planned_sessions_athlete_date" });

  await qi.createTable("session_blocks", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    session_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "planned_sessions", key: "id" },
      ...cascade,
    },
    template_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: "block_templates", key: "id" },
      ...setNull,
    },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    title: { type: DataTypes.STRING(120), allowNull: false },
    running: { type: DataTypes.JSON, allowNull: true },
    drills: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("session_blocks", ["session_id"], { name: "session_blocks_session" });

  await qi.createTable("session_logs", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    session_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: "planned_sessions", key: "id" },
      ...cascade,
    },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "athletes", key: "id" }, ...cascade },
    completion: { type: DataTypes.STRING(8), allowNull: false },
    rpe: { type: DataTypes.FLOAT, allowNull: true },
    minutes: { type: DataTypes.INTEGER, allowNull: true },
    completed_reps: { type: DataTypes.JSON, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("session_logs", ["athlete_id"], { name: "session_logs_athlete" });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ["session_logs", "session_blocks", "planned_sessions", "block_templates", "team_load_settings"]) {
    await qi.dropTable(table);
  }
};
