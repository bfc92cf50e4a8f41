// Online backup and restore of a real SQLite file while the app keeps writing: the copy is consistent, passes
// PRAGMA integrity_check and holds every row committed before it started; restore refuses what it cannot trust.
import { spawnSync } from "node:child_process";
import { copyFileSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import sqlite3 from "sqlite3";
import { afterAll, describe, expect, it } from "vitest";
import { backupDatabase, inspectDatabase, restoreDatabase } from "@/lib/db/backup";
import { migrationNames } from "@/lib/db/migrator";
import { all, closeRaw, exec, openRaw } from "@/lib/db/raw";
import { createTestTeam } from "../helpers/fixtures";
import { onPostgres, setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { teamId } = await createTestTeam(d, { name: "Backup Club" });
const dir = mkdtempSync(join(tmpdir(), "sprintwright-backups-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const known = migrationNames();

/** The app writing without pause: one template per transaction, remembering which commits finished. */
function writerLoop() {
  const committed: string[] = [];
  let running = true;
  const done = (async () => {
    for (let i = 0; running; i++) {
      const title = `Loop ${i}`;
      await d.sequelize.transaction(async (transaction) => {
        await d.BlockTemplate.create(
          {
            teamId,
            kind: "strength",
            title,
            running: null,
            drills: null,
            notes: "x".repeat(500),
            durationMin: 30,
            plannedRpe: 5,
          },
          { transaction },
        );
      });
      committed.push(title);
    }
  })();
  return { committed, stop: async () => ((running = false), done) };
}

async function titles(file: string): Promise<Set<string>> {
  const conn = await openRaw(file, sqlite3.OPEN_READONLY);
  try {
    return new Set((await all<{ title: string }>(conn, "SELECT title FROM block_templates")).map((r) => r.title));
  } finally {
    await closeRaw(conn);
  }
}

const until = async (ok: () => boolean) => {
  while (!ok()) await new Promise((r) => setTimeout(r, 10));
};

// SQLite only: the online backup API, integrity_check and file checks work on the database file; a PostgreSQL
// service is backed up with its own tools (pg_dump, base backups), see DEVELOPERS.md.
describe.skipIf(onPostgres)("backup and restore", () => {
  let backup = "";
  let before: string[] = [];

  it("backs up while the app writes: the copy passes integrity_check and holds every row committed before it began", async () => {
    const loop = writerLoop();
    await until(() => loop.committed.length >= 40);
    before = [...loop.committed];
    const taken = await backupDatabase({ storage: d.storage, dir, now: new Date("2026-12-02T05:40:00Z") });
    const during = loop.committed.length;
    await until(() => loop.committed.length >= during + 20);
    await loop.stop();
    backup = taken.file;
    expect(backup).toBe(join(dir, "sprintwright-2026-12-02T05-40-00Z.sqlite"));
    const check = await inspectDatabase(backup, known);
    expect(check.problems).toEqual([]);
    expect(check.migrations).toEqual(known);
    const inCopy = await titles(backup);
    expect(before.filter((t) => !inCopy.has(t))).toEqual([]);
    // The writer went on during and after the backup, so the live database has rows the copy does not.
    expect((await titles(d.storage)).size).toBeGreaterThan(inCopy.size);
  });

  it("restores over another database: it is saved first, and the restored copy passes integrity_check with the backup's rows", async () => {
    // A plain file copy would miss what is still in the WAL; a backup is the honest copy of a live database.
    const target = (await backupDatabase({ storage: d.storage, dir: join(dir, "other") })).file;
    const conn = await openRaw(target);
    await exec(conn, "DELETE FROM block_templates");
    await closeRaw(conn);
    const { saved, restored } = await restoreDatabase({
      from: backup,
      storage: target,
      knownMigrations: known,
      dir,
      now: new Date("2026-12-02T05:41:00Z"),
    });
    expect(restored.problems).toEqual([]);
    expect(saved).toBe(join(dir, "pre-restore-2026-12-02T05-41-00Z.sqlite"));
    expect((await titles(saved!)).size).toBe(0);
    const back = await titles(target);
    expect(before.filter((t) => !back.has(t))).toEqual([]);
    expect(back).toEqual(await titles(backup));
    const check = await openRaw(target, sqlite3.OPEN_READONLY);
    expect(await all(check, "PRAGMA journal_mode")).toEqual([{ journal_mode: "wal" }]);
    await closeRaw(check);
  });

  it("refuses a damaged file, a file from a newer version, something that is not ours, and the live file itself", async () => {
    const target = join(dir, "untouched.sqlite");
    copyFileSync(backup, target);
    const refuse = (from: string) => restoreDatabase({ from, storage: target, knownMigrations: known, dir });

    const cut = join(dir, "cut.sqlite");
    writeFileSync(cut, readFileSync(backup).subarray(0, 8192));
    await expect(refuse(cut)).rejects.toThrow(/Refusing to restore cut\.sqlite: (integrity_check|cannot)/);
    const noise = join(dir, "noise.sqlite");
    writeFileSync(noise, Buffer.alloc(16384, 7));
    await expect(refuse(noise)).rejects.toThrow(/Refusing to restore noise\.sqlite/);
    await expect(refuse(join(dir, "missing.sqlite"))).rejects.toThrow(/does not exist/);

    const newer = join(dir, "newer.sqlite");
    copyFileSync(backup, newer);
    const conn = await openRaw(newer);
    await exec(conn, `INSERT INTO "SequelizeMeta" (name) VALUES ('999-from-the-future.ts')`);
    await closeRaw(conn);
    await expect(refuse(newer)).rejects.toThrow(/newer version of the app.*999-from-the-future/);

    const other = join(dir, "other.sqlite");
    const o = await openRaw(other);
    await exec(o, "CREATE TABLE notes (body TEXT)");
    await closeRaw(o);
    await expect(refuse(other)).rejects.toThrow(/not a Sprintwright database/);
    await expect(restoreDatabase({ from: target, storage: target, knownMigrations: known })).rejects.toThrow(
      /same file/,
    );
    // Nothing was written over the target by any refusal.
    expect(await titles(target)).toEqual(await titles(backup));
  });

  it("npm run db:backup and db:restore: restore only checks and explains without --yes", async () => {
    const env = { ...process.env, DATABASE_URL: `file:${d.storage}`, BACKUP_DIR: join(dir, "cli") };
    const run = (script: string, args: string[] = [], extra: Record<string, string> = {}) =>
      spawnSync(process.execPath, ["--conditions=react-server", "--import", "tsx", `scripts/${script}`, ...args], {
        env: { ...env, ...extra },
        encoding: "utf8",
      });
    const made = run("db-backup.ts");
    expect(made.status, made.stderr).toBe(0);
    const file = /backup: (\S+\.sqlite)/.exec(made.stdout)?.[1];
    expect(file).toBeTruthy();

    const target = join(dir, "cli-target.sqlite");
    copyFileSync(backup, target);
    const dry = run("db-restore.ts", [file!], { DATABASE_URL: `file:${target}` });
    expect(dry.status).toBe(1);
    expect(dry.stderr).toMatch(/Nothing changed/);
    expect(await titles(target)).toEqual(await titles(backup));
    const real = run("db-restore.ts", [file!, "--yes"], { DATABASE_URL: `file:${target}` });
    expect(real.status, real.stderr).toBe(0);
    expect(real.stdout).toMatch(/passes integrity_check/);
    expect(await titles(target)).toEqual(await titles(file!));
    const bad = run("db-restore.ts", [join(dir, "noise.sqlite"), "--yes"], { DATABASE_URL: `file:${target}` });
    expect(bad.status).toBe(1);
    expect(bad.stderr).toMatch(/Refusing to restore/);
  }, 60_000);
});
