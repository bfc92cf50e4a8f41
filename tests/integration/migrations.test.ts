import { describe, expect, it } from "vitest";
import { QueryTypes, UniqueConstraintError } from "sequelize";
import { createMigrator } from "@/lib/db/migrator";
import { createTestTeam } from "../helpers/fixtures";
import { onPostgres, setupTestDb } from "../helpers/db";

const d = await setupTestDb();

async function tables(): Promise<string[]> {
  const [rows] = await d.sequelize.query(
    onPostgres
      ? "SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename"
      : "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name",
  );
  return (rows as { name: string }[]).map((r) => r.name);
}

describe("migrations", () => {
  it("go all the way down and up again", async () => {
    const migrator = createMigrator(d.sequelize);
    const applied = (await migrator.executed()).map((m) => m.name);
    expect(applied.slice(0, 2)).toEqual(["001-foundation", "002-plan"]);
    await migrator.down({ to: 0 });
    expect(await tables()).toEqual(["SequelizeMeta"]);
    await migrator.up();
    expect(await tables()).toEqual(
      expect.arrayContaining(["teams", "users", "memberships", "athletes", "planned_sessions", "session_logs"]),
    );
  });

  // SQLite's own settings (PostgreSQL enforces foreign keys and has no journal mode).
  it.skipIf(onPostgres)("turns on foreign keys and WAL", async () => {
    const [fk] = await d.sequelize.query<{ foreign_keys: number }>("PRAGMA foreign_keys", { type: QueryTypes.SELECT });
    const [jm] = await d.sequelize.query<{ journal_mode: string }>("PRAGMA journal_mode", { type: QueryTypes.SELECT });
    expect(fk.foreign_keys).toBe(1);
    expect(jm.journal_mode).toBe("wal");
  });
});

describe("constraints", () => {
  it("keeps e-mails unique regardless of case", async () => {
    await d.User.create({ name: "One", email: "Same@Example.test", passwordHash: null });
    await expect(d.User.create({ name: "Two", email: "same@example.test", passwordHash: null })).rejects.toBeInstanceOf(
      UniqueConstraintError,
    );
  });

  it("cascades a team's deletion to memberships, athletes and sessions but keeps user accounts", async () => {
    const { teamId, users } = await createTestTeam(d, { name: "Cascade Club" });
    const athleteId = Object.values(users).find((u) => u.athleteId)!.athleteId!;
    await d.PlannedSession.create({
      teamId,
      athleteId,
      date: "2026-11-02",
      startTime: "16:00",
      durationMin: 60,
      title: "Acc",
      plannedRpe: 6,
      notes: null,
      publishedAt: null,
    });
    await d.Team.destroy({ where: { id: teamId } });
    expect(await d.Membership.count({ where: { teamId } })).toBe(0);
    expect(await d.Athlete.count({ where: { teamId } })).toBe(0);
    expect(await d.PlannedSession.count({ where: { athleteId } })).toBe(0);
    expect(await d.User.count({ where: { id: Object.values(users).map((u) => u.userId) } })).toBe(5);
  });

  it("unlinks an athlete profile when its user account is deleted, keeping the history", async () => {
    const { users } = await createTestTeam(d, { name: "Unlink Club" });
    const athlete = Object.values(users).find((u) => u.athleteId)!;
    await d.User.destroy({ where: { id: athlete.userId } });
    const row = await d.Athlete.findByPk(athlete.athleteId!);
    expect(row?.userId).toBeNull();
  });
});
