// SQLite writes on a real file: busy_timeout reaches every connection Sequelize opens, writes from one process
// queue instead of starving each other, and a lock held by another connection ends in 503 with Retry-After.
import sqlite3 from "sqlite3";
import { QueryTypes, type Transaction } from "sequelize";
import { describe, expect, it } from "vitest";
import { BUSY_TIMEOUT_MS } from "@/lib/db/sqlite";
import { databaseState } from "@/lib/db/health";
import { runAction } from "@/lib/action-result";
import { errorResponse } from "@/lib/http";
import { createTestTeam } from "../helpers/fixtures";
import { onPostgres, setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { teamId } = await createTestTeam(d, { name: "Queue Club" });

const busyTimeout = async (transaction?: Transaction) => {
  const [row] = await d.sequelize.query<{ timeout: number }>("PRAGMA busy_timeout", {
    type: QueryTypes.SELECT,
    transaction,
  });
  return row!.timeout;
};
const newTemplate = (title: string, transaction?: Transaction) =>
  d.BlockTemplate.create(
    { teamId, kind: "strength", title, running: null, drills: null, notes: null, durationMin: 30, plannedRpe: 5 },
    { transaction },
  );

function otherConnection(): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const c = new sqlite3.Database(d.storage, (err) => (err ? reject(err) : resolve(c)));
  });
}
const exec = (c: sqlite3.Database, sql: string) =>
  new Promise<void>((resolve, reject) => c.exec(sql, (err) => (err ? reject(err) : resolve())));

// SQLite only: busy_timeout, the file lock and the in-process write queue are how SQLite takes one writer at a
// time; on PostgreSQL the advisory write lock does that (lib/db/postgres.ts, tests/integration/postgres-locks.test.ts).
describe.skipIf(onPostgres)("SQLite writes", () => {
  it("sets busy_timeout on the shared connection and on each transaction's own connection", async () => {
    expect(await busyTimeout()).toBe(BUSY_TIMEOUT_MS);
    await d.sequelize.transaction(async (t) => expect(await busyTimeout(t)).toBe(BUSY_TIMEOUT_MS));
  });

  it("commits 60 parallel transactions and 60 parallel plain writes, none lost", async () => {
    const before = await d.BlockTemplate.count({ where: { teamId } });
    await Promise.all([
      ...Array.from({ length: 60 }, (_, i) =>
        d.sequelize.transaction(async (t) => {
          const row = await newTemplate(`In a transaction ${i}`, t);
          await row.update({ notes: "checked" }, { transaction: t });
        }),
      ),
      ...Array.from({ length: 60 }, (_, i) => newTemplate(`On its own ${i}`)),
      // Without a callback (as findOrCreate does): the turn ends at commit or rollback.
      ...Array.from({ length: 5 }, async (_, i) => {
        const t = await d.sequelize.transaction();
        await newTemplate(`Unmanaged ${i}`, t);
        await (i === 0 ? t.rollback() : t.commit());
      }),
    ]);
    expect(await d.BlockTemplate.count({ where: { teamId } })).toBe(before + 124);
  });

  it(
    "a lock another connection holds: the first write waits busy_timeout, the ones queued behind it give up with it, " +
      "all answer 503",
    async () => {
      const other = await otherConnection();
      await exec(other, "BEGIN IMMEDIATE");
      try {
        expect(await databaseState({ sequelize: d.sequelize, storage: d.storage })).toBe("busy");
        const started = Date.now();
        const pending = Promise.all([
          Promise.allSettled(Array.from({ length: 5 }, (_, i) => newTemplate(`Blocked ${i}`))),
          runAction(() => newTemplate("Blocked in a form")),
        ]);
        // Now our own writer holds the turn, stuck at BEGIN: health still says busy, without waiting for it.
        await new Promise((r) => setTimeout(r, 300));
        const asked = Date.now();
        expect(await databaseState({ sequelize: d.sequelize, storage: d.storage })).toBe("busy");
        expect(Date.now() - asked).toBeLessThan(1000);
        const [results, action] = await pending;
        const elapsed = Date.now() - started;
        // A server action's form shows the same plain message instead of failing.
        expect(action).toEqual({ ok: false, message: expect.stringMatching(/busy.*Nothing was saved/) });
        expect(results.every((r) => r.status === "rejected")).toBe(true);
        // One busy_timeout in all, not one per queued write (nor Sequelize's five retries of each).
        expect(elapsed).toBeGreaterThanOrEqual(BUSY_TIMEOUT_MS - 100);
        expect(elapsed).toBeLessThan(2 * BUSY_TIMEOUT_MS);
        for (const r of results) {
          const res = errorResponse((r as PromiseRejectedResult).reason);
          expect(res.status).toBe(503);
          expect(res.headers.get("retry-after")).toMatch(/^[1-9]\d*$/);
          expect(((await res.json()) as { error: { code: string } }).error.code).toBe("busy");
        }
      } finally {
        await exec(other, "ROLLBACK");
        await new Promise((r) => other.close(r));
      }
      expect(await databaseState({ sequelize: d.sequelize, storage: d.storage })).toBe("ok");
      // The connection of the transaction that never began is closed, not left open.
      expect(Object.keys(d.sequelize.connectionManager.connections)).toEqual(["default"]);
      await newTemplate("After the lock");
      expect(await d.BlockTemplate.count({ where: { teamId, title: "After the lock" } })).toBe(1);
      expect(await d.BlockTemplate.count({ where: { teamId, title: "Blocked 0" } })).toBe(0);
    },
    30_000,
  );
});
