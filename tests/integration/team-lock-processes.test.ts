// Several app processes on one database: two real processes write to the same team at once through the per-team
// write transaction (inTeamTransaction, lib/data/transaction.ts: BEGIN IMMEDIATE with SQLite's busy wait, or
// PostgreSQL's per-team advisory lock under `npm run test:postgres`). Every write must succeed (no error, so no
// 500 from a handler), no read-modify-write may be lost, and no two turns may overlap in time.
import { spawn } from "node:child_process";
import { createInterface } from "node:readline";
import { describe, expect, it } from "vitest";
import { createTestTeam } from "../helpers/fixtures";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const team = await createTestTeam(d, { name: "Lock Process Club" });
const EACH = 40;

type Report = { done: number; errors: string[]; held: [number, number][] };

function startWriter() {
  const child = spawn(
    process.execPath,
    [
      "--conditions=react-server",
      "--import",
      "tsx",
      "tests/helpers/team-writer-process.ts",
      String(team.teamId),
      String(EACH),
    ],
    { env: process.env, stdio: ["pipe", "pipe", "inherit"] },
  );
  const lines = createInterface({ input: child.stdout! });
  const ready = new Promise<void>((resolve) => lines.on("line", (l) => l === "ready" && resolve()));
  const result = new Promise<Report>((resolve, reject) => {
    lines.on("line", (l) => l.startsWith("{") && resolve(JSON.parse(l) as Report));
    child.once("exit", (code) => (code === 0 ? undefined : reject(new Error(`writer exited with ${code}`))));
  });
  return { child, ready, result };
}

describe("per-team write lock across processes", () => {
  it(
    "two processes writing one team take turns: no error, no lost write, no overlapping turn",
    { timeout: 120_000 },
    async () => {
      await d.Team.update({ name: "counter #0" }, { where: { id: team.teamId } });
      const writers = [startWriter(), startWriter()];
      await Promise.all(writers.map((w) => w.ready));
      for (const w of writers) w.child.stdin!.write("go\n");
      const [a, b] = await Promise.all(writers.map((w) => w.result));
      expect([...a.errors, ...b.errors]).toEqual([]);
      expect(a.done + b.done).toBe(2 * EACH);
      expect((await d.Team.findByPk(team.teamId))!.name).toBe(`counter #${2 * EACH}`);
      // One process's turn never starts before the other's has ended (its commit comes after the turn's end).
      const turns = [...a.held.map((t) => ({ t, by: "a" })), ...b.held.map((t) => ({ t, by: "b" }))];
      turns.sort((x, y) => x.t[0] - y.t[0]);
      for (let i = 1; i < turns.length; i++) expect(turns[i].t[0]).toBeGreaterThanOrEqual(turns[i - 1].t[1]);
      // Both had turns while the other was running (the test would prove nothing if one ran after the other).
      const switches = turns.filter((x, i) => i > 0 && x.by !== turns[i - 1].by).length;
      console.log(`team lock across processes: ${a.done} + ${b.done} writes, ${switches} hand-overs`);
      expect(switches).toBeGreaterThan(1);
    },
  );
});
