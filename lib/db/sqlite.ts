import { resolve } from "node:path";
import { QueryTypes, type QueryOptions, type Sequelize, type Transaction, type TransactionOptions } from "sequelize";
import sqlite3 from "sqlite3";
import { WriteQueue } from "./write-queue";

/** How long one connection waits inside SQLite for a lock another process holds (PRAGMA busy_timeout). */
export const BUSY_TIMEOUT_MS = 5000;
/** How long a write waits for its turn behind this process's other writes. */
const QUEUE_WAIT_MS = 20_000;

type Row = Record<string, unknown>;
type RowsCallback = (err: Error | null, rows: Row[]) => void;

/**
 * `PRAGMA table_info` answers per database file. Sequelize's SQLite dialect sends one before every model query
 * (to learn the column types it converts results with), which was half the statements of a page. The schema
 * changes only through DDL, and every DDL this process sends passes through the driver below, which clears the
 * file's answers; another process changing the schema (a migration run while the app serves) needs a restart,
 * as the models defined at boot do anyway.
 */
const schemaCaches = globalThis as typeof globalThis & { __sprintwrightTableInfo?: Map<string, Map<string, Row[]>> };
const TABLE_INFO = /^PRAGMA table_info\(`([^`]+)`\)$/;
// Anywhere in the text: migrations send several statements at once, some after comments.
const DDL = /\b(CREATE|ALTER|DROP)\s+(TEMP\w*\s+|UNIQUE\s+|VIRTUAL\s+)?(TABLE|INDEX|VIEW|TRIGGER)\b/i;

function tableInfoCache(filename: string): Map<string, Row[]> | null {
  if (filename === "" || filename === ":memory:") return null;
  const map = (schemaCaches.__sprintwrightTableInfo ??= new Map());
  const key = resolve(filename);
  let cache = map.get(key);
  if (!cache) map.set(key, (cache = new Map()));
  return cache;
}

/**
 * sqlite3 with busy_timeout set on every connection. Sequelize's SQLite dialect opens a fresh connection per
 * transaction and never runs the `afterConnect` hooks, so a PRAGMA sent once reaches only its default
 * connection; the driver's constructor is the one place every connection passes through. It also answers
 * Sequelize's `PRAGMA table_info` from the file's cache.
 */
class Database extends sqlite3.Database {
  private readonly tableInfo: Map<string, Row[]> | null;

  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode, callback);
    this.tableInfo = tableInfoCache(filename);
    // Queued by node-sqlite3 until the open completes.
    this.configure("busyTimeout", BUSY_TIMEOUT_MS);
  }

  all(sql: string, ...params: unknown[]): this {
    const table = this.tableInfo && params.length === 1 && typeof params[0] === "function" && TABLE_INFO.exec(sql);
    if (!table || !this.tableInfo) return super.all(this.schemaMayChange(sql), ...params);
    const cache = this.tableInfo;
    const done = params[0] as RowsCallback;
    const known = cache.get(table[1]);
    if (known) {
      process.nextTick(() => done(null, known));
      return this;
    }
    return super.all(sql, (err: Error | null, rows: Row[]) => {
      if (!err) cache.set(table[1], rows);
      done(err, rows);
    });
  }

  run(sql: string, ...params: unknown[]): this {
    return super.run(this.schemaMayChange(sql), ...params);
  }

  exec(sql: string, callback?: (err: Error | null) => void): this {
    return super.exec(this.schemaMayChange(sql), callback);
  }

  private schemaMayChange(sql: string): string {
    if (this.tableInfo && DDL.test(sql)) this.tableInfo.clear();
    return sql;
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

type Sql = string | { query: string; values: unknown[] };
type Work<T> = (t: Transaction) => PromiseLike<T>;

function isWrite(sql: Sql, options: QueryOptions | undefined): boolean {
  if (options?.transaction) return false;
  const type = options?.type ?? QueryTypes.RAW;
  if (WRITE_TYPES.has(type)) return true;
  if (type !== QueryTypes.RAW) return false;
  return !READ_SQL.test(typeof sql === "string" ? sql : sql.query);
}

/**
 * Every write of this Sequelize instance goes through the file's write queue: top-level transactions take
 * their turn before BEGIN (IMMEDIATE, so the lock is held from the start), and a write sent outside a
 * transaction runs in one of its own, so it gets its own connection and never blocks the shared reading one.
 */
export function queueWrites(sequelize: Sequelize, queue: WriteQueue): void {
  const begin = sequelize.transaction.bind(sequelize);
  const query = sequelize.query.bind(sequelize);

  function transaction<T>(options: TransactionOptions, fn: Work<T>): Promise<T>;
  function transaction<T>(fn: Work<T>): Promise<T>;
  function transaction(options?: TransactionOptions): Promise<Transaction>;
  async function transaction<T>(a?: TransactionOptions | Work<T>, b?: Work<T>): Promise<T | Transaction> {
    const fn = typeof a === "function" ? a : b;
    const options = typeof a === "function" ? undefined : a;
    // A savepoint inside a transaction already holds the turn.
    if (options?.transaction) return fn ? begin(options, fn) : begin(options);
    if (fn) return queue.run(() => (options ? begin(options, fn) : begin(fn)));
    return unmanaged(queue, () => begin(options));
  }
  const queued = async (sql: Sql, options?: QueryOptions): Promise<unknown> => {
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
    return transaction(async (t) => query(sql, { ...options, transaction: t }));
  };
  Object.assign(sequelize, { transaction, query: queued });
  // A BEGIN that gave up on the lock makes Sequelize "destroy" the connection through a pool the SQLite
  // dialect never uses, which leaves it open; releasing closes it (the shared :memory: one is kept).
  const connections = sequelize.connectionManager;
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
      // The first after-commit hook runs as the connection is released, before any the caller adds; a commit
      // that fails runs the hooks too.
      t.afterCommit(() => done());
      const rollback = t.rollback.bind(t);
      t.rollback = () => rollback().finally(done);
      started(t);
      await finished;
    })
    .catch(failed);
  return ready;
}
