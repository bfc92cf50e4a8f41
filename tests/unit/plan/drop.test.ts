import { describe, expect, it } from "vitest";
import { cellTargetSession, resolveDrop } from "@/lib/plan/drop";
import { WEEK, history, planWeek, session } from "./fixtures";
import { addDays } from "@/lib/dates/plain-date";

const tue = addDays(WEEK, 1);
const thu = addDays(WEEK, 3);
const mayaTue = session(1, tue);
const logged = session(1, addDays(WEEK, 4), { logged: true, status: "published" });
const cancelled = session(2, tue, { status: "cancelled" });
const week = planWeek([
  { id: 1, name: "Maya", groupId: 10, past: history(1), sessions: [mayaTue, logged] },
  { id: 2, name: "Jonah", groupId: 10, past: history(2), sessions: [cancelled] },
  { id: 3, name: "Ines", groupId: 20, sessions: [] },
]);

describe("resolveDrop: which drop creates, adds a block, moves or copies", () => {
  it("a template on an empty day makes a new session", () => {
    expect(
      resolveDrop({
        week,
        source: { type: "template", templateId: 1 },
        target: { type: "cell", athleteId: 3, date: tue },
      }),
    ).toEqual({
      ok: true,
      change: { kind: "create", templateId: 1, athleteId: 3, date: tue },
    });
  });

  it("a template on a day with a session adds a block to it", () => {
    expect(
      resolveDrop({
        week,
        source: { type: "template", templateId: 2 },
        target: { type: "cell", athleteId: 1, date: tue },
      }),
    ).toEqual({
      ok: true,
      change: { kind: "add-block", templateId: 2, sessionId: mayaTue.id, athleteId: 1, date: tue },
    });
  });

  it("a cancelled or logged session does not take new blocks: a new session is made beside it", () => {
    expect(
      resolveDrop({
        week,
        source: { type: "template", templateId: 1 },
        target: { type: "cell", athleteId: 2, date: tue },
      }),
    ).toMatchObject({ change: { kind: "create" } });
    expect(
      resolveDrop({
        week,
        source: { type: "template", templateId: 1 },
        target: { type: "cell", athleteId: 1, date: logged.date },
      }),
    ).toMatchObject({ change: { kind: "create" } });
  });

  it("picks the earliest open session of the day", () => {
    const late = session(9, tue, { startTime: "18:00" });
    const early = session(9, tue, { startTime: "07:30" });
    expect(cellTargetSession([late, early])?.id).toBe(early.id);
    expect(cellTargetSession([])).toBeNull();
  });

  it("a template on a group's day goes to every athlete of the group, joining sessions already there", () => {
    const out = resolveDrop({
      week,
      source: { type: "template", templateId: 1 },
      target: { type: "group", groupId: 10, date: tue },
    });
    expect(out).toEqual({
      ok: true,
      change: {
        kind: "group",
        templateId: 1,
        groupId: 10,
        date: tue,
        targets: [
          { athleteId: 1, sessionId: mayaTue.id },
          { athleteId: 2, sessionId: null },
        ],
      },
    });
  });

  it("a session card on another day moves it; with the copy modifier it copies", () => {
    const source = { type: "session" as const, sessionId: mayaTue.id };
    expect(resolveDrop({ week, source, target: { type: "cell", athleteId: 1, date: thu } })).toEqual({
      ok: true,
      change: { kind: "move", sessionId: mayaTue.id, athleteId: 1, date: thu, fromAthleteId: 1, fromDate: tue },
    });
    expect(resolveDrop({ week, source, target: { type: "cell", athleteId: 3, date: thu }, copy: true })).toEqual({
      ok: true,
      change: { kind: "copy", sessionId: mayaTue.id, athleteId: 3, date: thu },
    });
  });

  it("dropping where it came from, or nowhere, changes nothing", () => {
    expect(
      resolveDrop({
        week,
        source: { type: "session", sessionId: mayaTue.id },
        target: { type: "cell", athleteId: 1, date: tue },
      }),
    ).toBeNull();
    expect(resolveDrop({ week, source: { type: "template", templateId: 1 }, target: null })).toBeNull();
  });

  it("refuses with a reason: logged moves, cancelled cards, sessions on groups, unknown templates, days outside the week", () => {
    const reason = (o: ReturnType<typeof resolveDrop>) => (o && !o.ok ? o.reason : null);
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "session", sessionId: logged.id },
          target: { type: "cell", athleteId: 1, date: thu },
        }),
      ),
    ).toMatch(/logged/);
    expect(
      resolveDrop({
        week,
        source: { type: "session", sessionId: logged.id },
        target: { type: "cell", athleteId: 1, date: thu },
        copy: true,
      }),
    ).toMatchObject({ ok: true, change: { kind: "copy" } });
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "session", sessionId: cancelled.id },
          target: { type: "cell", athleteId: 2, date: thu },
        }),
      ),
    ).toMatch(/cancelled/);
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "session", sessionId: mayaTue.id },
          target: { type: "group", groupId: 10, date: thu },
        }),
      ),
    ).toMatch(/groups take templates/);
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "template", templateId: 99 },
          target: { type: "cell", athleteId: 1, date: thu },
        }),
      ),
    ).toMatch(/no longer exists/);
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "template", templateId: 1 },
          target: { type: "cell", athleteId: 1, date: addDays(WEEK, 7) },
        }),
      ),
    ).toMatch(/outside/);
    expect(
      reason(
        resolveDrop({
          week,
          source: { type: "template", templateId: 1 },
          target: { type: "group", groupId: 99, date: thu },
        }),
      ),
    ).toMatch(/no athletes/);
  });
});
