import "server-only";
import { createHash } from "node:crypto";
import {
  RateLimiterMemory,
  RateLimiterPostgres,
  RateLimiterRes,
  RateLimiterSQLite,
  type RateLimiterAbstract,
} from "rate-limiter-flexible";
import sqlite3 from "sqlite3";
import { postgresPool } from "@/lib/db/postgres";
import { databaseDialect, databaseStorage, env } from "@/lib/env";

/**
 * Sign-in throttling (OWASP ASVS 4.0 §2.2.1). Every attempt takes a point from two buckets before the password is
 * checked, so parallel guesses cannot slip past the count; a right password gives the points back.
 * - per account: 10 attempts in 15 minutes, then 15 minutes blocked, for any e-mail, known or not, so the answer
 *   does not tell which accounts exist;
 * - per client address: 30 failed attempts in 15 minutes (guessing many accounts from one place), then blocked.
 * The counters live in the app's SQLite file (table `sign_in_limits`, migration 006), so every app process sharing
 * the database sees them; if the file cannot be written in time, an in-process counter stands in.
 */
export const ACCOUNT_ATTEMPTS = 10;
export const ADDRESS_ATTEMPTS = 30;
const WINDOW_S = 15 * 60;
const BLOCK_S = 15 * 60;

type Limiters = { account: RateLimiterAbstract; address: RateLimiterAbstract; client: sqlite3.Database | null };
const cache = globalThis as typeof globalThis & {
  __sprintwrightSignInLimits?: { storage: string; limiters: Limiters };
};

/** PostgreSQL: the same table through RateLimiterPostgres on a small pool of its own (no SQLite savepoint issue). */
function postgresLimiters(url: string): Limiters {
  const pool = postgresPool(url);
  const make = (keyPrefix: string, points: number): RateLimiterAbstract => {
    const opts = { keyPrefix, points, duration: WINDOW_S, blockDuration: BLOCK_S };
    return new RateLimiterPostgres({
      ...opts,
      storeClient: pool,
      storeType: "pool",
      tableName: "sign_in_limits",
      tableCreated: true,
      insuranceLimiter: new RateLimiterMemory(opts),
    });
  };
  return { account: make("account", ACCOUNT_ATTEMPTS), address: make("address", ADDRESS_ATTEMPTS), client: null };
}

function limiters(): Limiters {
  const url = env().DATABASE_URL;
  const storage = databaseDialect(url) === "postgres" ? url : databaseStorage(url);
  const cached = cache.__sprintwrightSignInLimits;
  if (cached?.storage === storage) return cached.limiters;
  if (storage === url && databaseDialect(url) === "postgres") {
    const limiters = postgresLimiters(url);
    cache.__sprintwrightSignInLimits = { storage, limiters };
    return limiters;
  }
  const client = storage === ":memory:" ? null : new sqlite3.Database(storage, sqlite3.OPEN_READWRITE);
  // Updates queue one at a time (below), so a long wait here would hold up every sign-in; the in-process counter
  // stands in when the file stays locked.
  client?.configure("busyTimeout", 250);
  const make = (keyPrefix: string, points: number): RateLimiterAbstract => {
    const opts = { keyPrefix, points, duration: WINDOW_S, blockDuration: BLOCK_S };
    const memory = new RateLimiterMemory(opts);
    if (!client) return memory;
    return new RateLimiterSQLite({
      ...opts,
      storeClient: client,
      storeType: "sqlite3",
      tableName: "sign_in_limits",
      tableCreated: true,
      insuranceLimiter: memory,
    });
  };
  const fresh = { account: make("account", ACCOUNT_ATTEMPTS), address: make("address", ADDRESS_ATTEMPTS), client };
  cache.__sprintwrightSignInLimits = { storage, limiters: fresh };
  return fresh;
}

// E-mails are not kept in the table in clear; a hash is enough to count.
const accountKey = (email: string) => createHash("sha256").update(email.trim().toLowerCase()).digest("hex");

export type Attempt = { allowed: true } | { allowed: false; retryAfterMs: number };

// RateLimiterSQLite wraps each update in a SAVEPOINT on its one connection; overlapping updates nest those and can
// leave the connection inside an open transaction holding the write lock, and a failed update (database busy for
// longer than the timeout) leaves its savepoint open. So: one update at a time, each starting outside any
// transaction (the ROLLBACK only ever ends such a leftover; it fails harmlessly when there is none).
let queue: Promise<unknown> = Promise.resolve();
function oneAtATime<T>(client: sqlite3.Database | null, fn: () => Promise<T>): Promise<T> {
  const clean = () => new Promise<void>((resolve) => (client ? client.run("ROLLBACK", () => resolve()) : resolve()));
  const run = queue.then(clean).then(fn);
  queue = run.catch(() => undefined);
  return run;
}

/** Takes one point from the account's and the address's buckets; refuses when either is used up. */
export async function beginSignInAttempt({
  email,
  address,
}: {
  email: string | null;
  address: string;
}): Promise<Attempt> {
  const { account, address: byAddress, client } = limiters();
  const results = await Promise.allSettled([
    email === null ? Promise.resolve(null) : oneAtATime(client, () => account.consume(accountKey(email))),
    oneAtATime(client, () => byAddress.consume(address)),
  ]);
  let retryAfterMs = 0;
  for (const r of results) {
    if (r.status === "fulfilled") continue;
    // A store failure with no stand-in is not a reason to refuse everyone; a RateLimiterRes is a refusal.
    if (r.reason instanceof RateLimiterRes) retryAfterMs = Math.max(retryAfterMs, r.reason.msBeforeNext);
    else console.error("sign-in limiter failed", r.reason);
  }
  return retryAfterMs > 0 ? { allowed: false, retryAfterMs } : { allowed: true };
}

/** A right password: the account starts afresh and the address gets its point back. */
export async function signInSucceeded({ email, address }: { email: string; address: string }): Promise<void> {
  const { account, address: byAddress, client } = limiters();
  await Promise.allSettled([
    oneAtATime(client, () => account.delete(accountKey(email))),
    oneAtATime(client, () => byAddress.reward(address)),
  ]);
}
