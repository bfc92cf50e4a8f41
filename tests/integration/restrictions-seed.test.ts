import { describe, expect, it } from "vitest";
import { listRestrictions } from "@/lib/data/restrictions";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { isActiveOn, restrictionHits } from "@/lib/restrictions/rules";
import { seedClub } from "@/lib/seed/seed-club";
import { seedLoad } from "@/lib/seed/seed-load";
import { PAST_RESTRICTED_ATHLETE, RESTRICTED_ATHLETE, seedRestrictions } from "@/lib/seed/seed-restrictions";
import { setupTestDb } from "../helpers/db";

// The demo's restrictions: one current, one past, and a plan that breaks neither; nothing else of the plan moves.
const d = await setupTestDb();
const today = "2026-12-01"; // a Tuesday: the restriction starts in the previous week
const week = startOfWeek(today, 1);

async function planSnapshot() {
  const sessions = await d.PlannedSession.findAll({
    include: [{ model: d.SessionBlock, as: "blocks" }],
    order: [["id", "ASC"]],
  });
  return sessions.map((s) => ({
    id: s.id,
    athleteId: s.athleteId,
    date: s.date,
    title: s.title,
    status: s.status,
    blocks: s
      .blocks!.sort((x, y) => x.position - y.position)
      .map((b) => ({ id: String(b.id), kind: b.kind, title: b.title, running: b.running, drills: b.drills })),
  }));
}

const club = await seedClub(d);
await seedLoad(d, club, { today });
const before = await planSnapshot();
await seedRestrictions(d, club, { today });
const after = await planSnapshot();
const restrictions = await listRestrictions({ teamId: club.teamId });
const dario = club.athleteIds[RESTRICTED_ATHLETE];

describe("demo restrictions seed", () => {
  it("gives Dario one current no-max-velocity restriction from four days ago to the end of the week, set by the physio", () => {
    const current = restrictions.filter((r) => isActiveOn(r, today));
    expect(current).toHaveLength(1);
    expect(current[0]).toMatchObject({
      athleteId: dario,
      rule: "no_kind",
      blockKinds: ["max_velocity"],
      startsOn: addDays(today, -4),
      endsOn: addDays(week, 6),
      liftedOn: null,
      setByName: "Imogen Dervaux",
    });
    expect(current[0].note).toMatch(/hamstring/i);
  });

  it("keeps one ended restriction on another athlete for history", () => {
    const past = restrictions.filter((r) => r.athleteId === club.athleteIds[PAST_RESTRICTED_ATHLETE]);
    expect(past).toHaveLength(1);
    expect(past[0].endsOn! < today).toBe(true);
  });

  it("seeds a plan that breaks no restriction", () => {
    const hits = after.flatMap((s) => restrictionHits(restrictions, s));
    expect(hits).toEqual([]);
    // Without the swap the current one would have been broken: the test has teeth.
    expect(before.flatMap((s) => restrictionHits(restrictions, s)).length).toBeGreaterThan(0);
  });

  it("changes only Dario's sessions inside the restriction's days", () => {
    const r = restrictions.find((x) => x.athleteId === dario)!;
    const touched = (s: (typeof after)[number]) => s.athleteId === dario && isActiveOn(r, s.date);
    expect(after.filter((s) => !touched(s))).toEqual(before.filter((s) => !touched(s)));
    const swapped = after.filter(touched).flatMap((s) => s.blocks);
    expect(swapped.some((b) => b.kind === "acceleration" && b.title.startsWith("Block starts"))).toBe(true);
  });
});
