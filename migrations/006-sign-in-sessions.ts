import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

// Server-side sign-in sessions (each JWT names one row, so a sign-out or a password reset really ends it) and the
// counters of failed sign-ins that throttle guessing (rate-limiter-flexible's SQLite table layout).

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable("auth_sessions", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "CASCADE",
      onUpdate: "CASCADE",
    },
    // SHA-256 of the random session id carried in the JWT; the id itself is never stored.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    last_seen_at: { type: DataTypes.DATE, allowNull: false },
    // The absolute end, whatever the activity.
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("auth_sessions", ["user_id"], { name: "auth_sessions_user" });
  // Exactly the table RateLimiterSQLite would create for itself (key, points, expire in epoch ms).
  await qi.sequelize.query(
    "CREATE TABLE sign_in_limits (key TEXT PRIMARY KEY, points INTEGER NOT NULL DEFAULT 0, expire INTEGER)",
  );
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable("sign_in_limits");
  await qi.dropTable("auth_sessions");
};
