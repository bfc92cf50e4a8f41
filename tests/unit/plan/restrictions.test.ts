import { describe, expect, it } from "vitest";
import { resolveDrop } from "@/lib/plan/drop";
import { changeHits, sessionHits } from "@/lib/plan/restrictions";
import type { Restriction } from "@/lib/restrictions/rules";
import { addDays } from "@/lib/dates/plain-date";
import { WEEK, planWeek, session } from "./fixtures";

// Invented: Maya (1) may not run max velocity from Wednesday; Jonah (2) has no restriction.
const wed = addDays(WEEK, 2);
const noFlys: Restriction = {
  id: 5,
  athleteId: 1,
  rule: "no_kind",
  blockKinds: ["max_velocity"],
  startsOn: wed,
  endsOn: null,
  liftedOn: null,
  note: "Calf",
  setByName: "Physio",
};
const mayaMon = session(1, WEEK);
const week = {
  ...planWeek([
    { id: 1, name: "Maya", groupId: 10, sessions: [mayaMon] },
    { id: 2, name: "Jonah", groupId: 10, sessions: [] },
  ]),
  restrictions: [noFlys],
};
const change = (source: Parameters<typeof resolveDrop>[0]["source"], athleteId: number, date: string, copy = false) => {
  const out = resolveDrop({ week, source, target: { type: "cell", athleteId, date }, copy });
  if (!out?.ok) throw new Error("expected a change");
  return out.change;
};
const flysTemplate = { type: "template", templateId: 1 } as const; // fixtures: template 1 is max velocity

describe("changeHits: the grid's check before a drop", () => {
  it("a max-velocity template on a restricted day is caught, before the restriction starts it is not", () => {
    expect(changeHits(week, change(flysTemplate, 1, wed))).toEqual([
      expect.objectContaining({ restrictionId: 5, athleteId: 1, date: wed, detail: "Flying 30s: max velocity" }),
    ]);
    expect(changeHits(week, change(flysTemplate, 1, addDays(WEEK, 1)))).toEqual([]);
    expect(changeHits(week, change(flysTemplate, 2, wed))).toEqual([]);
  });

  it("a max-velocity session moved or copied into the restriction is caught", () => {
    const withFlys = session(1, WEEK, {
      blocks: [
        {
          id: 90,
          templateId: 1,
          position: 0,
          kind: "max_velocity",
          title: "Flying 30s",
          running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
          drills: null,
          notes: null,
        },
      ],
    });
    const w = { ...week, athletes: week.athletes.map((a) => (a.id === 1 ? { ...a, sessions: [withFlys] } : a)) };
    const move = resolveDrop({
      week: w,
      source: { type: "session", sessionId: withFlys.id },
      target: { type: "cell", athleteId: 1, date: addDays(WEEK, 3) },
    });
    expect(move?.ok && changeHits(w, move.change)).toHaveLength(1);
    const copy = resolveDrop({
      week: w,
      source: { type: "session", sessionId: withFlys.id },
      target: { type: "cell", athleteId: 2, date: wed },
      copy: true,
    });
    expect(copy?.ok && changeHits(w, copy.change)).toEqual([]);
    expect(sessionHits(w, withFlys)).toEqual([]); // Monday is before the restriction
  });

  it("no restrictions, no work", () => {
    const free = { ...week, restrictions: [] };
    expect(changeHits(free, change(flysTemplate, 1, wed))).toEqual([]);
  });
});
