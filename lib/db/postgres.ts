import pg from "pg";
import { Sequelize, type Transaction, type TransactionOptions } from "sequelize";

// PostgreSQL, for a hosted service whose clubs outgrow one machine (DATABASE_URL=postgres://…). The same models
// and migrations run on it; what differs from SQLite is wired here.

/**
 * Every write transaction of every app process takes this lock first (pg_advisory_xact_lock, released at
 * COMMIT/ROLLBACK). The data layer was written for SQLite, where a transaction is IMMEDIATE and so the only
 * writer: it reads a row, checks its version, then writes. Under PostgreSQL's READ COMMITTED two transactions
 * could both pass that check; one lock across processes keeps the SQLite rule, and so every read-modify-write,
 * the outbox and the ledger updates stay correct with several app servers. Reads never take it.
 */
const WRITE_LOCK_SQL = "SELECT pg_advisory_xact_lock(7203115)";

// COUNT and SUM over integers answer int8, which pg hands over as text because it could pass 2^53. Our counts,
// sums of ids and versions and epoch-millisecond expiries stay far below that, and SQLite answers numbers: parse
// them the same way on both (a value past 2^53 stays text rather than lose digits).
pg.types.setTypeParser(pg.types.builtins.INT8, (text: string) => {
  const n = Number(text);
  return Number.isSafeInteger(n) ? n : text;
});

type Begin = (options: TransactionOptions | undefined, fn?: (t: Transaction) => Promise<unknown>) => Promise<unknown>;

function serializeWriters(sequelize: Sequelize): void {
  const begin = sequelize.transaction.bind(sequelize) as unknown as Begin;
  const lock = (t: Transaction) => sequelize.query(WRITE_LOCK_SQL, { transaction: t });
  const transaction = async (a?: unknown, b?: unknown): Promise<unknown> => {
    const fn = (typeof a === "function" ? a : b) as ((t: Transaction) => Promise<unknown>) | undefined;
    const options = (typeof a === "object" && a !== null ? a : undefined) as TransactionOptions | undefined;
    // A savepoint inside a transaction already holds the lock.
    if (options?.transaction) return begin(options, fn);
    if (fn) return begin(options, async (t) => (await lock(t), fn(t)));
    const t = (await begin(options)) as Transaction;
    await lock(t);
    return t;
  };
  Object.assign(sequelize, { transaction });
}

/** A Sequelize instance on PostgreSQL with the app's write rule (one writer at a time, across processes). */
export async function openPostgres(url: string): Promise<Sequelize> {
  const sequelize = new Sequelize(url, {
    dialect: "postgres",
    dialectModule: pg,
    logging: false,
    pool: { max: Number(process.env.DATABASE_POOL_MAX ?? 10), idle: 10_000, acquire: 30_000 },
  });
  serializeWriters(sequelize);
  return sequelize;
}

/** A plain pg pool on the same database, for the sign-in limiter's own table (rate-limiter-flexible). */
export function postgresPool(url: string): pg.Pool {
  return new pg.Pool({ connectionString: url, max: 2 });
}
