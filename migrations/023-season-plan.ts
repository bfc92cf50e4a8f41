import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// The season plan: phases (per team, or per training group where they differ) with weekly target ranges, and
// meets with a priority. Sessions stay in planned_sessions: a generated week is ordinary plan rows.
const team = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: "teams", key: "id" },
  onDelete: "CASCADE",
};
const group = {
  type: DataTypes.INTEGER,
  allowNull: true,
  references: { model: "training_groups", key: "id" },
  onDelete: "CASCADE",
};
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("season_phases", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: team,
    group_id: group,
    kind: { type: DataTypes.STRING(24), allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    starts_on: { type: DataTypes.DATEONLY, allowNull: false },
    ends_on: { type: DataTypes.DATEONLY, allowNull: false },
    goal: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    /** JSON: { hsrM?: { min, max }, nearMaxM?: …, contacts?: …, srpe?: … } (lib/season/targets.ts). */
    targets: { type: DataTypes.TEXT, allowNull: false, defaultValue: "{}" },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...stamps,
  });
  await qi.addIndex("season_phases", ["team_id", "starts_on"]);
  await qi.createTable("meets", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: team,
    group_id: group,
    athlete_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: "athletes", key: "id" },
      onDelete: "CASCADE",
    },
    name: { type: DataTypes.STRING(120), allowNull: false },
    date: { type: DataTypes.DATEONLY, allowNull: false },
    priority: { type: DataTypes.STRING(1), allowNull: false },
    ...stamps,
  });
  await qi.addIndex("meets", ["team_id", "date"]);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("meets");
  await qi.dropTable("season_phases");
};
