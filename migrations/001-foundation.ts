import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const cascade = { onDelete: "CASCADE", onUpdate: "CASCADE" } as const;
const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("teams", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    time_zone: { type: DataTypes.STRING(64), allowNull: false },
    week_start_day: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...timestamps,
  });
  await qi.createTable("users", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: true },
    ...timestamps,
  });
  await qi.createTable("memberships", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, ...cascade },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade },
    role: { type: DataTypes.STRING(20), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex("memberships", ["user_id", "team_id"], { unique: true, name: "memberships_user_team" });
  await qi.addIndex("memberships", ["team_id"], { name: "memberships_team" });

  await qi.createTable("training_groups", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade },
    name: { type: DataTypes.STRING(80), allowNull: false },
    sort_order: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex("training_groups", ["team_id", "name"], { unique: true, name: "training_groups_team_name" });

  await qi.createTable("athletes", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, ...setNull },
    group_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: "training_groups", key: "id" },
      ...setNull,
    },
    name: { type: DataTypes.STRING(120), allowNull: false },
    sex: { type: DataTypes.STRING(10), allowNull: true },
    birth_date: { type: DataTypes.DATEONLY, allowNull: true },
    body_mass_kg: { type: DataTypes.FLOAT, allowNull: true },
    vmax_ms: { type: DataTypes.FLOAT, allowNull: true },
    vmax_tested_on: { type: DataTypes.DATEONLY, allowNull: true },
    tau_s: { type: DataTypes.FLOAT, allowNull: true },
    step_length_m: { type: DataTypes.FLOAT, allowNull: true },
    plyo_level: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "beginner" },
    ...timestamps,
  });
  await qi.addIndex("athletes", ["team_id"], { name: "athletes_team" });
  // One athlete profile per user account within a team.
  await qi.addIndex("athletes", ["team_id", "user_id"], { unique: true, name: "athletes_team_user" });

  await qi.createTable("invitations", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, ...cascade },
    purpose: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "invite" },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ["invitations", "athletes", "training_groups", "memberships", "users", "teams"]) {
    await qi.dropTable(table);
  }
};
