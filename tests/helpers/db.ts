import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import pg from "pg";
import { afterAll } from "vitest";
import { createMigrator } from "@/lib/db/migrator";
import { closeDb, db, type Db } from "@/models";

/** Set by `npm run test:postgres`: the cluster's maintenance database; each test file gets a database of its own. */
const POSTGRES = /^postgres(ql)?:\/\//i.test(process.env.DATABASE_URL ?? "")
  ? (process.env.SPRINTWRIGHT_PG_ADMIN_URL ??= process.env.DATABASE_URL!)
  : null;

export const onPostgres = POSTGRES !== null;

async function admin(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: POSTGRES! });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/** A fresh, empty PostgreSQL database for this test file; dropped afterwards. */
async function postgresDatabase(): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `sw_test_${process.pid}_${randomBytes(4).toString("hex")}`;
  await admin(`CREATE DATABASE ${name}`);
  const url = new URL(POSTGRES!);
  url.pathname = `/${name}`;
  return { url: url.toString(), drop: () => admin(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`) };
}

/**
 * Points the app's database at a throwaway SQLite file for this test file (or, under `npm run test:postgres`, a
 * throwaway PostgreSQL database), migrates it, and removes it afterwards. Each vitest file runs in its own
 * process (pool: forks), so the cached handle is per file. `storage` is the SQLite file ("" on PostgreSQL).
 */
export async function setupTestDb(): Promise<Db & { storage: string }> {
  let storage = "";
  let cleanup: () => Promise<void>;
  if (POSTGRES) {
    const database = await postgresDatabase();
    process.env.DATABASE_URL = database.url;
    cleanup = database.drop;
  } else {
    const dir = mkdtempSync(join(tmpdir(), "sprintwright-test-"));
    storage = join(dir, "test.sqlite");
    process.env.DATABASE_URL = `file:${storage}`;
    cleanup = async () => rmSync(dir, { recursive: true, force: true });
  }
  await closeDb();
  const d = await db();
  await createMigrator(d.sequelize).up();
  afterAll(async () => {
    await closeDb();
    await cleanup();
  });
  return { ...d, storage };
}
