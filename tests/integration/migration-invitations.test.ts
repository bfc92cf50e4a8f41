// Migration 005 turns memberships nobody accepted (accounts without a password) into invitations, and back.
import { describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { createMigrator } from "@/lib/db/migrator";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const q = <T extends object>(sql: string, replacements: unknown[] = []) =>
  d.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
const run = (sql: string, replacements: unknown[] = []) => d.sequelize.query(sql, { replacements });
const stamp = "2026-11-01 10:00:00.000 +00:00";

describe("migration 005-member-invitations", () => {
  it("moves an unaccepted membership to its invitation, unlinks the athlete profile, and restores both on the way down", async () => {
    const migrator = createMigrator(d.sequelize);
    await migrator.down({ to: "005-member-invitations" });
    // The old model: an invited athlete was a membership of a password-less account, linked to the profile.
    await run(
      "INSERT INTO teams (id, name, time_zone, week_start_day, created_at, updated_at) VALUES (1, 'Old Club', 'Europe/London', 1, ?, ?)",
      [stamp, stamp],
    );
    await run(
      "INSERT INTO users (id, email, name, password_hash, created_at, updated_at) " +
        "VALUES (1, 'joined@old.test', 'Joined', 'x', ?, ?), (2, 'pending@old.test', 'Pending', NULL, ?, ?)",
      [stamp, stamp, stamp, stamp],
    );
    await run(
      "INSERT INTO memberships (team_id, user_id, role, created_at, updated_at) VALUES (1, 1, 'head_coach', ?, ?), (1, 2, 'athlete', ?, ?)",
      [stamp, stamp, stamp, stamp],
    );
    await run(
      "INSERT INTO athletes (id, team_id, user_id, name, plyo_level, created_at, updated_at) " +
        "VALUES (7, 1, 2, 'Pending Runner', 'beginner', ?, ?)",
      [stamp, stamp],
    );
    await run(
      "INSERT INTO invitations (team_id, user_id, purpose, token_hash, expires_at, used_at, created_at, updated_at) " +
        "VALUES (1, 2, 'invite', 'h1', '2026-11-08 10:00:00.000 +00:00', NULL, ?, ?)",
      [stamp, stamp],
    );

    await migrator.up();
    expect(await q<{ user_id: number }>("SELECT user_id FROM memberships ORDER BY user_id")).toEqual([{ user_id: 1 }]);
    expect(await q("SELECT email, name, role, athlete_id FROM invitations")).toEqual([
      { email: "pending@old.test", name: "Pending", role: "athlete", athlete_id: 7 },
    ]);
    expect(await q("SELECT user_id FROM athletes WHERE id = 7")).toEqual([{ user_id: null }]);

    await migrator.down({ to: "005-member-invitations" });
    expect(
      await q<{ user_id: number; role: string }>("SELECT user_id, role FROM memberships ORDER BY user_id"),
    ).toEqual([
      { user_id: 1, role: "head_coach" },
      { user_id: 2, role: "athlete" },
    ]);
    expect(await q("SELECT user_id FROM athletes WHERE id = 7")).toEqual([{ user_id: 2 }]);
    await migrator.up();
  });
});
