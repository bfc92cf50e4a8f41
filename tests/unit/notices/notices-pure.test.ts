import { describe, expect, it } from "vitest";
import type { Flag } from "@/lib/load";
import { calendarActionFor } from "@/lib/notices/calendar-notices";
import { lastDigestSlot } from "@/lib/notices/digests";
import { feedUrl, tokenFromSegment, webcalUrl } from "@/lib/calendar/feed-url";
import type { SessionChange, SessionSnapshot } from "@/lib/plan/changes";
import { strongestByKind } from "@/lib/notices/load-alerts";
import { splitAthleteMoves } from "@/lib/notices/session-changes";
import { sealToken, unsealToken } from "@/lib/security/token-seal";

const snap = (over: Partial<SessionSnapshot> = {}): SessionSnapshot => ({
  id: 7,
  athleteId: 3,
  date: "2026-03-03",
  startTime: "17:30",
  durationMin: 60,
  title: "Flys",
  plannedRpe: 7,
  status: "published",
  sequence: 0,
  updatedAt: new Date("2026-03-01T10:00:00Z"),
  notes: null,
  blocks: [],
  ...over,
});
const change = (
  kind: SessionChange["kind"],
  before: SessionSnapshot | null,
  after: SessionSnapshot | null,
): SessionChange => ({ kind, athleteId: 3, sessionId: 7, before, after });

describe("calendarActionFor (RFC 5546 §3.2: REQUEST to add or update, CANCEL to remove)", () => {
  it("sends nothing for drafts", () => {
    expect(calendarActionFor(change("created", null, snap({ status: "draft" })))).toBeNull();
    expect(
      calendarActionFor(change("updated", snap({ status: "draft" }), snap({ status: "draft", date: "2026-03-04" }))),
    ).toBeNull();
    expect(calendarActionFor(change("deleted", snap({ status: "draft" }), null))).toBeNull();
  });
  it("invites when a session becomes published (publish, or a cancelled one brought back)", () => {
    expect(calendarActionFor(change("published", snap({ status: "draft" }), snap()))).toMatchObject({
      method: "REQUEST",
      update: false,
    });
    expect(
      calendarActionFor(change("updated", snap({ status: "cancelled", sequence: 2 }), snap({ sequence: 3 }))),
    ).toMatchObject({ method: "REQUEST", update: false, session: { sequence: 3 } });
  });
  it("updates a published session that visibly changed, with a SEQUENCE above the last one sent", () => {
    const a = calendarActionFor(change("updated", snap({ sequence: 1 }), snap({ sequence: 1, startTime: "18:00" })));
    expect(a).toMatchObject({ method: "REQUEST", update: true, session: { sequence: 2, startTime: "18:00" } });
    expect(calendarActionFor(change("updated", snap(), snap({ updatedAt: new Date() })))).toBeNull();
  });
  it("cancels a published session that is deleted, cancelled or taken back to draft", () => {
    expect(calendarActionFor(change("deleted", snap({ sequence: 4 }), null))).toMatchObject({
      method: "CANCEL",
      session: { sequence: 5, status: "cancelled" },
    });
    expect(
      calendarActionFor(change("deleted", snap({ sequence: 4 }), snap({ status: "cancelled", sequence: 5 }))),
    ).toMatchObject({ method: "CANCEL", session: { sequence: 5 } });
    expect(
      calendarActionFor(change("updated", snap({ sequence: 1 }), snap({ status: "draft", sequence: 1 }))),
    ).toMatchObject({ method: "CANCEL", session: { sequence: 2 } });
  });
});

