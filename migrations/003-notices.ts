import { DataTypes, type QueryInterface } from "sequelize";
import type { MigrationFn } from "umzug";

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
  await qi.createTable("alerts", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    kind: { type: DataTypes.STRING(24), allowNull: false },
    level: { type: DataTypes.STRING(10), allowNull: false },
    metric: { type: DataTypes.STRING(20), allowNull: true },
    value: { type: DataTypes.FLOAT, allowNull: false },
    threshold: { type: DataTypes.FLOAT, allowNull: false },
    date: { type: DataTypes.DATEONLY, allowNull: false },
    week_start: { type: DataTypes.DATEONLY, allowNull: false },
    basis: { type: DataTypes.STRING(8), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    provisional: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    // Whether the engine still raised this flag at the last evaluation of its week.
    flagged: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    status: { type: DataTypes.STRING(14), allowNull: false, defaultValue: "open" },
    note: { type: DataTypes.TEXT, allowNull: true },
    acknowledged_by: userOrNull,
    acknowledged_at: { type: DataTypes.DATE, allowNull: true },
    resolved_by: userOrNull,
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  // One unresolved alert per athlete × kind × week, enforced by SQLite itself (partial index).
  await qi.addIndex("alerts", ["athlete_id", "kind", "week_start"], {
    unique: true,
    name: "alerts_one_unresolved",
    where: { status: ["open", "acknowledged"] },
  });
  await qi.addIndex("alerts", ["team_id", "status", "created_at"], { name: "alerts_team_status" });
  await qi.addIndex("alerts", ["athlete_id", "kind", "week_start", "id"], { name: "alerts_key" });

  await qi.createTable("outbox_messages", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "teams", key: "id" }, ...setNull },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    to_email: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    ical_method: { type: DataTypes.STRING(10), allowNull: true },
    ical_content: { type: DataTypes.TEXT, allowNull: true },
    dedupe_key: { type: DataTypes.STRING(200), allowNull: true, unique: true },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "pending" },
    attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    max_attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 },
    next_attempt_at: { type: DataTypes.DATE, allowNull: false },
    lease_token: { type: DataTypes.STRING(40), allowNull: true },
    lease_until: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.TEXT, allowNull: true },
    message_id: { type: DataTypes.STRING(200), allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("outbox_messages", ["status", "next_attempt_at"], { name: "outbox_due" });

  await qi.createTable("calendar_tokens", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    athlete_id: athlete,
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    // The token sealed with the app secret (AES-256-GCM), so its owner can see the link again.
    token_sealed: { type: DataTypes.TEXT, allowNull: true },
    created_by: userOrNull,
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("calendar_tokens", ["athlete_id"], {
    unique: true,
    name: "calendar_tokens_one_active",
    where: { revoked_at: null },
  });

  await qi.createTable("notification_settings", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    team_id: team,
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, ...cascade },
    alert_email: { type: DataTypes.STRING(10), allowNull: false },
    last_digest_at: { type: DataTypes.DATE, allowNull: true },
    alerts_seen_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("notification_settings", ["user_id", "team_id"], {
    unique: true,
    name: "notification_settings_user_team",
  });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ["notification_settings", "calendar_tokens", "outbox_messages", "alerts"])
    await qi.dropTable(table);
};
