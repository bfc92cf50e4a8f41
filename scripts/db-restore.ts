// Usage: npm run db:restore -- <backup file> [--yes]
// Without --yes it only checks the file and says what it would replace. Stop the app before restoring.
import { inspectDatabase, restoreDatabase, type Inspection } from "@/lib/db/backup";
import { migrationNames } from "@/lib/db/migrator";
import { databaseDialect, databaseStorage } from "@/lib/env";

const describe = (i: Inspection) =>
  `${Object.entries(i.counts)
    .map(([t, n]) => `${n} ${t}`)
    .join(", ")}; last migration ${i.migrations.at(-1) ?? "none"}`;

async function main(): Promise<number> {
  if (databaseDialect() === "postgres") {
    console.error("DATABASE_URL is PostgreSQL: restore with pg_restore (db:restore is for the SQLite file)");
    return 2;
  }
  const args = process.argv.slice(2);
  const file = args.find((a) => !a.startsWith("--"));
  if (!file) {
    console.error("usage: npm run db:restore -- <backup file> [--yes]");
    return 2;
  }
  const storage = databaseStorage();
  const known = migrationNames();
  const check = await inspectDatabase(file, known);
  if (check.problems.length) {
    console.error(`Refusing to restore ${file}:\n  ${check.problems.join("\n  ")}`);
    return 1;
  }
  const live = await inspectDatabase(storage);
  console.log(`backup:   ${file}\n          integrity_check ok; ${describe(check)}`);
  console.log(`replaces: ${storage}\n          ${live.problems.length ? live.problems.join("; ") : describe(live)}`);
  if (!args.includes("--yes")) {
    console.error(
      "Nothing changed. Stop the app, then run again with --yes to restore (the current database is backed up first).",
    );
    return 1;
  }
  const { saved, restored } = await restoreDatabase({ from: file, storage, knownMigrations: known });
  console.log(`restored: ${storage} passes integrity_check; ${describe(restored)}`);
  if (saved) console.log(`the database as it was: ${saved}`);
  if (restored.migrations.length < known.length)
    console.log("The backup is from an older version: `npm start` (or `npm run db:migrate`) brings it up to date.");
  return 0;
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(`restore failed: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  },
);
