// One app process writing to one team (tests/integration/team-lock-processes.test.ts starts two): says "ready",
// waits for "go" on stdin so both start together, then does read-modify-writes of the team's name as a counter
// through the per-team write transaction, and prints how many it did, which failed, and when each one held the lock.
import { createInterface } from "node:readline";
import { inTeamTransaction } from "@/lib/data/transaction";
import { closeDb, db } from "@/models";

const teamId = Number(process.argv[2]);
const count = Number(process.argv[3]);
// A clock both processes share (wall time at millisecond resolution would blur close turns).
const now = () => performance.timeOrigin + performance.now();

async function main() {
  const d = await db();
  console.log("ready");
  await new Promise<void>((resolve) => createInterface({ input: process.stdin }).once("line", () => resolve()));
  const held: [number, number][] = [];
  const errors: string[] = [];
  for (let i = 0; i < count; i++) {
    try {
      await inTeamTransaction(teamId, async (transaction) => {
        const start = now();
        const team = await d.Team.findByPk(teamId, { attributes: ["name"], transaction });
        const n = Number(team!.name.split("#")[1] ?? 0);
        // Long enough for the other process to try its turn while this one holds the lock.
        await new Promise((r) => setTimeout(r, 3));
        await d.Team.update({ name: `counter #${n + 1}` }, { where: { id: teamId }, transaction });
        held.push([start, now()]);
      });
    } catch (err) {
      errors.push(String(err));
    }
    // A pause between requests, as a real process has: without it the process that just committed takes the lock
    // straight back while the other sleeps in SQLite's busy handler, and one may finish before the other starts.
    await new Promise((r) => setTimeout(r, 20));
  }
  console.log(JSON.stringify({ done: count - errors.length, errors, held }));
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
