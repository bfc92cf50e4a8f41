import { describe, expect, it } from "vitest";
import type { BlockInput } from "@/lib/load/types";
import {
  describeRestriction,
  isActiveOn,
  isCurrent,
  lastDay,
  newHits,
  restrictionHits,
  ruleBreaches,
  type Restriction,
} from "@/lib/restrictions/rules";

// Invented restrictions and sessions. Limiting a block kind, a running intensity or the ground contacts per
// session while an injury settles is common practice in return-to-sprint plans.

const base = { athleteId: 7, note: "Hamstring settling", setByName: "Physio", endsOn: null, liftedOn: null } as const;
const noFlys: Restriction = {
  ...base,
  id: 1,
  rule: "no_kind",
  blockKinds: ["max_velocity"],
  startsOn: "2026-12-07",
  endsOn: "2026-12-18",
};
const cap85: Restriction = { ...base, id: 2, rule: "max_intensity", maxPct: 85, startsOn: "2026-12-01" };
const contacts60: Restriction = {
  ...base,
  id: 3,
  rule: "contact_cap",
  maxContacts: 60,
  startsOn: "2026-12-01",
  liftedOn: "2026-12-10",
};

const flys: BlockInput = {
  kind: "max_velocity",
  title: "Flying 30s",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
};
const tempo: BlockInput = {
  kind: "tempo",
  title: "Tempo 100s",
  running: { sets: 2, reps: 5, distanceM: 100, intensityPct: 70, start: "standing", runInM: 0, restSec: 60 },
};
// NSCA (Potach & Chu): one contact per landing, so 4 × 10 bounds at 2 contacts per rep = 80 contacts.
const bounds: BlockInput = {
  kind: "plyometric",
  title: "Bounds",
  drills: [{ name: "Bounding", sets: 4, reps: 10, contactsPerRep: 2, intensity: "high" }],
};
const pogos: BlockInput = {
  kind: "plyometric",
  title: "Pogos",
  drills: [{ name: "Pogo", sets: 3, reps: 20, contactsPerRep: 1, intensity: "low" }],
};

describe("restriction dates", () => {
  it("applies from its first to its last day, both included", () => {
    expect(isActiveOn(noFlys, "2026-12-06")).toBe(false);
    expect(isActiveOn(noFlys, "2026-12-07")).toBe(true);
    expect(isActiveOn(noFlys, "2026-12-18")).toBe(true);
    expect(isActiveOn(noFlys, "2026-12-19")).toBe(false);
  });

  it("an open-ended one applies until lifted; the lift day is free again", () => {
    expect(isActiveOn(cap85, "2027-06-01")).toBe(true);
    expect(lastDay(contacts60)).toBe("2026-12-09");
    expect(isActiveOn(contacts60, "2026-12-09")).toBe(true);
    expect(isActiveOn(contacts60, "2026-12-10")).toBe(false);
  });

  it("a lift before the end date wins, and one lifted before it began never applies", () => {
    expect(lastDay({ endsOn: "2026-12-18", liftedOn: "2026-12-12" })).toBe("2026-12-11");
    const never = { ...noFlys, liftedOn: noFlys.startsOn };
    expect(isActiveOn(never, "2026-12-07")).toBe(false);
    expect(isCurrent(never, "2026-12-01")).toBe(false);
    expect(describeRestriction(never)).toMatch(/lifted before it began/);
  });

  it("is current while some day from today on is still covered", () => {
    expect(isCurrent(noFlys, "2026-12-01")).toBe(true);
    expect(isCurrent(noFlys, "2026-12-18")).toBe(true);
    expect(isCurrent(noFlys, "2026-12-19")).toBe(false);
  });

  it("says what it limits and when", () => {
    expect(describeRestriction(noFlys)).toBe("No max velocity, Mon 7 Dec – Fri 18 Dec");
    expect(describeRestriction(cap85)).toBe("Running at most 85% of vmax, from Tue 1 Dec, until lifted");
    expect(describeRestriction(contacts60)).toBe("At most 60 ground contacts per session, Tue 1 Dec – Wed 9 Dec");
  });
});

describe("which sessions break a restriction", () => {
  it("a block kind: every block of that kind, by title", () => {
    expect(ruleBreaches(noFlys, [tempo, flys])).toEqual(["Flying 30s: max velocity"]);
    expect(ruleBreaches(noFlys, [tempo, bounds])).toEqual([]);
  });

  it("an intensity cap: running blocks above it (the cap itself passes); drills never", () => {
    expect(ruleBreaches(cap85, [flys, tempo, bounds])).toEqual(["Flying 30s: 95% of vmax"]);
    const at85: BlockInput = { ...tempo, running: { ...tempo.running!, intensityPct: 85 } };
    expect(ruleBreaches(cap85, [at85])).toEqual([]);
  });

  it("a contact cap: the whole session's contacts (NSCA count) above the cap; the cap itself passes", () => {
    expect(ruleBreaches(contacts60, [bounds])).toEqual(["80 ground contacts in the session"]);
    expect(ruleBreaches(contacts60, [pogos])).toEqual([]); // 3 × 20 × 1 = 60
    expect(ruleBreaches(contacts60, [pogos, { ...pogos, title: "More pogos" }])).toEqual([
      "120 ground contacts in the session",
    ]);
  });

  it("only the athlete's own restrictions, only on days they apply, never on a cancelled session", () => {
    const all = [noFlys, cap85, contacts60];
    const hits = restrictionHits(all, { athleteId: 7, date: "2026-12-08", blocks: [flys, bounds] });
    expect(hits.map((h) => h.restrictionId)).toEqual([1, 2, 3]);
    expect(hits[0]).toMatchObject({
      athleteId: 7,
      date: "2026-12-08",
      rule: "No max velocity, Mon 7 Dec – Fri 18 Dec",
      detail: "Flying 30s: max velocity",
    });
    expect(restrictionHits(all, { athleteId: 8, date: "2026-12-08", blocks: [flys, bounds] })).toEqual([]);
    expect(restrictionHits(all, { athleteId: 7, date: "2026-12-12", blocks: [bounds] })).toEqual([]);
    expect(restrictionHits(all, { athleteId: 7, date: "2026-12-08", status: "cancelled", blocks: [flys] })).toEqual([]);
  });

  it("a change only asks again for what it adds", () => {
    const before = restrictionHits([noFlys], { athleteId: 7, date: "2026-12-08", blocks: [flys] });
    const edited = restrictionHits([noFlys, cap85], { athleteId: 7, date: "2026-12-08", blocks: [flys] });
    expect(newHits(before, edited).map((h) => h.restrictionId)).toEqual([2]);
    const moved = restrictionHits([noFlys], { athleteId: 7, date: "2026-12-09", blocks: [flys] });
    expect(newHits(before, moved)).toHaveLength(1);
  });
});
