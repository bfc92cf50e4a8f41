// Seeds the invented demo club into an empty database. Never exposed through a route.
import { seedDemo } from "@/lib/seed";
import { databaseStorage } from "@/lib/env";
import { closeDb, db } from "@/models";

async function main() {
  const d = await db();
  if ((await d.Team.count()) > 0 && !process.argv.includes("--force")) {
    console.log(`seed: ${databaseStorage()} already has data; skipping (db:reset starts over)`);
  } else {
    const club = await seedDemo(d, { today: process.env.SEED_TODAY });
    console.log(
      `seed: demo club ready in ${databaseStorage()} (team ${club.teamId}, ${Object.keys(club.athleteIds).length} athletes)`,
    );
  }
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
