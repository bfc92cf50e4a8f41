import "server-only";
import type { Transaction } from "sequelize";
import { db } from "@/models";

/**
 * Runs `fn` in one write transaction (BEGIN IMMEDIATE, queued per database file: lib/db/sqlite.ts). The services
 * open it; every repository call inside must be passed the transaction.
 */
export async function inTransaction<T>(fn: (transaction: Transaction) => Promise<T>): Promise<T> {
  const { sequelize } = await db();
  return sequelize.transaction(fn);
}
