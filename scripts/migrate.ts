// Usage: tsx scripts/migrate.ts up | down | reset
import { createMigrator } from "@/lib/db/migrator";
import { databaseStorage } from "@/lib/env";
import { closeDb, db } from "@/models";

async function main() {
  const command = process.argv[2] ?? "up";
  const { sequelize } = await db();
  const migrator = createMigrator(sequelize);
  if (command === "up") {
    const done = await migrator.up();
    console.log(
      `migrated ${databaseStorage()}: ${done.length ? done.map((m) => m.name).join(", ") : "already up to date"}`,
    );
  } else if (command === "down") {
    const undone = await migrator.down();
    console.log(`rolled back: ${undone.map((m) => m.name).join(", ") || "nothing"}`);
  } else if (command === "reset") {
    await migrator.down({ to: 0 });
    const done = await migrator.up();
    console.log(`reset ${databaseStorage()}: ${done.map((m) => m.name).join(", ")}`);
  } else {
    throw new Error(`unknown command ${command}; use up, down or reset`);
  }
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
