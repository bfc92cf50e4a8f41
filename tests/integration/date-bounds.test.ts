import { describe, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";
import { who } from "../helpers/handler-session";

// Plan and load dates are bounded to 1900-01-01..2100-12-31 (lib/validations/dates.ts): a date outside
// answers 400 naming the field instead of reaching date arithmetic that overflows near year 9999.

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const sessions = await import("@/app/api/teams/[teamId]/sessions/route");
const session = await import("@/app/api/sessions/[sessionId]/route");
const athleteLoad = await import("@/app/api/athletes/[athleteId]/load/route");
const squadLoad = await import("@/app/api/teams/[teamId]/load/route");
const plan = await import("@/app/api/teams/[teamId]/plan/route");
const preview = await import("@/app/api/load/preview/route");
const tools = await import("@/app/api/teams/[teamId]/plan/[tool]/route");
const restrictions = await import("@/app/api/athletes/[athleteId]/restrictions/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const ada = a.users["ada@alphatrack.test"].athleteId!;
const T = String(a.teamId);
const A = String(ada);
const week = addDays(startOfWeek(teamToday({ timeZone: "Europe/London", now: new Date() }), 1), 7);

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const req = (path: string, method = "GET", body?: unknown) =>
  new Request(`http://test${path}`, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const json = async (res: Response) => ({
  status: res.status,
  body: (await res.json()) as {
    error?: { fields?: Record<string, string[]> };
    sessions?: { id: number; version: number }[];
  },
});
const FAR = ["9999-12-31", "9999-12-25", "2101-01-01", "1899-12-31", "0001-01-01"];

async function expect400(res: Response, field: string, label: string) {
  const answer = await json(res);
  expect(answer.status, label).toBe(400);
  expect(answer.body.error?.fields, label).toHaveProperty([field]);
}

describe("dates outside 1900-01-01..2100-12-31", () => {
  it("session create and move answer 400 naming date", async () => {
    who.userId = a.users.coach.userId;
    const blank = {
      from: "blank",
      athleteId: ada,
      startTime: "17:00",
      durationMin: 40,
      title: "Speed",
      plannedRpe: 5,
      blocks: [],
    };
    for (const date of FAR)
      await expect400(
        await sessions.POST(req(`/api/teams/${T}/sessions`, "POST", { ...blank, date }), p({ teamId: T })),
        "date",
        date,
      );
    const made = await json(
      await sessions.POST(req(`/api/teams/${T}/sessions`, "POST", { ...blank, date: week }), p({ teamId: T })),
    );
    expect(made.status).toBe(201);
    const { id: sessionId, version } = made.body.sessions![0];
    const id = String(sessionId);
    for (const date of FAR)
      await expect400(
        await session.PATCH(req(`/api/sessions/${id}`, "PATCH", { version: version, date }), p({ sessionId: id })),
        "date",
        date,
      );
    // The edges themselves are fine.
    expect(
      (
        await session.PATCH(
          req(`/api/sessions/${id}`, "PATCH", { version: version, date: "2100-12-31" }),
          p({ sessionId: id }),
        )
      ).status,
    ).toBe(200);
    for (const date of FAR)
      await expect400(
        await tools.POST(
          req(`/api/teams/${T}/plan/copy-to-next`, "POST", { week: date }),
          p({ teamId: T, tool: "copy-to-next" }),
        ),
        "week",
        date,
      );
    for (const date of FAR)
      await expect400(await plan.GET(req(`/api/teams/${T}/plan?week=${date}`), p({ teamId: T })), "week", date);
  });

  it("the athlete's and the squad's load views answer 400 naming the field", async () => {
    who.userId = a.users.coach.userId;
    for (const date of FAR) {
      await expect400(
        await athleteLoad.GET(req(`/api/athletes/${A}/load?from=${date}&to=${date}`), p({ athleteId: A })),
        "from",
        date,
      );
      await expect400(
        await athleteLoad.GET(req(`/api/athletes/${A}/load?to=${date}`), p({ athleteId: A })),
        "to",
        date,
      );
      await expect400(await squadLoad.GET(req(`/api/teams/${T}/load?week=${date}`), p({ teamId: T })), "week", date);
    }
    const edge = await athleteLoad.GET(
      req(`/api/athletes/${A}/load?from=2100-01-01&to=2100-12-31`),
      p({ athleteId: A }),
    );
    expect(edge.status).toBe(200);
  });

  it("the preview answers 400 naming the week and the session's date", async () => {
    who.userId = a.users.coach.userId;
    for (const date of FAR) {
      await expect400(
        await preview.POST(
          req("/api/load/preview", "POST", { teamId: a.teamId, athleteId: ada, week: date, sessions: [] }),
          p({}),
        ),
        "week",
        date,
      );
      const s = { date, durationMin: 30, plannedRpe: 4, blocks: [] };
      await expect400(
        await preview.POST(
          req("/api/load/preview", "POST", { teamId: a.teamId, athleteId: ada, week, sessions: [s] }),
          p({}),
        ),
        "sessions.0.date",
        date,
      );
    }
  });

  it("a restriction's dates are bounded too", async () => {
    who.userId = a.users.physio.userId;
    for (const date of FAR) {
      const body = { rule: "contact_cap", maxContacts: 40, startsOn: week, endsOn: date, note: "ankle" };
      await expect400(
        await restrictions.POST(req(`/api/athletes/${A}/restrictions`, "POST", body), p({ athleteId: A })),
        "endsOn",
        date,
      );
    }
  });
});
