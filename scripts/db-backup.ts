// Usage: npm run db:backup   (BACKUP_DIR chooses the folder; default backups/ beside the database file)
// Safe while the app runs: an online, consistent copy, checked with PRAGMA integrity_check.
import { backupDatabase } from "@/lib/db/backup";
import { databaseDialect, databaseStorage } from "@/lib/env";

async function main() {
  if (databaseDialect() === "postgres") throw new Error("DATABASE_URL is PostgreSQL: use pg_dump (and pg_restore)");
  const { file, bytes } = await backupDatabase({ storage: databaseStorage() });
  console.log(`backup: ${file} (${Math.ceil(bytes / 1024)} KiB), integrity_check ok`);
}

main().catch((err) => {
  console.error(`backup failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
