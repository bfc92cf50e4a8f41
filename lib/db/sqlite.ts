import { resolve } from "node:path";
import { QueryTypes, type Sequelize, type Transaction, type TransactionOptions } from "sequelize";
import sqlite3 from "sqlite3";
import { WriteQueue } from "./write-queue";

/** How long one connection waits inside SQLite for a lock another process holds (PRAGMA busy_timeout). */
export const BUSY_TIMEOUT_MS = 5000;
/** How long a write waits for its turn behind this process's other writes. */
const QUEUE_WAIT_MS = 20_000;

/**
 * sqlite3 with busy_timeout set on every connection. Sequelize's SQLite dialect opens a fresh connection per
 * transaction and never runs the `afterConnect` hooks, so a PRAGMA sent once reaches only its default
 * connection; the driver's constructor is the one place every connection passes through.
 */
class Database extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode, callback);
    // Queued by node-sqlite3 until the open completes.
    this.configure("busyTimeout", BUSY_TIMEOUT_MS);
  }
}
export const sqliteDriver = { ...sqlite3, Database };

const queues = globalThis as typeof globalThis & { __sprintwrightWriteQueues?: Map<string, WriteQueue> };

/** The process's write queue for one database file (shared by every Sequelize instance on that file). */
export function writeQueue(storage: string): WriteQueue {
  const map = (queues.__sprintwrightWriteQueues ??= new Map());
  const key = storage === ":memory:" ? storage : resolve(storage);
  let q = map.get(key);
  if (!q) map.set(key, (q = new WriteQueue(QUEUE_WAIT_MS)));
  return q;
}

const WRITE_TYPES = new Set<string>([
  QueryTypes.INSERT,
  QueryTypes.UPDATE,
  QueryTypes.BULKUPDATE,
  QueryTypes.BULKDELETE,
  QueryTypes.DELETE,
  QueryTypes.UPSERT,
]);
const READ_SQL = /^\s*(SELECT|PRAGMA|EXPLAIN)\b/i;

type QueryOptions = { type?: string; transaction?: Transaction | null } & Record<string, unknown>;
type Query = (sql: unknown, options?: QueryOptions) => Promise<unknown>;
type Begin = (options: TransactionOptions | undefined, fn?: (t: Transaction) => Promise<unknown>) => Promise<unknown>;

function isWrite(sql: unknown, options: QueryOptions | undefined): boolean {
  if (options?.transaction) return false;
  const type = options?.type ?? QueryTypes.RAW;
  if (WRITE_TYPES.has(type)) return true;
  if (type !== QueryTypes.RAW) return false;
  const text = typeof sql === "string" ? sql : ((sql as { query?: string } | null)?.query ?? "");
  return !READ_SQL.test(text);
}

/**
 * Every write of this Sequelize instance goes through the file's write queue: top-level transactions take
 * their turn before BEGIN (IMMEDIATE, so the lock is held from the start), and a write sent outside a
 * transaction runs in one of its own, so it gets its own connection and never blocks the shared reading one.
 */
export function queueWrites(sequelize: Sequelize, queue: WriteQueue): void {
  const begin = sequelize.transaction.bind(sequelize) as unknown as Begin;
  const query = sequelize.query.bind(sequelize) as unknown as Query;

  const transaction = async (a?: unknown, b?: unknown): Promise<unknown> => {
    const fn = (typeof a === "function" ? a : b) as ((t: Transaction) => Promise<unknown>) | undefined;
    const options = (typeof a === "object" && a !== null ? a : undefined) as TransactionOptions | undefined;
    // A savepoint inside a transaction already holds the turn.
    if (options?.transaction) return begin(options, fn);
    if (fn) return queue.run(() => begin(options, fn));
    return unmanaged(queue, () => begin(options) as Promise<Transaction>);
  };
  const queued = async (sql: unknown, options?: QueryOptions): Promise<unknown> => {
    if (options?.transaction && typeof sql === "string" && /^BEGIN\b/i.test(sql.trim())) {
      // Only another process can make BEGIN wait: the health probe reads this.
      queue.beginSince = Date.now();
      try {
        return await query(sql, options);
      } finally {
        queue.beginSince = null;
      }
    }
    if (!isWrite(sql, options)) return query(sql, options);
    return transaction(async (t: Transaction) => query(sql, { ...options, transaction: t }));
  };
  Object.assign(sequelize, { transaction, query: queued });
  // A BEGIN that gave up on the lock makes Sequelize "destroy" the connection through a pool the SQLite
  // dialect never uses, which leaves it open; releasing closes it (the shared :memory: one is kept).
  const connections = sequelize.connectionManager as unknown as {
    destroyConnection: (c: unknown) => Promise<void>;
    releaseConnection: (c: unknown) => void;
  };
  connections.destroyConnection = async (c) => connections.releaseConnection(c);
}

/** `sequelize.transaction()` without a callback (e.g. findOrCreate): the turn ends when it commits or rolls back. */
async function unmanaged(queue: WriteQueue, start: () => Promise<Transaction>): Promise<Transaction> {
  let done!: () => void;
  const finished = new Promise<void>((r) => (done = r));
  let started!: (t: Transaction) => void;
  let failed!: (err: unknown) => void;
  const ready = new Promise<Transaction>((res, rej) => ((started = res), (failed = rej)));
  queue
    .run(async () => {
      const t = await start();
      const inner = t as unknown as { cleanup: () => void; forceCleanup: () => Promise<void> };
      const cleanup = inner.cleanup.bind(t);
      const forceCleanup = inner.forceCleanup.bind(t);
      inner.cleanup = () => (cleanup(), done());
      inner.forceCleanup = () => forceCleanup().finally(done);
      started(t);
      await finished;
    })
    .catch(failed);
  return ready;
}
