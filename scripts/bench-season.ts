// npm run bench:season: the season view for an invented squad of 30 athletes × 40 weeks; the forecast of a 6-week
// progression as the season screen previews it (the base read once, then each rule worked out in the page); and
// writing the progression then reading the view again, in a fresh SQLite file. Prints figures (targets: view
// < 1 s, a regenerated progression's forecast < 200 ms; lib/season/README.md).
import { mkdtempSync, rmSync } from "node:fs";
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { addDays, shiftWeek, startOfWeek } from "../lib/dates/plain-date";

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
  const { getProgressionBase } = await import("../lib/data/season-preview");
  const { previewProgression, withPreview } = await import("../lib/season/forecast-preview");
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

  const seasonView = await view();
  const progression = { sourceWeek: shiftWeek(week, 1), firstWeek: shiftWeek(week, 2) };
  const through = addDays(shiftWeek(from, WEEKS - 1), 6);
  const bases: number[] = [];
  let base = await getProgressionBase({ teamId: squad.teamId, ...progression, through });
  for (let i = 0; i < RUNS; i++) {
    t = performance.now();
    base = await getProgressionBase({ teamId: squad.teamId, ...progression, through });
    bases.push(performance.now() - t);
  }
  const previews: number[] = [];
  const previewCpu: number[] = [];
  for (let i = 0; i < RUNS * 4; i++) {
    const cpu = process.cpuUsage();
    t = performance.now();
    const rule = { kind: "build" as const, weeklyIncreasePct: 5 + i, buildWeeks: 3, unloadPct: 40 };
    withPreview(seasonView, previewProgression(base, { weeks: 6, rule }));
    previews.push(performance.now() - t);
    const used = process.cpuUsage(cpu);
    previewCpu.push((used.user + used.system) / 1000);
  }
  console.log(
    `progression preview base (read once when the form opens): median ${median(bases).toFixed(0)} ms, ` +
      `${(JSON.stringify(base).length / 1024).toFixed(0)} KB of JSON`,
  );
  console.log(
    `forecast of a regenerated 6-week progression for ${ATHLETES} athletes, worked out in the page: ` +
      `median ${median(previews).toFixed(1)} ms (CPU ${median(previewCpu).toFixed(1)} ms), ` +
      `slowest ${Math.max(...previews).toFixed(1)} ms (target < 200 ms; load average ${loadavg()[0].toFixed(1)})`,
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
    `writing the 6-week progression for ${ATHLETES} athletes: median ${median(writes).toFixed(0)} ms, ` +
      `season view read after it ${median(after).toFixed(0)} ms (no target: the forecast above is on screen first)`,
  );
  await closeDb();
  rmSync(dir, { recursive: true, force: true });
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
