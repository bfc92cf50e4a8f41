import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { closeDb, db, type Db } from "@/models";

/**
 * Points the app's database at a throwaway SQLite file for this test file, migrates it, and removes it
 * afterwards. Each vitest file runs in its own process (pool: forks), so the cached handle is per file.
 */
export async function setupTestDb(): Promise<Db & { storage: string }> {
  const dir = mkdtempSync(join(tmpdir(), "sprintwright-test-"));
  const storage = join(dir, "test.sqlite");
  process.env.DATABASE_URL = `file:${storage}`;
  await closeDb();
  const d = await db();
  await createMigrator(d.sequelize).up();
  afterAll(async () => {
    await closeDb();
    rmSync(dir, { recursive: true, force: true });
  });
  return { ...d, storage };
}
