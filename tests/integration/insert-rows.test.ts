import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { insertRowsReturningIds } from "@/lib/db/insert-rows";
import { insertSessions } from "@/lib/data/plan-sessions";
import { inTransaction } from "@/lib/data/transaction";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The bound many-row insert behind generated progressions: ids in the order of the rows, values stored exactly as
// Model.create stores them, and text Sequelize's own bulkCreate would cut short (a NUL) kept whole.
const d = await setupTestDb();
const team = await createTestTeam(d);
const athleteId = Object.values(team.users).find((u) => u.athleteId)!.athleteId!;

const FLYING = {
  sets: 1,
  reps: 3,
  distanceM: 30,
  intensityPct: 95,
  start: "flying" as const,
  runInM: 20,
  restSec: 240,
};

const session = (i: number) => ({
  athleteId,
  date: `2026-11-${String(1 + (i % 28)).padStart(2, "0")}`,
  startTime: "16:00",
  durationMin: 30 + i,
  title: `Session ${i}`,
  plannedRpe: 5,
  notes: null,
  blocks: [],
});

describe("insertRowsReturningIds", () => {
  it("returns each row's own id, across several statements", async () => {
    const rows = Array.from({ length: 700 }, (_, i) => ({
      teamId: team.teamId,
      ...session(i),
      status: "draft" as const,
      publishedAt: null,
    }));
    const ids = await inTransaction((transaction) => insertRowsReturningIds(d.PlannedSession, rows, transaction));
    expect(ids).toHaveLength(700);
    const stored = await d.PlannedSession.findAll({ where: { id: ids }, attributes: ["id", "title", "durationMin"] });
    const byId = new Map(stored.map((s) => [s.id, s]));
    ids.forEach((id, i) => {
      expect(byId.get(id)?.title).toBe(`Session ${i}`);
      expect(byId.get(id)?.durationMin).toBe(30 + i);
    });
  });

  it("stores dates, defaults and JSON as Model.create does, and keeps a NUL in text", async () => {
    const { blocks: none, ...fields } = session(1);
    expect(none).toEqual([]);
    const viaCreate = await d.PlannedSession.create({
      teamId: team.teamId,
      ...fields,
      title: "Fly 30\u0000 m",
      status: "draft",
      publishedAt: null,
    });
    const [id] = await inTransaction((transaction) =>
      insertSessions({
        teamId: team.teamId,
        sessions: [
          {
            ...session(1),
            title: "Fly 30\u0000 m",
            blocks: [{ kind: "max_velocity", title: "Flys", running: FLYING, drills: null, notes: null }],
          },
        ],
        transaction,
      }),
    );
    const [a, b] = await Promise.all([d.PlannedSession.findByPk(viaCreate.id), d.PlannedSession.findByPk(id)]);
    expect(b!.title).toBe("Fly 30\u0000 m");
    for (const key of ["date", "startTime", "status", "version", "sequence", "publishedAt"] as const)
      expect(b![key]).toEqual(a![key]);
    expect(b!.createdAt).toBeInstanceOf(Date);
    expect(Math.abs(b!.createdAt.getTime() - Date.now())).toBeLessThan(60_000);
    // The stored text has the same shape either way, so SQL comparing timestamps sees one format.
    const raw = await d.sequelize.query<{ id: number; created_at: unknown }>(
      `SELECT id, created_at FROM planned_sessions WHERE id IN (${viaCreate.id}, ${id})`,
      { type: QueryTypes.SELECT },
    );
    const shape = (v: unknown) => String(v).replace(/[0-9]/g, "9");
    expect(shape(raw[0].created_at)).toBe(shape(raw[1].created_at));
    const [block] = await d.SessionBlock.findAll({ where: { sessionId: id } });
    expect(block.position).toBe(0);
    expect(block.running).toEqual(FLYING);
  });
});
