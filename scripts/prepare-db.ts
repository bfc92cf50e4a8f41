import { createMigrator } from "@/lib/db/migrator";
import { databaseStorage } from "@/lib/env";
import { seedDemo } from "@/lib/seed";
import { closeDb, db } from "@/models";

/** Brings the database to the latest migration and seeds the demo club into an empty one. */
export async function prepareDatabase({ seed = true }: { seed?: boolean } = {}) {
  const d = await db();
  const done = await createMigrator(d.sequelize).up();
  if (done.length) console.log(`db: applied ${done.map((m) => m.name).join(", ")} to ${databaseStorage()}`);
  if (seed && (await d.Team.count()) === 0) {
    const club = await seedDemo(d, { today: process.env.SEED_TODAY });
    console.log(`db: seeded the demo club (${Object.keys(club.athleteIds).length} athletes)`);
  }
  await closeDb();
}
