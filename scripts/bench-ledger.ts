// npm run bench:ledger: the whole-ledger rebuild (npm run db:rebuild-ledger) on an invented squad of 60 athletes
// × 5 seasons in a fresh SQLite file, and one athlete's refresh after a change in the current week. Prints figures.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { dayIndex } from "../lib/dates/plain-date";

const ATHLETES = Number(process.env.BENCH_ATHLETES ?? 60);
const SEASONS = Number(process.env.BENCH_SEASONS ?? 5);

async function main() {
  const dir = mkdtempSync(join(tmpdir(), "sprintwright-ledger-"));
  process.env.DATABASE_URL = `file:${join(dir, "bench.sqlite")}`;
  const { db, closeDb } = await import("../models");
  const { createMigrator } = await import("../lib/db/migrator");
  const { seedSquad } = await import("../lib/seed/seed-squad");
  const { rebuildLedger } = await import("../lib/data/ledger-rebuild");
  const { refreshLedger } = await import("../lib/data/ledger");
  const { teamToday } = await import("../lib/dates/zoned");
  const d = await db();
  await createMigrator(d.sequelize).up();
  const today = teamToday({ timeZone: "Europe/London", now: new Date() });
  let t = performance.now();
  const squad = await seedSquad(d, { name: "Bench Harriers", athletes: ATHLETES, seasons: SEASONS, today });
  console.log(
    `seeded ${ATHLETES} athletes × ${SEASONS} seasons: ${squad.sessions} sessions in ${((performance.now() - t) / 1000).toFixed(1)} s`,
  );
  const report = await rebuildLedger({ progress: true });
  console.log(
    `whole-ledger rebuild: ${report.rows} rows for ${report.athletes} athletes in ${(report.ms / 1000).toFixed(2)} s wall, ` +
      `${(report.cpuMs / 1000).toFixed(2)} s CPU (target < 10 s)`,
  );
  const times: number[] = [];
  for (let i = 0; i < 20; i++) {
    const athleteId = squad.athleteIds[i % squad.athleteIds.length];
    t = performance.now();
    await d.sequelize.transaction((transaction) =>
      refreshLedger({ athleteIds: [athleteId], fromDay: dayIndex(today) - 3, transaction }),
    );
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  console.log(
    `one athlete's refresh from 3 days ago (5 seasons of history): p50 ${times[10].toFixed(1)} ms, p95 ${times[18].toFixed(1)} ms`,
  );
  await closeDb();
  if (process.env.BENCH_KEEP) console.log(`kept ${dir}`);
  else rmSync(dir, { recursive: true, force: true });
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
