import { databaseStorage } from "@/lib/env";
import { closeDb, db } from "@/models";
import { createTestTeam } from "./fixtures";

/**
 * A team of its own inside a running app's database (browser and HTTP tests), written through the models
 * like the integration tests' teams, so a test counts its own rows instead of the demo seed's. Everyone
 * signs in with TEST_PASSWORD (./fixtures).
 */
export async function createAppTeam(dbPath: string, options: Parameters<typeof createTestTeam>[1] = {}) {
  process.env.DATABASE_URL = `file:${dbPath}`;
  // The environment is read once per process: refuse to write anywhere but the app's file.
  if (databaseStorage() !== dbPath)
    throw new Error(`createAppTeam: the database is ${databaseStorage()}, not ${dbPath}`);
  await closeDb();
  try {
    return await createTestTeam(await db(), options);
  } finally {
    await closeDb();
  }
}
