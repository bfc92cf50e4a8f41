import pg from "pg";
import { Sequelize, type Transaction, type TransactionOptions } from "sequelize";

// PostgreSQL, for a hosted service whose clubs outgrow one machine (DATABASE_URL=postgres://…). The same models
// and migrations run on it; what differs from SQLite is wired here.

/**
 * Every write transaction of every app process takes an advisory lock first (pg_advisory_xact_lock, released at
 * COMMIT/ROLLBACK). The data layer was written for SQLite, where a transaction is IMMEDIATE and so the only
 * writer: it reads a row, checks its version, then writes. Under PostgreSQL's READ COMMITTED two transactions
 * could both pass that check; the lock keeps the SQLite rule across processes, so every read-modify-write, the
 * outbox and the ledger updates stay correct with several app servers. Reads never take it.
 *
 * A write confined to one team (`teamId` in the options: lib/data/transaction.ts) takes the database-wide key
 * shared and the team's key exclusive, so writers of different teams run side by side and writers of one team
 * one at a time; any other write takes the database-wide key exclusive and so waits for all of them. Both take
 * the database-wide key first, so no two writers can wait on each other. (A one-bigint key and a two-int key
 * never collide: PostgreSQL keeps the two key spaces apart.)
 */
const WRITE_LOCK_KEY = 7203115;
const DATABASE_LOCK_SQL = `SELECT pg_advisory_xact_lock(${WRITE_LOCK_KEY})`;
const SHARED_LOCK_SQL = `SELECT pg_advisory_xact_lock_shared(${WRITE_LOCK_KEY})`;
const TEAM_LOCK_SQL = `SELECT pg_advisory_xact_lock(${WRITE_LOCK_KEY}, :teamId)`;

declare module "sequelize/types/transaction" {
  interface TransactionOptions {
    /** The one team a write transaction changes: on PostgreSQL it locks that team only. */
    teamId?: number;
  }
}

// COUNT and SUM over integers answer int8, which pg hands over as text because it could pass 2^53. Our counts,
// sums of ids and versions and epoch-millisecond expiries stay far below that, and SQLite answers numbers: parse
// them the same way on both (a value past 2^53 stays text rather than lose digits).
pg.types.setTypeParser(pg.types.builtins.INT8, (text: string) => {
  const n = Number(text);
  return Number.isSafeInteger(n) ? n : text;
});

type Work<T> = (t: Transaction) => PromiseLike<T>;

/** Sequelize whose every write transaction takes the write lock first (above). */
class LockedWritesSequelize extends Sequelize {
  override transaction<T>(options: TransactionOptions, autoCallback: Work<T>): Promise<T>;
  override transaction<T>(autoCallback: Work<T>): Promise<T>;
  override transaction(options?: TransactionOptions): Promise<Transaction>;
  override async transaction<T>(a?: TransactionOptions | Work<T>, b?: Work<T>): Promise<T | Transaction> {
    const fn = typeof a === "function" ? a : b;
    const options = typeof a === "function" ? {} : (a ?? {});
    // A savepoint inside a transaction already holds the lock.
    if (options.transaction) return fn ? super.transaction(options, fn) : super.transaction(options);
    const { teamId } = options;
    if (fn) return super.transaction(options, async (t) => (await this.lockWriters(t, teamId), fn(t)));
    const t = await super.transaction(options);
    await this.lockWriters(t, teamId);
    return t;
  }

  private async lockWriters(t: Transaction, teamId: number | undefined): Promise<void> {
    if (teamId === undefined) return void (await this.query(DATABASE_LOCK_SQL, { transaction: t }));
    await this.query(SHARED_LOCK_SQL, { transaction: t });
    await this.query(TEAM_LOCK_SQL, { transaction: t, replacements: { teamId } });
  }
}

/** A Sequelize instance on PostgreSQL with the app's write rule (one writer per team at a time, across processes). */
export async function openPostgres(url: string): Promise<Sequelize> {
  return new LockedWritesSequelize(url, {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: Number(process.env.DATABASE_POOL_MAX ?? 10), idle: 10_000, acquire: 30_000 },
  });
}

/** A plain pg pool on the same database, for the sign-in limiter's own table (rate-limiter-flexible). */
export function postgresPool(url: string): pg.Pool {
  const pool = new pg.Pool({ connectionString: url, max: 2 });
  // An idle connection the server ended (a restart, a dropped database) is an 'error' event on the pool, which
  // would end the process unheard; the pool has already let the connection go and opens a new one when asked.
  pool.on("error", (err) => console.warn(`[sprintwright] sign-in limiter lost a database connection: ${err.message}`));
  return pool;
}
