import sqlite3 from "sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { acwrSeries } from "@/lib/load/acwr";
import { mulberry32 } from "../unit/load/fixtures";

// Independent reference: SQLite's own window functions compute the rolling means
// (SQLite window functions, https://sqlite.org/windowfunctions.html: AVG(x) OVER (ORDER BY … ROWS BETWEEN n PRECEDING AND …)),
// and a recursive CTE runs the EWMA recurrence of Williams et al. 2017 in SQL. acwrSeries must agree to 1e-9.

interface Row {
  day: number;
  acute: number;
  coupled: number;
  uncoupled: number | null;
  coupled_ratio: number | null;
  uncoupled_ratio: number | null;
}

const DAYS = 400;
const rng = mulberry32(20260311);
// Rest days (0) about 2 days a week, a 35-day lay-off (so chronic reaches exactly 0), and a few heavy spikes.
const loads = Array.from({ length: DAYS }, (_, d) => {
  if (d >= 200 && d < 235) return 0;
  if (rng() < 2 / 7) return 0;
  const base = 200 + rng() * 500;
  return rng() < 0.03 ? base * 3 : Math.round(base * 100) / 100;
});

let db: sqlite3.Database;
const all = <T>(sql: string, params: unknown[] = []) =>
  new Promise<T[]>((resolve, reject) => db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[]))));
const run = (sql: string, params: unknown[] = []) =>
  new Promise<void>((resolve, reject) => db.run(sql, params, (err) => (err ? reject(err) : resolve())));

const close = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

beforeAll(async () => {
  db = new sqlite3.Database(":memory:");
  await run("CREATE TABLE daily_load (day INTEGER PRIMARY KEY, load REAL NOT NULL)");
  await run("BEGIN");
  for (let d = 0; d < DAYS; d++) await run("INSERT INTO daily_load (day, load) VALUES (?, ?)", [d, loads[d]]);
  await run("COMMIT");
});

afterAll(() => new Promise<void>((resolve) => db.close(() => resolve())));

describe("rolling ACWR against SQLite window functions", () => {
  it("acute (7 days), coupled chronic (28 days) and uncoupled chronic (days t−27…t−7) agree to 1e-9", async () => {
    const rows = await all<Row>(`
      WITH w AS (
        SELECT day,
          AVG(load) OVER (ORDER BY day ROWS BETWEEN 6 PRECEDING AND CURRENT ROW) AS acute,
          AVG(load) OVER (ORDER BY day ROWS BETWEEN 27 PRECEDING AND CURRENT ROW) AS coupled,
          AVG(load) OVER (ORDER BY day ROWS BETWEEN 27 PRECEDING AND 7 PRECEDING) AS uncoupled
        FROM daily_load
      )
      SELECT day, acute, coupled, uncoupled,
        CASE WHEN coupled > 0 THEN acute / coupled END AS coupled_ratio,
        CASE WHEN uncoupled > 0 THEN acute / uncoupled END AS uncoupled_ratio
      FROM w ORDER BY day`);
    expect(rows).toHaveLength(DAYS);
    const c = acwrSeries(loads, "rolling_coupled");
    const u = acwrSeries(loads, "rolling_uncoupled");
    let nullRatios = 0;
    for (const r of rows) {
      expect(close(c.acute[r.day], r.acute)).toBe(true);
      expect(close(u.acute[r.day], r.acute)).toBe(true);
      expect(close(c.chronic[r.day], r.coupled)).toBe(true);
      // An empty frame is NULL in SQL; the engine stores 0 there and gives no ratio.
      expect(close(u.chronic[r.day], r.uncoupled ?? 0)).toBe(true);
      for (const [ours, theirs] of [
        [c.ratio[r.day], r.coupled_ratio],
        [u.ratio[r.day], r.uncoupled_ratio],
      ] as const) {
        if (theirs === null) {
          expect(ours).toBeNull();
          nullRatios++;
        } else expect(close(ours!, theirs)).toBe(true);
      }
    }
    // The first 7 uncoupled days and the end of the lay-off have no ratio in both.
    expect(nullRatios).toBeGreaterThan(7);
  });

  it("EWMA (λ = 2/(N+1), seeded with day 1) agrees with a recursive CTE to 1e-9", async () => {
    const rows = await all<{ day: number; acute: number; chronic: number }>(`
      WITH RECURSIVE e(day, acute, chronic) AS (
        SELECT day, load, load FROM daily_load WHERE day = 0
        UNION ALL
        SELECT d.day, (2.0 / 8) * d.load + (1 - 2.0 / 8) * e.acute, (2.0 / 29) * d.load + (1 - 2.0 / 29) * e.chronic
        FROM e JOIN daily_load d ON d.day = e.day + 1
      )
      SELECT day, acute, chronic FROM e ORDER BY day`);
    const s = acwrSeries(loads, "ewma");
    expect(rows).toHaveLength(DAYS);
    for (const r of rows) {
      expect(close(s.acute[r.day], r.acute)).toBe(true);
      expect(close(s.chronic[r.day], r.chronic)).toBe(true);
      expect(close(s.ratio[r.day]!, r.acute / r.chronic)).toBe(true);
    }
  });
});
