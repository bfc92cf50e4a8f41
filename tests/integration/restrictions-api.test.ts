import { beforeEach, describe, expect, it } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { addDays } from "@/lib/dates/plain-date";
import type { Restriction } from "@/lib/restrictions/rules";
import { setupTestDb } from "../helpers/db";
import { createTestTeam } from "../helpers/fixtures";

// Alerts, calendar invitations and their e-mails run for real here.
notices.hooks = "on";

// The route handlers run for real; only next-auth's session lookup is replaced by "who is asking".

const d = await setupTestDb();
const { teamToday } = await import("@/lib/dates/zoned");
const athleteRoute = await import("@/app/api/athletes/[athleteId]/restrictions/route");
const restrictionRoute = await import("@/app/api/restrictions/[restrictionId]/route");

const a = await createTestTeam(d, { name: "Alpha Track" });
const b = await createTestTeam(d, { name: "Bravo Track" });
const physio = a.users.physio;
const coach = a.users.coach;
const head = a.users.head_coach;
const ada = a.users["ada@alphatrack.test"];
const ben = a.users["ben@alphatrack.test"];
const bravoPhysio = b.users.physio;
const today = teamToday({ timeZone: "Europe/London", now: new Date() });

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
type Body = {
  restrictions?: Restriction[];
  restriction?: Restriction;
  overrides?: Array<Record<string, unknown>>;
  error?: { code: string; fields?: Record<string, string[]> };
};
async function json(res: Response) {
  return { status: res.status, body: (await res.json()) as Body };
}
const as = (userId: number | null) => {
  who.userId = userId;
};
const list = (athleteId: number) =>
  athleteRoute
    .GET(new Request(`http://test/api/athletes/${athleteId}/restrictions`), p({ athleteId: String(athleteId) }))
    .then(json);
const create = (athleteId: number, body: unknown) =>
  athleteRoute
    .POST(
      new Request(`http://test/api/athletes/${athleteId}/restrictions`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      }),
      p({ athleteId: String(athleteId) }),
    )
    .then(json);
const lift = (restrictionId: number, body: unknown = { action: "lift" }) =>
  restrictionRoute
    .PATCH(
      new Request(`http://test/api/restrictions/${restrictionId}`, {
        method: "PATCH",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      }),
      p({ restrictionId: String(restrictionId) }),
    )
    .then(json);

const noMaxV = {
  rule: "no_kind",
  blockKinds: ["max_velocity"],
  startsOn: addDays(today, -2),
  endsOn: addDays(today, 10),
  note: "  Hamstring tightness; acceleration to 20 m is fine.  ",
};

beforeEach(() => as(null));

describe("POST /api/athletes/[athleteId]/restrictions", () => {
  it("lets the physio set a restriction (201) and answers it in the rules' shape", async () => {
    as(physio.userId);
    const { status, body } = await create(ada.athleteId!, noMaxV);
    expect(status).toBe(201);
    expect(body.restriction).toMatchObject({
      athleteId: ada.athleteId,
      rule: "no_kind",
      blockKinds: ["max_velocity"],
      startsOn: noMaxV.startsOn,
      endsOn: noMaxV.endsOn,
      liftedOn: null,
      setByName: "Pia Physio",
    });
    // The note is stored trimmed.
    expect(body.restriction!.note).toBe("Hamstring tightness; acceleration to 20 m is fine.");
  });

  it("stores each rule's limit", async () => {
    as(physio.userId);
    const pct = await create(ada.athleteId!, {
      rule: "max_intensity",
      maxPct: 85,
      startsOn: today,
      note: "Ease back in.",
    });
    expect(pct.status).toBe(201);
    expect(pct.body.restriction).toMatchObject({ rule: "max_intensity", maxPct: 85, endsOn: null });
    const cap = await create(ben.athleteId!, {
      rule: "contact_cap",
      maxContacts: 60,
      startsOn: today,
      endsOn: null,
      note: "Sore Achilles.",
    });
    expect(cap.status).toBe(201);
    expect(cap.body.restriction).toMatchObject({ rule: "contact_cap", maxContacts: 60 });
  });

  it("refuses coaches and head coaches (403) and athletes (403), and another team's physio (404)", async () => {
    for (const user of [coach, head, ada]) {
      as(user.userId);
      expect((await create(ada.athleteId!, noMaxV)).status).toBe(403);
    }
    as(bravoPhysio.userId);
    expect((await create(ada.athleteId!, noMaxV)).status).toBe(404);
    as(null);
    expect((await create(ada.athleteId!, noMaxV)).status).toBe(401);
  });

  it("answers bad input with 400 naming the field", async () => {
    as(physio.userId);
    const cases: Array<[unknown, string]> = [
      [{ ...noMaxV, endsOn: addDays(noMaxV.startsOn, -1) }, "endsOn"],
      [{ ...noMaxV, blockKinds: [] }, "blockKinds"],
      [{ ...noMaxV, blockKinds: ["strength"] }, "blockKinds.0"],
      [{ ...noMaxV, note: undefined }, "note"],
      [{ ...noMaxV, note: " a " }, "note"],
      [{ ...noMaxV, startsOn: "2026-02-30" }, "startsOn"],
      [{ rule: "max_intensity", maxPct: 40, startsOn: today, note: "Ease back in." }, "maxPct"],
      [{ rule: "contact_cap", maxContacts: 12.5, startsOn: today, note: "Sore Achilles." }, "maxContacts"],
      [{ rule: "contact_cap", maxContacts: 501, startsOn: today, note: "Sore Achilles." }, "maxContacts"],
      [{ rule: "rest", startsOn: today, note: "Sore Achilles." }, "rule"],
    ];
    for (const [body, field] of cases) {
      const res = await create(ada.athleteId!, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error?.fields ?? {}), JSON.stringify(body)).toContain(field);
    }
  });
});

