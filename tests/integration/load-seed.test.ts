import { describe, expect, it } from "vitest";
import { getSquadWeekLoad } from "@/lib/data/load-views";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { seedDemo } from "@/lib/seed";
import { HISTORY_WEEKS, SPIKE_ATHLETE } from "@/lib/seed/seed-load";
import { setupTestDb } from "../helpers/db";

// The demo seed's promises about load (not its exact numbers): real-looking history, a plan ahead, one spike.
const d = await setupTestDb();
const today = "2026-12-02"; // a Wednesday
const club = await seedDemo(d, { today });
const week = startOfWeek(today, 1);

describe("demo load seed", () => {
  it("writes a shelf of templates, 8+ weeks of logged history and a plan for this week and next", async () => {
    expect(HISTORY_WEEKS).toBeGreaterThanOrEqual(8);
    expect(await d.BlockTemplate.count({ where: { teamId: club.teamId } })).toBeGreaterThanOrEqual(10);
    const first = (await d.PlannedSession.min("date")) as string;
    expect(first <= addDays(week, -7 * 8)).toBe(true);
    const next = await d.PlannedSession.findAll({
      where: { date: [addDays(week, 7), addDays(week, 8), addDays(week, 10)] },
      attributes: ["status"],
    });
    expect(new Set(next.map((s) => s.status))).toEqual(new Set(["draft", "published"]));
    const past = await d.PlannedSession.count({ where: { status: "published" } });
    const logs = await d.SessionLog.findAll({ attributes: ["completion"] });
    expect(logs.length).toBeLessThan(past); // some sessions were never logged
    expect(new Set(logs.map((l) => l.completion))).toEqual(new Set(["yes", "partly", "no"]));
    expect(
      await d.SessionLog.count({
        where: {
          sessionId: (await d.PlannedSession.findAll({ where: { date: addDays(week, 7) }, attributes: ["id"] })).map(
            (s) => s.id,
          ),
        },
      }),
    ).toBe(0);
  });

  it("puts exactly one athlete into a spike next week, and nobody this week", async () => {
    const spikes = async (w: string) =>
      (await getSquadWeekLoad({ teamId: club.teamId, week: w, view: "projected", today })).rows
        .filter((r) => r.flags.some((f) => f.kind === "spike"))
        .map((r) => r.name);
    expect(await spikes(addDays(week, 7))).toEqual([SPIKE_ATHLETE]);
    expect(await spikes(week)).toEqual([]);
  });
});
