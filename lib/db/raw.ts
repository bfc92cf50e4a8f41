import sqlite3 from "sqlite3";
import type { Transaction } from "sequelize";

// Promise wrappers over a plain sqlite3 connection, for work Sequelize must not do: the health probe's lock
// test, VACUUM INTO and the backup API (neither may run inside a transaction, where our write queue puts writes).

export function openRaw(
  file: string,
  mode = sqlite3.OPEN_READWRITE | sqlite3.OPEN_CREATE,
  busyTimeoutMs = 5000,
): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const conn = new sqlite3.Database(file, mode, (err) => (err ? reject(err) : resolve(conn)));
    conn.configure("busyTimeout", busyTimeoutMs);
  });
}

export const exec = (conn: sqlite3.Database, sql: string) =>
  new Promise<void>((resolve, reject) => conn.exec(sql, (err) => (err ? reject(err) : resolve())));

export const all = <T>(conn: sqlite3.Database, sql: string, params: unknown[] = []) =>
  new Promise<T[]>((resolve, reject) =>
    conn.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[]))),
  );

export const closeRaw = (conn: sqlite3.Database) =>
  new Promise<void>((resolve, reject) => conn.close((err) => (err ? reject(err) : resolve())));

// What the libraries do at run time but leave out of their type declarations.
declare module "sqlite3" {
  /** node-sqlite3's handle on sqlite3_backup_* (lib/sqlite3.js: Database#backup). */
  interface Backup {
    step(pages: number, cb: (err: Error | null) => void): void;
    finish(cb?: (err: Error | null) => void): void;
    readonly completed: boolean;
  }
  interface Database {
    backup(destination: string, cb: (err: Error | null) => void): Backup;
  }
}
declare module "sequelize/types/transaction" {
  interface Transaction {
    /** The dialect's own connection the transaction runs on, set once it has begun (lib/transaction.js). */
    readonly connection?: unknown;
  }
}

/** The sqlite3 connection a Sequelize transaction runs on; null on another dialect. */
export function sqliteConnectionOf(transaction: Transaction): sqlite3.Database | null {
  return transaction.connection instanceof sqlite3.Database ? transaction.connection : null;
}

/** SQLite's online backup API (sqlite3_backup_*): copies `source`'s pages into the database file at `destination`. */
export function copyInto(source: sqlite3.Database, destination: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const backup = source.backup(destination, (err) => {
      if (err) return reject(err);
      backup.step(-1, (stepErr) => {
        const done = backup.completed;
        backup.finish(() =>
          stepErr ? reject(stepErr) : done ? resolve() : reject(new Error("The backup did not complete")),
        );
      });
    });
  });
}
