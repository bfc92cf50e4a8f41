// npm run bench:season: the season view for an invented squad of 30 athletes × 40 weeks, and writing a 6-week
// progression then reading the forecast again, in a fresh SQLite file. Prints figures (targets: view < 1 s,
// progression + updated forecast < 200 ms is the aim; lib/season/README.md).
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { shiftWeek, startOfWeek } from "../lib/dates/plain-date";

const ATHLETES = Number(process.env.BENCH_ATHLETES ?? 30);
const WEEKS = 40;
const RUNS = Number(process.env.BENCH_RUNS ?? 5);

const ms = (t: number) => `${(performance.now() - t).toFixed(0)} ms`;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  const dir = mkdtempSync(join(tmpdir(), "sprintwright-season-"));
  process.env.DATABASE_URL = `file:${join(dir, "bench.sqlite")}`;
  const { db, closeDb } = await import("../models");
  const { createMigrator } = await import("../lib/db/migrator");
  const { seedSquad } = await import("../lib/seed/seed-squad");
  const { rebuildLedger } = await import("../lib/data/ledger-rebuild");
  const { getSeasonView } = await import("../lib/data/season-view");
  const { generateProgression } = await import("../lib/services/season");
  const { teamToday } = await import("../lib/dates/zoned");
  const d = await db();
  await createMigrator(d.sequelize).up();
  const today = teamToday({ timeZone: "Europe/London", now: new Date() });
  let t = performance.now();
  const squad = await seedSquad(d, { name: "Bench Season", athletes: ATHLETES, seasons: 1, today });
  await rebuildLedger({});
  console.log(`seeded ${ATHLETES} athletes × 1 season (${squad.sessions} sessions) and its ledger in ${ms(t)}`);
  const coach = await d.User.create({ name: "Bench Coach", email: "bench.coach@season.test", passwordHash: null });
  await d.Membership.create({ teamId: squad.teamId, userId: coach.id, role: "coach" });

  const week = startOfWeek(today, 1);
  const from = shiftWeek(week, -20);
  const view = async () => getSeasonView({ teamId: squad.teamId, from, weeks: WEEKS });
  await view();
  const reads: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    t = performance.now();
    await view();
    reads.push(performance.now() - t);
  }
  console.log(
    `season view, ${ATHLETES} athletes × ${WEEKS} weeks: median ${median(reads).toFixed(0)} ms (target < 1000 ms)`,
  );

  const writes: number[] = [];
  const after: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    t = performance.now();
    await generateProgression({
      teamId: squad.teamId,
      actorUserId: coach.id,
      input: {
        sourceWeek: shiftWeek(week, 1),
        firstWeek: shiftWeek(week, 2),
        weeks: 6,
        rule: { kind: "build", weeklyIncreasePct: 8 + i, buildWeeks: 3, unloadPct: 40 },
      },
    });
    writes.push(performance.now() - t);
    t = performance.now();
    await view();
    after.push(performance.now() - t);
  }
  console.log(
    `6-week progression for ${ATHLETES} athletes: write median ${median(writes).toFixed(0)} ms, ` +
      `forecast read after it ${median(after).toFixed(0)} ms (aim: both < 200 ms)`,
  );
  await closeDb();
  rmSync(dir, { recursive: true, force: true });
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
