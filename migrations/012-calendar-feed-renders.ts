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
  }
};

// BIGINT stays on the way down: narrowing could fail on stored values and is harmless to keep.
export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("calendar_feed_renders");
};