describe("GET /api/athletes/[athleteId]/restrictions", () => {
  it("lists every restriction of the athlete, newest start first, to staff and to the athlete", async () => {
    as(physio.userId);
    await create(ada.athleteId!, {
      rule: "contact_cap",
      maxContacts: 40,
      startsOn: addDays(today, -40),
      endsOn: addDays(today, -30),
      note: "Old knee niggle.",
    });
    for (const user of [coach, head, physio, ada]) {
      as(user.userId);
      const { status, body } = await list(ada.athleteId!);
      expect(status).toBe(200);
      expect(body.restrictions!.every((r) => r.athleteId === ada.athleteId)).toBe(true);
      const starts = body.restrictions!.map((r) => r.startsOn);
      expect(starts).toEqual([...starts].sort().reverse());
      expect(starts.at(-1)).toBe(addDays(today, -40));
      expect(body.overrides).toEqual([]);
    }
  });

  it("hides other athletes from an athlete and the team from another team's members (404)", async () => {
    as(ada.userId);
    expect((await list(ben.athleteId!)).status).toBe(404);
    as(bravoPhysio.userId);
    expect((await list(ada.athleteId!)).status).toBe(404);
    as(physio.userId);
    expect((await list(999_999)).status).toBe(404);
  });

  it("shows coaches' overrides with what, why and who", async () => {
    as(physio.userId);
    const { body } = await create(ben.athleteId!, {
      rule: "no_kind",
      blockKinds: ["plyometric"],
      startsOn: today,
      endsOn: addDays(today, 6),
      note: "Shin soreness.",
    });
    const r = body.restriction!;
    await d.RestrictionOverride.create({
      teamId: a.teamId,
      restrictionId: r.id,
      athleteId: ben.athleteId!,
      sessionId: null,
      sessionDate: addDays(today, 1),
      detail: "Pogo hops: plyometrics",
      reason: "Low pogos only, cleared on the phone",
      userId: coach.userId,
    });
    as(coach.userId);
    const { status, body: listed } = await list(ben.athleteId!);
    expect(status).toBe(200);
    expect(listed.overrides).toHaveLength(1);
    expect(listed.overrides![0]).toMatchObject({
      restrictionId: r.id,
      sessionDate: addDays(today, 1),
      detail: "Pogo hops: plyometrics",
      reason: "Low pogos only, cleared on the phone",
      who: "Cato Coach",
    });
    expect(listed.overrides![0].restriction).toMatch(/^No plyometrics, /);
    expect(typeof listed.overrides![0].createdAt).toBe("string");
    // Ada's list does not show Ben's overrides.
    expect((await list(ada.athleteId!)).body.overrides).toEqual([]);
  });
});

describe("PATCH /api/restrictions/[restrictionId]", () => {
  it("lifts from today, and lifting again changes nothing", async () => {
    as(physio.userId);
    const { body } = await create(ada.athleteId!, { ...noMaxV, note: "To be lifted." });
    const id = body.restriction!.id;
    const first = await lift(id);
    expect(first.status).toBe(200);
    expect(first.body.restriction).toMatchObject({ id, liftedOn: today });
    const again = await lift(id);
    expect(again.status).toBe(200);
    expect(again.body.restriction!.liftedOn).toBe(today);
    const row = await d.Restriction.findByPk(id);
    expect(row!.liftedBy).toBe(physio.userId);
  });

  it("lifts one that has not begun on its first day, so it never applies", async () => {
    as(physio.userId);
    const startsOn = addDays(today, 5);
    const { body } = await create(ada.athleteId!, {
      rule: "max_intensity",
      maxPct: 80,
      startsOn,
      endsOn: addDays(today, 9),
      note: "Planned easing.",
    });
    const { status, body: lifted } = await lift(body.restriction!.id);
    expect(status).toBe(200);
    expect(lifted.restriction!.liftedOn).toBe(startsOn);
  });

  it("checks the asker against the restriction's team: 403 without the permission, 404 elsewhere, 400 for a bad action", async () => {
    as(physio.userId);
    const { body } = await create(ada.athleteId!, { ...noMaxV, note: "Guarded." });
    const id = body.restriction!.id;
    as(coach.userId);
    expect((await lift(id)).status).toBe(403);
    as(ada.userId);
    expect((await lift(id)).status).toBe(403);
    as(bravoPhysio.userId);
    expect((await lift(id)).status).toBe(404);
    expect((await lift(999_999)).status).toBe(404);
    as(null);
    expect((await lift(id)).status).toBe(401);
    as(physio.userId);
    const bad = await lift(id, { action: "extend" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error?.fields ?? {})).toContain("action");
    expect((await d.Restriction.findByPk(id))!.liftedOn).toBeNull();
  });
});
