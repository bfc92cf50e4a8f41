import { beforeEach, describe, expect, it } from "vitest";
import { who } from "../helpers/handler-session";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// The handlers run for real over a temp SQLite file; only next-auth's session lookup is replaced.

process.env.APP_URL = "https://club.sprintwright.test";
const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const templates = await import("@/app/api/teams/[teamId]/templates/route");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const plan = await import("@/app/api/teams/[teamId]/plan/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const T = String(a.teamId);
const week = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);
const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const template = {
  kind: "recovery",
  title: "Strides",
  running: null,
  drills: null,
  notes: null,
  durationMin: 20,
  plannedRpe: 3,
};
const count = () => d.BlockTemplate.count({ where: { teamId: a.teamId } });

function post(body: BodyInit, headers: Record<string, string> = {}) {
  return templates.POST(
    new Request(`http://127.0.0.1:3000/api/teams/${T}/templates`, {
      method: "POST",
      headers: { "content-type": "application/json", ...headers },
      body,
      duplex: "half",
    } as RequestInit),
    p({ teamId: T }),
  );
}

beforeEach(() => void (who.userId = a.users.coach.userId));

describe("request size limit (1 MB of JSON)", () => {
  it("answers 413 to a declared body over the limit without reading it", async () => {
    const before = await count();
    const res = await post(JSON.stringify({ ...template, notes: "x".repeat(2_000_000) }));
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe("too_large");
    expect(await count()).toBe(before);
  });

  it("stops reading an endless streamed body once it passes the limit", async () => {
    let sent = 0;
    const endless = new ReadableStream<Uint8Array>({
      pull(controller) {
        sent += 64 * 1024;
        controller.enqueue(new Uint8Array(64 * 1024).fill(0x20));
      },
    });
    const res = await post(endless);
    expect(res.status).toBe(413);
    // It read a little past 1 MB (plus what the stream queued ahead), not the whole of an endless body.
    expect(sent).toBeLessThan(2 * 1024 * 1024);
  });

  it("still takes a body just under the limit, and answers 400 to one that is not UTF-8", async () => {
    const big = await post(JSON.stringify({ ...template, padding: " ".repeat(900_000) }));
    expect(big.status).toBe(201);
    const latin1 = await post(new Uint8Array([0x7b, 0x22, 0xe9, 0x22, 0x7d]));
    expect(latin1.status).toBe(400);
  });
});

describe("Origin check on state-changing requests", () => {
  it("refuses a write from another site's page with 403 and writes nothing", async () => {
    const before = await count();
    for (const headers of <Record<string, string>[]>[
      { origin: "https://evil.test" },
      { origin: "null" },
      { origin: "http://127.0.0.1:3000.evil.test" },
      { "sec-fetch-site": "cross-site" },
      { "sec-fetch-site": "same-site", origin: "http://127.0.0.1:3000" },
    ]) {
      const res = await post(JSON.stringify(template), headers);
      expect(res.status, JSON.stringify(headers)).toBe(403);
    }
    expect(await count()).toBe(before);
  });

  it("accepts this server's own origin, the configured app URL, and clients that send no Origin", async () => {
    for (const headers of <Record<string, string>[]>[
      { origin: "http://127.0.0.1:3000", "sec-fetch-site": "same-origin" },
      { origin: "https://club.sprintwright.test" },
      {},
    ]) {
      expect((await post(JSON.stringify(template), headers)).status, JSON.stringify(headers)).toBe(201);
    }
    // Reads are not checked: a link from another site may open a page that then fetches its data.
    const read = await plan.GET(
      new Request(`http://127.0.0.1:3000/api/teams/${T}/plan?week=${week}`, {
        headers: { origin: "https://evil.test" },
      }),
      p({ teamId: T }),
    );
    expect(read.status).toBe(200);
  });
});

describe("Cache-Control on JSON answers", () => {
  it("marks answers and errors no-store", async () => {
    const read = await plan.GET(new Request(`http://test/api/teams/${T}/plan?week=${week}`), p({ teamId: T }));
    expect(read.headers.get("cache-control")).toBe("no-store");
    const made = await sessions.POST(
      new Request(`http://test/api/teams/${T}/sessions`, {
        method: "POST",
        body: JSON.stringify({
          from: "blank",
          athleteId: ada,
          date: week,
          durationMin: 30,
          title: "Speed",
          plannedRpe: 4,
          blocks: [],
        }),
      }),
      p({ teamId: T }),
    );
    expect(made.status).toBe(201);
    expect(made.headers.get("cache-control")).toBe("no-store");
    who.userId = null;
    const refused = await plan.GET(new Request(`http://test/api/teams/${T}/plan`), p({ teamId: T }));
    expect(refused.status).toBe(401);
    expect(refused.headers.get("cache-control")).toBe("no-store");
  });
});
