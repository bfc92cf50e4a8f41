import { TimeoutError } from "sequelize";

/** Seconds a client should wait before trying a write again when the database stayed locked. */
export const RETRY_AFTER_S = 5;

export const BUSY_MESSAGE = `The database is busy right now. Nothing was saved; try again in ${RETRY_AFTER_S} seconds.`;

/** A write gave up waiting for SQLite's write lock (another process held it, or the queue stood still). */
export class DatabaseBusyError extends Error {
  constructor(message = "The database is busy") {
    super(message);
    this.name = "DatabaseBusyError";
  }
}

/** Our own queue timeout, or SQLITE_BUSY after busy_timeout (Sequelize reports that as a TimeoutError). */
export function isDatabaseBusy(err: unknown): boolean {
  // By name too: Next bundles this file into more than one chunk, and each copy has its own class.
  if (
    err instanceof DatabaseBusyError ||
    err instanceof TimeoutError ||
    (err as Error | null)?.name === "DatabaseBusyError"
  )
    return true;
  const code =
    (err as { parent?: { code?: unknown }; code?: unknown } | null)?.parent?.code ??
    (err as { code?: unknown } | null)?.code;
  return code === "SQLITE_BUSY" || code === "SQLITE_LOCKED";
}

/** 503 with Retry-After: the write did not happen and can simply be sent again. */
export function busyResponse(): Response {
  return Response.json(
    { error: { code: "busy", message: BUSY_MESSAGE } },
    { status: 503, headers: { "Retry-After": String(RETRY_AFTER_S) } },
  );
}
