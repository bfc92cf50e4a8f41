import sqlite3 from "sqlite3";
import { describe, expect, it } from "vitest";
import { ACCOUNT_ATTEMPTS, ADDRESS_ATTEMPTS, beginSignInAttempt, signInSucceeded } from "@/lib/data/sign-in-limits";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();

async function attempts(n: number, who: { email: string | null; address: string }) {
  const out = [];
  for (let i = 0; i < n; i++) out.push(await beginSignInAttempt(who));
  return out;
}

describe("sign-in limits", () => {
  it("block an account after its allowance, from any address, and say for how long", async () => {
    const email = "known@limits.test";
    const first = await attempts(ACCOUNT_ATTEMPTS, { email, address: "10.0.0.1" });
    expect(first.every((a) => a.allowed)).toBe(true);
    const [next] = await attempts(1, { email, address: "10.0.0.2" });
    expect(next).toMatchObject({ allowed: false });
    expect(next!.allowed === false && next!.retryAfterMs).toBeGreaterThan(14 * 60_000);
    // The counters are rows in the app's database, where a second process sees them too.
    const [row] = (
      await d.sequelize.query("SELECT COUNT(*) AS n FROM sign_in_limits WHERE key LIKE 'account:%'")
    )[0] as { n: number }[];
    expect(row!.n).toBeGreaterThan(0);
  });

  it("counts parallel attempts exactly", async () => {
    const results = await Promise.all(
      Array.from({ length: 25 }, (_, i) =>
        beginSignInAttempt({ email: "parallel@limits.test", address: `10.1.0.${i}` }),
      ),
    );
    expect(results.filter((a) => a.allowed)).toHaveLength(ACCOUNT_ATTEMPTS);
  });

  it("gives a right password a fresh start", async () => {
    const who = { email: "careful@limits.test", address: "10.0.0.3" };
    await attempts(ACCOUNT_ATTEMPTS - 1, who);
    await signInSucceeded({ email: who.email, address: who.address });
    expect((await attempts(ACCOUNT_ATTEMPTS, who)).every((a) => a.allowed)).toBe(true);
  });

  it("block one address guessing many accounts", async () => {
    const address = "10.0.0.4";
    const spread = await Promise.all(
      Array.from({ length: ADDRESS_ATTEMPTS }, (_, i) =>
        beginSignInAttempt({ email: `user${i}@limits.test`, address }),
      ),
    );
    expect(spread.every((a) => a.allowed)).toBe(true);
    expect((await beginSignInAttempt({ email: "another@limits.test", address })).allowed).toBe(false);
    expect((await beginSignInAttempt({ email: null, address })).allowed).toBe(false);
    expect((await beginSignInAttempt({ email: "another@limits.test", address: "10.0.0.5" })).allowed).toBe(true);
  });

  it("leave the database free for other writers after a burst, and after a lock outlasted their wait", async () => {
    const other = new sqlite3.Database(d.storage);
    const exec = (sql: string, timeoutMs: number) =>
      new Promise<Error | null>((resolve) => {
        other.configure("busyTimeout", timeoutMs);
        other.exec(sql, (err) => resolve(err));
      });
    await Promise.all(
      Array.from({ length: 50 }, (_, i) =>
        beginSignInAttempt({ email: "burst@limits.test", address: `10.2.0.${i % 3}` }),
      ),
    );
    expect(await exec("BEGIN IMMEDIATE; COMMIT;", 500)).toBeNull();
    // Another process holds the write lock past the limiter's short wait: attempts are still answered...
    expect(await exec("BEGIN IMMEDIATE", 500)).toBeNull();
    const during = await Promise.all([
      beginSignInAttempt({ email: "locked@limits.test", address: "10.3.0.1" }),
      beginSignInAttempt({ email: "locked@limits.test", address: "10.3.0.2" }),
    ]);
    expect(during.every((a) => a.allowed)).toBe(true);
    expect(await exec("COMMIT", 500)).toBeNull();
    // ...and the limiter's connection is not left inside a transaction afterwards.
    await beginSignInAttempt({ email: "after@limits.test", address: "10.3.0.3" });
    expect(await exec("BEGIN IMMEDIATE; COMMIT;", 500)).toBeNull();
    await new Promise<void>((r) => other.close(() => r()));
  });
});
