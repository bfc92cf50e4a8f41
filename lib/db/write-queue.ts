import { DatabaseBusyError, isDatabaseBusy } from "./busy";

type Waiter = { grant: () => void; fail: (err: Error) => void; since: number };

/**
 * One writer at a time per database file in this process. SQLite allows one write transaction anyway; letting
 * many wait inside SQLite's busy handler ties up one of libuv's four threads each, so the writer holding the
 * lock cannot get a thread to finish. Waiting here costs no thread. Waiters leave with DatabaseBusyError when
 * the writer ahead of them gave up on the lock (another process holds it: they would fail the same way) or
 * after `maxWaitMs`.
 */
export class WriteQueue {
  private held = false;
  private readonly waiters: Waiter[] = [];
  /** When the current writer got its turn (null while idle). */
  heldSince: number | null = null;
  /** When a writer last gave up on SQLite's lock. */
  lastBusyAt: number | null = null;
  /** When the current writer sent BEGIN, while it waits for SQLite's lock (null once it has it). */
  beginSince: number | null = null;

  constructor(private readonly maxWaitMs: number) {}

  get waiting(): number {
    return this.waiters.length;
  }

  /** Runs `fn` as the only writer; rejects with DatabaseBusyError when the turn does not come. */
  async run<T>(fn: () => Promise<T>): Promise<T> {
    await this.acquire();
    try {
      return await fn();
    } catch (err) {
      if (isDatabaseBusy(err)) this.giveUpAll();
      throw err;
    } finally {
      this.release();
    }
  }

  /** Runs `fn` as the writer only if nobody is writing; `undefined` otherwise (never waits). */
  async tryRun<T>(fn: () => Promise<T>): Promise<T | undefined> {
    if (this.held) return undefined;
    this.take();
    try {
      return await fn();
    } finally {
      this.release();
    }
  }

  private take() {
    this.held = true;
    this.heldSince = Date.now();
  }

  private acquire(): Promise<void> {
    if (!this.held) {
      this.take();
      return Promise.resolve();
    }
    return new Promise((resolve, reject) => {
      const timer = setTimeout(
        () => leave(new DatabaseBusyError("Timed out waiting for the database write lock")),
        this.maxWaitMs,
      );
      const leave = (err: Error) => {
        clearTimeout(timer);
        const i = this.waiters.indexOf(waiter);
        if (i >= 0) this.waiters.splice(i, 1);
        reject(err);
      };
      const waiter: Waiter = {
        since: Date.now(),
        grant: () => {
          clearTimeout(timer);
          this.take();
          resolve();
        },
        fail: leave,
      };
      this.waiters.push(waiter);
    });
  }

  private release() {
    const next = this.waiters.shift();
    if (next) next.grant();
    else {
      this.held = false;
      this.heldSince = null;
    }
  }

  private giveUpAll() {
    this.lastBusyAt = Date.now();
    for (const w of [...this.waiters])
      w.fail(new DatabaseBusyError("The database stayed locked by another connection"));
  }
}
