import { existsSync, mkdirSync, renameSync, rmSync, statSync } from "node:fs";
import { basename, dirname, join, resolve } from "node:path";
import sqlite3 from "sqlite3";
import { all, closeRaw, copyInto, exec, openRaw } from "./raw";

/** Where backups go unless BACKUP_DIR says otherwise: `backups/` beside the database file. */
function backupDir(storage: string, env = process.env.BACKUP_DIR): string {
  return resolve(env || join(dirname(storage), "backups"));
}

const stamp = (now: Date) =>
  now
    .toISOString()
    .replace(/\.\d{3}Z$/, "Z")
    .replace(/:/g, "-");

/**
 * A consistent copy of the live database while the app keeps writing: VACUUM INTO reads one snapshot (in WAL
 * mode a reader never blocks writers, nor they it) and writes it compacted to a new file. The copy is written
 * under a temporary name and kept only when PRAGMA integrity_check passes.
 */
export async function backupDatabase({
  storage,
  dir = backupDir(storage),
  label = "sprintwright",
  now = new Date(),
}: {
  storage: string;
  dir?: string;
  label?: string;
  now?: Date;
}): Promise<{ file: string; bytes: number }> {
  if (!existsSync(storage)) throw new Error(`No database at ${storage}`);
  mkdirSync(dir, { recursive: true });
  const file = join(dir, `${label}-${stamp(now)}.sqlite`);
  if (existsSync(file)) throw new Error(`${file} already exists`);
  const partial = `${file}.partial`;
  rmSync(partial, { force: true });
  const conn = await openRaw(storage, sqlite3.OPEN_READONLY);
  try {
    await exec(conn, `VACUUM INTO '${partial.replace(/'/g, "''")}'`);
  } finally {
    await closeRaw(conn);
  }
  const check = await inspectDatabase(partial);
  if (check.problems.length) {
    rmSync(partial, { force: true });
    throw new Error(`The backup failed its check: ${check.problems.join("; ")}`);
  }
  renameSync(partial, file);
  return { file, bytes: statSync(file).size };
}

export type Inspection = {
  file: string;
  /** Migrations recorded in the file, oldest first. */
  migrations: string[];
  counts: Record<string, number>;
  /** Reasons not to trust the file; empty when it is a sound Sprintwright database. */
  problems: string[];
};

const COUNTED = ["teams", "users", "athletes", "planned_sessions", "session_logs"];

/** PRAGMA integrity_check, the recorded migrations and a few row counts, without changing the file. */
export async function inspectDatabase(file: string, knownMigrations?: string[]): Promise<Inspection> {
  const result: Inspection = { file, migrations: [], counts: {}, problems: [] };
  if (!existsSync(file)) return { ...result, problems: [`${file} does not exist`] };
  let conn: sqlite3.Database;
  try {
    conn = await openRaw(file, sqlite3.OPEN_READONLY);
  } catch (err) {
    return { ...result, problems: [`cannot open ${file}: ${(err as Error).message}`] };
  }
  try {
    const integrity = await all<{ integrity_check: string }>(conn, "PRAGMA integrity_check");
    const verdict = integrity.map((r) => r.integrity_check);
    if (verdict.join() !== "ok") return { ...result, problems: [`integrity_check: ${verdict.slice(0, 5).join("; ")}`] };
    const tables = new Set(
      (await all<{ name: string }>(conn, "SELECT name FROM sqlite_master WHERE type = 'table'")).map((r) => r.name),
    );
    if (!tables.has("SequelizeMeta"))
      return { ...result, problems: ["no SequelizeMeta table: not a Sprintwright database"] };
    result.migrations = (await all<{ name: string }>(conn, 'SELECT name FROM "SequelizeMeta" ORDER BY name')).map((r) =>
      r.name.replace(/\.ts$/, ""),
    );
    for (const t of COUNTED)
      if (tables.has(t)) result.counts[t] = (await all<{ n: number }>(conn, `SELECT COUNT(*) AS n FROM "${t}"`))[0]!.n;
    const unknown = knownMigrations ? result.migrations.filter((m) => !knownMigrations.includes(m)) : [];
    if (unknown.length)
      result.problems.push(
        `made by a newer version of the app (migrations this code does not know: ${unknown.join(", ")})`,
      );
  } catch (err) {
    result.problems.push(`cannot read ${file}: ${(err as Error).message}`);
  } finally {
    await closeRaw(conn);
  }
  return result;
}

/**
 * Puts a checked backup in place of the live database through SQLite's backup API, so the live file, its WAL
 * and any connection still open stay consistent. The database as it was is backed up first ("pre-restore").
 */
export async function restoreDatabase({
  from,
  storage,
  knownMigrations,
  dir = backupDir(storage),
  now = new Date(),
}: {
  from: string;
  storage: string;
  knownMigrations: string[];
  dir?: string;
  now?: Date;
}): Promise<{ saved: string | null; restored: Inspection }> {
  if (resolve(from) === resolve(storage)) throw new Error("The backup and the live database are the same file");
  const check = await inspectDatabase(from, knownMigrations);
  if (check.problems.length) throw new Error(`Refusing to restore ${basename(from)}: ${check.problems.join("; ")}`);
  const saved = existsSync(storage) ? (await backupDatabase({ storage, dir, label: "pre-restore", now })).file : null;
  const source = await openRaw(from, sqlite3.OPEN_READONLY);
  try {
    await copyInto(source, storage);
  } finally {
    await closeRaw(source);
  }
  const live = await openRaw(storage);
  try {
    await exec(live, "PRAGMA journal_mode = WAL");
  } finally {
    await closeRaw(live);
  }
  const restored = await inspectDatabase(storage, knownMigrations);
  if (restored.problems.length)
    throw new Error(
      `The restored database failed its check (the previous one is in ${saved}): ${restored.problems.join("; ")}`,
    );
  return { saved, restored };
}
