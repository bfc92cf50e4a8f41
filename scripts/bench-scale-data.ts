// One database for `npm run bench:scale` (run by it in a child process, one per dataset, because the app's
// models bind to one database per process): migrate, seed the demo or invented clubs (lib/seed), give the
// measured athlete a calendar link, and write what the benchmark needs to know beside the file.
//   node --conditions=react-server --import tsx scripts/bench-scale-data.ts '<dataset JSON>' <out.sqlite>
import { writeFileSync } from "node:fs";
import { createMigrator } from "@/lib/db/migrator";
import { rotateCalendarToken } from "@/lib/data/calendar-tokens";
import { seedDemo } from "@/lib/seed";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { seedScale } from "@/lib/seed/seed-scale";
import { closeDb, db } from "@/models";
import type { BenchDataset, BenchMeta } from "./bench-scale-sets";

async function main() {
  const [json, out] = process.argv.slice(2);
  const set = JSON.parse(json) as BenchDataset;
  process.env.DATABASE_URL = `file:${out}`;
  const started = performance.now();
  const d = await db();
  await createMigrator(d.sequelize).up();
  let meta: Omit<BenchMeta, "feedToken" | "seedMs" | "sessions">;
  if (set.kind === "demo") {
    const club = await seedDemo(d, { today: set.today });
    const athleteEmail = DEMO_ATHLETES.find((a) => a.email)!.email!;
    const athleteName = DEMO_ATHLETES.find((a) => a.email === athleteEmail)!.name;
    meta = {
      teamId: club.teamId,
      headCoachEmail: DEMO_STAFF.find((s) => s.role === "head_coach")!.email,
      athleteId: club.athleteIds[athleteName],
    };
  } else {
    const [club] = await seedScale(d, {
      clubs: set.clubs,
      athletesPerClub: set.athletes,
      seasons: set.seasons,
      today: set.today,
    });
    meta = { teamId: club.teamId, headCoachEmail: club.headCoachEmail, athleteId: club.athleteIds[0] };
  }
  const { token } = await rotateCalendarToken({ athleteId: meta.athleteId, createdBy: null });
  const sessions = await d.PlannedSession.count();
  const full: BenchMeta = { ...meta, feedToken: token, sessions, seedMs: Math.round(performance.now() - started) };
  await closeDb();
  writeFileSync(`${out}.json`, JSON.stringify(full));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
