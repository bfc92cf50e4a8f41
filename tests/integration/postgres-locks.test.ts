// PostgreSQL's write lock (lib/db/postgres.ts): writers of one team take turns, writers of two teams run side by
// side, and a write not confined to a team waits for all of them. Every transaction holds its own pooled
// connection, so each is a separate database session, as two app servers' would be. On SQLite one writer at a
// time is the file's lock and the write queue (tests/integration/db-writes.test.ts).
import { describe, expect, it } from "vitest";
import { createTestTeam } from "../helpers/fixtures";
import { onPostgres, setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { inTeamTransaction, inTransaction } = await import("@/lib/data/transaction");
const alpha = await createTestTeam(d, { name: "Alpha Lock Club" });
const beta = await createTestTeam(d, { name: "Beta Lock Club" });

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Starts a write transaction that stays open until `release()`; `inside` resolves once it holds its lock. */
function holdOpen(open: (body: () => Promise<void>) => Promise<void>) {
  let release!: () => void;
  let entered!: () => void;
  const gate = new Promise<void>((r) => (release = r));
  const inside = new Promise<void>((r) => (entered = r));
  const done = open(async () => {
    entered();
    await gate;
  });
  return { inside, release, done };
}

/** Reads the team's name as a counter and writes it back one higher: a lost update shows as a lower count. */
async function bump(teamId: number): Promise<void> {
  await inTeamTransaction(teamId, async (transaction) => {
    const team = await d.Team.findByPk(teamId, { transaction });
    const n = Number(team!.name.split("#")[1] ?? 0);
    await sleep(5);
    await d.Team.update({ name: `counter #${n + 1}` }, { where: { id: teamId }, transaction });
  });
}

describe.skipIf(!onPostgres)("PostgreSQL write locks", () => {
  it("a team's writer waits for the same team's, not for another team's; a database-wide one waits for both", async () => {
    const open = holdOpen((body) => inTeamTransaction(alpha.teamId, body));
    await open.inside;
    const order: string[] = [];
    const other = inTeamTransaction(beta.teamId, async () => void order.push("beta"));
    const same = inTeamTransaction(alpha.teamId, async () => void order.push("alpha"));
    const whole = inTransaction(async () => void order.push("database"));
    await other;
    await sleep(300);
    expect(order).toEqual(["beta"]);
    open.release();
    await Promise.all([open.done, same, whole]);
    expect([...order].sort()).toEqual(["alpha", "beta", "database"]);
  });

  it("a database-wide writer holds off every team's writer until it commits", async () => {
    const open = holdOpen((body) => inTransaction(body));
    await open.inside;
    const order: string[] = [];
    const a = inTeamTransaction(alpha.teamId, async () => void order.push("alpha"));
    const b = inTeamTransaction(beta.teamId, async () => void order.push("beta"));
    await sleep(300);
    expect(order).toEqual([]);
    open.release();
    await Promise.all([open.done, a, b]);
    expect([...order].sort()).toEqual(["alpha", "beta"]);
  });

  it("parallel read-modify-writes of two teams lose no update", async () => {
    await d.Team.update({ name: "counter #0" }, { where: { id: [alpha.teamId, beta.teamId] } });
    await Promise.all(Array.from({ length: 16 }, (_, i) => bump(i % 2 ? alpha.teamId : beta.teamId)));
    const names = (await d.Team.findAll({ where: { id: [alpha.teamId, beta.teamId] } })).map((t) => t.name);
    expect(names).toEqual(["counter #8", "counter #8"]);
  });
});
