import { QueryTypes, type Sequelize } from "sequelize";
import sqlite3 from "sqlite3";
import { exec, openRaw } from "./raw";
import { writeQueue } from "./sqlite";

export type DatabaseState = "ok" | "busy" | "down";

/** The probe waits this long for a lock another process holds before calling the database busy. */
const PROBE_WAIT_MS = 200;
/** Our own writer holding its turn longer than this (or one giving up lately) means writes are stuck. */
const STUCK_MS = 2000;

/** A probe's answer stands for this long. */
const PROBE_EVERY_MS = 250;
const lastProbe = new Map<string, { at: number; state: DatabaseState }>();

const probes = globalThis as typeof globalThis & { __sprintwrightProbes?: Map<string, Promise<sqlite3.Database>> };

function probeConnection(storage: string): Promise<sqlite3.Database> {
  const map = (probes.__sprintwrightProbes ??= new Map());
  let conn = map.get(storage);
  if (!conn) {
    conn = openRaw(storage, sqlite3.OPEN_READWRITE, PROBE_WAIT_MS);
    conn.catch(() => map.delete(storage));
    map.set(storage, conn);
  }
  return conn;
}

/** Takes SQLite's write lock for an instant, so a lock held by another process shows as busy. */
async function canWrite(storage: string): Promise<boolean> {
  const c = await probeConnection(storage);
  try {
    await exec(c, "BEGIN IMMEDIATE");
  } catch {
    return false;
  }
  await exec(c, "ROLLBACK");
  return true;
}

/**
 * Whether the database answers reads and could take a write now. Never waits behind this process's writers:
 * while one of them holds its turn the answer comes from whether it is stuck at BEGIN, or has held it long.
 */
export async function databaseState({
  sequelize,
  storage,
}: {
  sequelize: Sequelize;
  storage: string;
}): Promise<DatabaseState> {
  try {
    await sequelize.query("SELECT 1", { type: QueryTypes.SELECT });
  } catch {
    return "down";
  }
  // PostgreSQL has no file lock to probe and no write queue here: answering reads is the state.
  if (storage === ":memory:" || sequelize.getDialect() !== "sqlite") return "ok";
  const queue = writeQueue(storage);
  const now = Date.now();
  const last = lastProbe.get(storage);
  // A flood of probes (a load balancer, a benchmark's floor) takes the lock at most a few times a second.
  if (last && now - last.at < PROBE_EVERY_MS) return last.state;
  const free = await queue.tryRun(() => canWrite(storage)).catch(() => false);
  if (free !== undefined) {
    const state = free ? "ok" : "busy";
    lastProbe.set(storage, { at: Date.now(), state });
    return state;
  }
  // Our own writer holds the turn. If it is still waiting at BEGIN after the probe's wait, another process has the lock.
  if (queue.beginSince !== null) {
    const waited = Date.now() - queue.beginSince;
    if (waited < PROBE_WAIT_MS) await new Promise((r) => setTimeout(r, PROBE_WAIT_MS - waited));
    if (queue.beginSince !== null && Date.now() - queue.beginSince >= PROBE_WAIT_MS) return "busy";
  }
  const stuck =
    (queue.heldSince !== null && now - queue.heldSince > STUCK_MS) ||
    (queue.lastBusyAt !== null && now - queue.lastBusyAt < STUCK_MS);
  return stuck ? "busy" : "ok";
}
