import "server-only";
import type { Transaction } from "sequelize";
import { db } from "@/models";

/**
 * Runs `fn` in one write transaction (BEGIN IMMEDIATE, queued per database file: lib/db/sqlite.ts). The services
 * open it; every repository call inside must be passed the transaction. It waits for every other writer.
 */
export async function inTransaction<T>(fn: (transaction: Transaction) => Promise<T>): Promise<T> {
  const { sequelize } = await db();
  return sequelize.transaction(fn);
}

const teams = new WeakMap<Transaction, number>();

/**
 * A write transaction that changes one team's rows only (its plan, logs, athletes, settings, restrictions), never
 * accounts or another team's. On PostgreSQL it waits only for writers of the same team (lib/db/postgres.ts), and
 * the ledger refresh inside it takes in that team's marks only; on SQLite it is inTransaction.
 */
export async function inTeamTransaction<T>(teamId: number, fn: (transaction: Transaction) => Promise<T>): Promise<T> {
  const { sequelize } = await db();
  return sequelize.transaction({ teamId }, (transaction) => {
    teams.set(transaction, teamId);
    return fn(transaction);
  });
}

/** The team a transaction opened by inTeamTransaction is confined to, if any. */
export function transactionTeam(transaction: Transaction): number | undefined {
  return teams.get(transaction);
}
