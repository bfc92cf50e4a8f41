import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// The medical staff's availability of each athlete (a history: the newest row is the current level), and a short
// thread of messages under each planned session between the athlete and their staff.

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const cascade = { onDelete: "CASCADE", onUpdate: "CASCADE" } as const;
const setNull = { onDelete: "SET NULL", onUpdate: "CASCADE" } as const;
const team = { type: DataTypes.INTEGER, allowNull: false, references: { model: "teams", key: "id" }, ...cascade };
const userOrNull = { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, ...setNull };

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("athlete_availability", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "athletes", key: "id" }, ...cascade },
    // "full" | "modified" | "unavailable" (lib/availability/levels.ts)
    level: { type: DataTypes.STRING(12), allowNull: false },
    starts_on: { type: DataTypes.DATEONLY, allowNull: false },
    // Expected first day back at full training; null = not known yet.
    return_on: { type: DataTypes.DATEONLY, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: false },
    // The restriction the planner's guard checks for this level (none for full training); lifted when replaced.
    restriction_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: "restrictions", key: "id" },
      ...setNull,
    },
    created_by: userOrNull,
    ...timestamps,
  });
  await qi.addIndex("athlete_availability", ["athlete_id", "id"], { name: "athlete_availability_athlete" });
  await qi.addIndex("athlete_availability", ["team_id"], { name: "athlete_availability_team" });

  await qi.createTable("session_messages", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    session_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "planned_sessions", key: "id" },
      ...cascade,
    },
    user_id: userOrNull,
    body: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex("session_messages", ["session_id", "id"], { name: "session_messages_session" });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ["session_messages", "athlete_availability"]) await qi.dropTable(table);
};
