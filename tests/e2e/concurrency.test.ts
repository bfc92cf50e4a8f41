// Many people writing at once, over real HTTP against `next start`: edits of one session or one template
// with the same version give one winner and 409s (never a 500), every athlete's log lands, and another
// process holding SQLite's write lock gives waits or 503 with Retry-After, never a 500.
import sqlite3 from "sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { teamToday } from "@/lib/dates/zoned";
import { addDays } from "@/lib/dates/plain-date";
import { closeDb, db } from "@/models";
import { createTestTeam, TEST_PASSWORD } from "../helpers/fixtures";
import { apiSession, startApp, type App } from "./harness";

const ATHLETES = 50;
const json = { "content-type": "application/json" };

type Api = Awaited<ReturnType<typeof apiSession>>;

describe("concurrent writes", () => {
  let app: App;
  let coach: Api;
  let teamId = 0;
  let sessionIds: { athleteEmail: string; sessionId: number }[] = [];

  beforeAll(async () => {
    app = await startApp({ seed: false });
    process.env.DATABASE_URL = `file:${app.dbPath}`;
    const d = await db();
    const people = [
      { name: "Hana Head", email: "head@busyclub.test", role: "head_coach" as const },
      { name: "Cato Coach", email: "coach@busyclub.test", role: "coach" as const },
      ...Array.from({ length: ATHLETES }, (_, i) => ({
        name: `Runner ${i + 1}`,
        email: `runner${i + 1}@busyclub.test`,
        role: "athlete" as const,
      })),
    ];
    const team = await createTestTeam(d, { name: "Busy Club", people });
    teamId = team.teamId;
    const yesterday = addDays(teamToday({ timeZone: "Europe/London", now: new Date() }), -1);
    sessionIds = [];
    for (const p of people.filter((x) => x.role === "athlete")) {
      const s = await d.PlannedSession.create({
        teamId,
        athleteId: team.users[p.email]!.athleteId!,
        date: yesterday,
        startTime: "17:00",
        durationMin: 60,
        title: "Block starts",
        plannedRpe: 6,
        notes: null,
        status: "published",
        publishedAt: new Date(),
      });
      sessionIds.push({ athleteEmail: p.email, sessionId: s.id });
    }
    await closeDb();
    coach = await apiSession(app, "coach@busyclub.test", TEST_PASSWORD);
  }, 300_000);
  afterAll(async () => {
    await closeDb();
    await app?.stop();
  });

  it("20 parallel edits of one session with the same version: exactly one 200 and nineteen 409 within 2 s", async () => {
    const { sessionId } = sessionIds[0]!;
    const read = await coach.fetch(`/api/sessions/${sessionId}`);
    const { session } = (await read.json()) as { session: { version: number } };
    const started = Date.now();
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        coach.fetch(`/api/sessions/${sessionId}`, {
          method: "PATCH",
          headers: json,
          body: JSON.stringify({ version: session.version, title: `Edit ${i}` }),
        }),
      ),
    );
    const elapsed = Date.now() - started;
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses).toEqual([200, ...Array(19).fill(409)]);
    expect(elapsed).toBeLessThan(2000);
  });

  it("10 parallel edits of one template with the same version: one wins, nine get 409", async () => {
    const body = {
      kind: "acceleration",
      title: "Ten 20 m starts",
      running: { sets: 2, reps: 5, distanceM: 20, intensityPct: 95, start: "crouch", runInM: 0, restSec: 120 },
      drills: null,
      notes: null,
      durationMin: 45,
      plannedRpe: 6,
    };
    const created = await coach.fetch(`/api/teams/${teamId}/templates`, {
      method: "POST",
      headers: json,
      body: JSON.stringify(body),
    });
    expect(created.status, await created.clone().text()).toBe(201);
    const { template } = (await created.json()) as { template: { id: number; version: number } };
    expect(template.version).toBe(1);
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        coach.fetch(`/api/templates/${template.id}`, {
          method: "PUT",
          headers: json,
          body: JSON.stringify({ ...body, version: template.version, title: `Starts take ${i}` }),
        }),
      ),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([200, ...Array(9).fill(409)]);
    const winner = (await answers.find((r) => r.status === 200)!.json()) as {
      template: { title: string; version: number };
    };
    const stored = (await (await coach.fetch(`/api/templates/${template.id}`)).json()) as {
      template: { title: string; version: number };
    };
    expect(stored.template).toMatchObject({ title: winner.template.title, version: 2 });
    // A stale edit names what happened and carries the current template, so the editor can show it.
    const stale = (await answers.find((r) => r.status === 409)!.json()) as {
      error: { code: string; current: { version: number } };
    };
    expect(stale.error).toMatchObject({ code: "stale", current: { version: 2 } });
  });

  it(`${ATHLETES} athletes log their sessions at once: ${ATHLETES} × 200 and ${ATHLETES} rows`, async () => {
    const athletes: { api: Api; sessionId: number }[] = [];
    for (const s of sessionIds)
      athletes.push({ api: await apiSession(app, s.athleteEmail, TEST_PASSWORD), sessionId: s.sessionId });
    const answers = await Promise.all(
      athletes.map(({ api, sessionId }) =>
        api.fetch(`/api/sessions/${sessionId}/log`, {
          method: "PUT",
          headers: json,
          body: JSON.stringify({ completion: "yes", rpe: 7, minutes: 55, notes: "Felt quick" }),
        }),
      ),
    );
    const statuses = answers.map((r) => r.status);
    expect(
      statuses.filter((s) => s !== 200),
      JSON.stringify(statuses),
    ).toEqual([]);
    const rows = await count(app.dbPath, "SELECT COUNT(*) AS n FROM session_logs");
    expect(rows).toBe(ATHLETES);
  }, 120_000);

  it("another process holds the write lock for 10 s: writes wait or get 503 with Retry-After, and health says busy", async () => {
    const other = await openRaw(app.dbPath);
    await exec(other, "BEGIN IMMEDIATE");
    const release = new Promise<void>((resolve) => setTimeout(() => exec(other, "ROLLBACK").then(resolve), 10_000));
    try {
      const health = await fetch(`${app.url}/api/health`);
      expect(health.status).toBe(503);
      expect(await health.json()).toMatchObject({ ok: false, db: "busy" });
      expect(Number(health.headers.get("retry-after"))).toBeGreaterThan(0);

      const { sessionId } = sessionIds[1]!;
      const read = (await (await coach.fetch(`/api/sessions/${sessionId}`)).json()) as { session: { version: number } };
      const writes = await Promise.all(
        Array.from({ length: 8 }, (_, i) =>
          coach.fetch(`/api/sessions/${sessionId}`, {
            method: "PATCH",
            headers: json,
            body: JSON.stringify({ version: read.session.version, notes: `While locked ${i}` }),
          }),
        ),
      );
      const statuses = await Promise.all(
        writes.map(async (w) =>
          `${w.status} ${w.headers.get("retry-after") ?? "-"} ${w.status >= 500 ? await w.text() : ""}`.trim(),
        ),
      );
      // Each write waited for the lock (then ended as a normal edit: one 200, the rest 409) or gave up with 503.
      for (const s of statuses) expect(s, statuses.join("\n")).toMatch(/^(200 -|409 -|503 [1-9]\d* .*)$/);
      expect(
        statuses.some((s) => s.startsWith("503")),
        statuses.join("\n"),
      ).toBe(true);
    } finally {
      await release;
      await close(other);
    }
    // Once the other process lets go, writes go through again and health is back.
    // Health keeps saying busy for up to 2 s after a write last gave up (lib/db/health.ts), so poll briefly.
    let after = await fetch(`${app.url}/api/health`);
    for (let i = 0; i < 20 && after.status !== 200; i++) {
      await new Promise((r) => setTimeout(r, 250));
      after = await fetch(`${app.url}/api/health`);
    }
    expect(after.status).toBe(200);
    const { sessionId } = sessionIds[2]!;
    const read = (await (await coach.fetch(`/api/sessions/${sessionId}`)).json()) as { session: { version: number } };
    const edit = await coach.fetch(`/api/sessions/${sessionId}`, {
      method: "PATCH",
      headers: json,
      body: JSON.stringify({ version: read.session.version, notes: "After the lock" }),
    });
    expect(edit.status).toBe(200);
  }, 60_000);
});

function openRaw(file: string): Promise<sqlite3.Database> {
  return new Promise((resolve, reject) => {
    const conn = new sqlite3.Database(file, (err) => (err ? reject(err) : resolve(conn)));
  });
}
function exec(conn: sqlite3.Database, sql: string): Promise<void> {
  return new Promise((resolve, reject) => conn.exec(sql, (err) => (err ? reject(err) : resolve())));
}
function close(conn: sqlite3.Database): Promise<void> {
  return new Promise((resolve, reject) => conn.close((err) => (err ? reject(err) : resolve())));
}
async function count(file: string, sql: string): Promise<number> {
  const conn = await openRaw(file);
  const n = await new Promise<number>((resolve, reject) =>
    conn.get(sql, (err, row: { n: number }) => (err ? reject(err) : resolve(row.n))),
  );
  await close(conn);
  return n;
}