describe("strongestByKind", () => {
  const flag = (over: Partial<Flag>): Flag => ({
    kind: "spike",
    level: "alert",
    date: "2026-03-03",
    value: 1.6,
    threshold: 1.5,
    reason: "r",
    ...over,
  });
  it("keeps one flag per alert kind: the one furthest past its threshold (recovery: the shortest gap)", () => {
    const out = strongestByKind(
      [
        flag({ kind: "weekly_jump", metric: "srpe", value: 20, threshold: 15 }),
        flag({ kind: "weekly_jump", metric: "hsrM", value: 60, threshold: 15 }),
        flag({ kind: "recovery", value: 40, threshold: 48, date: "2026-03-04" }),
        flag({ kind: "recovery", value: 20, threshold: 48, date: "2026-03-06" }),
        flag({ kind: "rising", value: 1.4, threshold: 1.3 }),
      ],
      ["spike", "weekly_jump", "recovery"],
    );
    expect(out.map((c) => [c.kind, c.metric ?? null, c.value])).toEqual([
      ["weekly_jump", "hsrM", 60],
      ["recovery", null, 20],
    ]);
  });
});

describe("feed links and tokens", () => {
  it("builds /api/calendar/<token>.ics and its webcal:// twin, and reads the token back from the path", () => {
    const url = feedUrl("https://club.example/", "abcDEF_123-xyzxyzxyzxyz");
    expect(url).toBe("https://club.example/api/calendar/abcDEF_123-xyzxyzxyzxyz.ics");
    expect(webcalUrl(url)).toBe("webcal://club.example/api/calendar/abcDEF_123-xyzxyzxyzxyz.ics");
    expect(tokenFromSegment("abcDEF_123-xyzxyzxyzxyz.ics")).toBe("abcDEF_123-xyzxyzxyzxyz");
    expect(tokenFromSegment("short.ics")).toBeNull();
    expect(tokenFromSegment("../../etc/passwd")).toBeNull();
  });
  it("seals a token so only the same secret opens it, and rejects tampering", () => {
    const secret = "a-test-secret-with-enough-length";
    const sealed = sealToken("the-token", secret);
    expect(sealed).not.toContain("the-token");
    expect(unsealToken(sealed, secret)).toBe("the-token");
    expect(unsealToken(sealed, "another-secret-of-enough-length")).toBeNull();
    const parts = sealed.split(".");
    parts[2] = parts[2]!.slice(0, -2) + (parts[2]!.endsWith("A") ? "BB" : "AA");
    expect(unsealToken(parts.join("."), secret)).toBeNull();
    expect(unsealToken("garbage", secret)).toBeNull();
  });
});

describe("lastDigestSlot (07:00 in the team's zone)", () => {
  it("is today's 07:00 after 07:00 and yesterday's before, across the UK clock change", () => {
    // UK summer time from 29 March 2026 (common practice): 07:00 BST = 06:00 UTC.
    expect(lastDigestSlot(new Date("2026-03-28T08:00:00Z"), "Europe/London").toISOString()).toBe(
      "2026-03-28T07:00:00.000Z",
    );
    expect(lastDigestSlot(new Date("2026-03-30T06:30:00Z"), "Europe/London").toISOString()).toBe(
      "2026-03-30T06:00:00.000Z",
    );
    expect(lastDigestSlot(new Date("2026-03-30T05:59:00Z"), "Europe/London").toISOString()).toBe(
      "2026-03-29T06:00:00.000Z",
    );
  });
});

describe("splitAthleteMoves", () => {
  it("turns a move to another athlete into a cancellation for one and an invitation for the other (RFC 5546 §3.2)", () => {
    const before = snap({ athleteId: 1, sequence: 2 });
    const after = snap({ athleteId: 2, sequence: 3 });
    const split = splitAthleteMoves([{ kind: "updated", athleteId: 2, sessionId: before.id, before, after }]);
    expect(split.map((c) => [c.kind, c.athleteId])).toEqual([
      ["deleted", 1],
      ["created", 2],
    ]);
    expect(calendarActionFor(split[0]!)).toMatchObject({ method: "CANCEL", session: { status: "cancelled" } });
    expect(calendarActionFor(split[1]!)).toMatchObject({ method: "REQUEST", update: false });
  });

  it("leaves changes within one athlete alone", () => {
    const c = change("updated", snap({ startTime: "09:00" }), snap({ startTime: "10:00" }));
    expect(splitAthleteMoves([c])).toEqual([c]);
  });
});
