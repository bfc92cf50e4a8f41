import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Physio restrictions on an athlete's training, and every time a coach planned past one (with the reason).

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const cascade = { onDelete: "CASCADE", onUpdate: "CASCADE" } as const;
const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;
const team = { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade };
const athlete = { type: DataTypes.INTEGER, allowNull: false, references: { model: "athletes", key: "id" }, ...cascade };
const userOrNull = { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, ...setNull };

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("restrictions", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    // "no_kind" | "max_intensity" | "contact_cap" (lib/restrictions/rules.ts)
    rule: { type: DataTypes.STRING(20), allowNull: false },
    // JSON array of block kinds, for "no_kind".
    block_kinds: { type: DataTypes.TEXT, allowNull: true },
    // % of vmax for "max_intensity", contacts per session for "contact_cap".
    limit_value: { type: DataTypes.FLOAT, allowNull: true },
    starts_on: { type: DataTypes.DATEONLY, allowNull: false },
    ends_on: { type: DataTypes.DATEONLY, allowNull: true },
    lifted_on: { type: DataTypes.DATEONLY, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: false },
    created_by: userOrNull,
    lifted_by: userOrNull,
    ...timestamps,
  });
  await qi.addIndex("restrictions", ["athlete_id", "starts_on"], { name: "restrictions_athlete" });
  await qi.addIndex("restrictions", ["team_id"], { name: "restrictions_team" });

  await qi.createTable("restriction_overrides", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    restriction_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "restrictions", key: "id" },
      ...cascade,
    },
    athlete_id: athlete,
    // The session stays linked while it exists; the date and what broke the rule are kept either way.
    session_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: "planned_sessions", key: "id" },
      ...setNull,
    },
    session_date: { type: DataTypes.DATEONLY, allowNull: false },
    detail: { type: DataTypes.TEXT, allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    user_id: userOrNull,
    ...timestamps,
  });
  await qi.addIndex("restriction_overrides", ["restriction_id"], { name: "restriction_overrides_restriction" });
  await qi.addIndex("restriction_overrides", ["athlete_id", "session_date"], { name: "restriction_overrides_athlete" });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ["restriction_overrides", "restrictions"]) await qi.dropTable(table);
};
