import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// A second result accepted for a day that already has one replaces it in the athlete's speed profile
// (lib/speed/README.md §4); what it replaced is kept here: the values, the test, who had accepted it and when,
// and who replaced it and when.
const ref = (model: string, onDelete: "CASCADE" | "SET NULL") => ({
  references: { model, key: "id" },
  onDelete,
  onUpdate: "CASCADE",
});

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("speed_profile_replacements", {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("teams", "CASCADE") },
    athlete_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("athletes", "CASCADE") },
    /** The profile entry (the day) whose values were replaced. */
    entry_id: { type: DataTypes.INTEGER, allowNull: false, ...ref("speed_profile_entries", "CASCADE") },
    effective_from: { type: DataTypes.DATEONLY, allowNull: false },
    speed_test_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("speed_tests", "SET NULL") },
    accepted_by_user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("users", "SET NULL") },
    accepted_at: { type: DataTypes.DATE, allowNull: false },
    /** JSON: the profile values the entry held before (lib/speed/profile-values.ts). */
    values: { type: DataTypes.TEXT, allowNull: false },
    replaced_by_user_id: { type: DataTypes.INTEGER, allowNull: true, ...ref("users", "SET NULL") },
    replaced_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("speed_profile_replacements", ["athlete_id", "effective_from"], {
    name: "speed_profile_replacements_athlete_from",
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("speed_profile_replacements");
};
