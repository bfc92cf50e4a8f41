import { describe, expect, it } from "vitest";
import { listAlerts } from "@/lib/data/alerts";
import { currentAvailability } from "@/lib/data/availability";
import { recentLogNotes } from "@/lib/data/log-notes";
import { listSessionConflicts } from "@/lib/data/session-conflicts";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { seedDemo } from "@/lib/seed";
import { SPIKE_ATHLETE } from "@/lib/seed/seed-load";
import { MODIFIED_ATHLETE, PAIN_ATHLETE } from "@/lib/seed/seed-medical";
import { setupTestDb } from "../helpers/db";

// The demo club opens with something for the physio to do (issue #13): an open spike alert from next week's
// plan, one athlete on modified training, and log notes on staff screens; the plan breaks no restriction.
const d = await setupTestDb();
const today = "2026-12-01";
const club = await seedDemo(d, { today });
const physio = (await d.User.findOne({ where: { email: "physio@harbourvale.test" } }))!;

describe("demo medical seed", () => {
  it("has one open spike alert for the spike athlete's planned next week, and no mail queued for it", async () => {
    const alerts = await listAlerts({
      teamId: club.teamId,
      userId: physio.id,
      query: { status: "unresolved", limit: 50 },
    });
    const spikes = alerts.filter((a) => a.kind === "spike");
    expect(spikes).toHaveLength(1);
    expect(spikes[0]).toMatchObject({
      athleteName: SPIKE_ATHLETE,
      basis: "planned",
      status: "open",
      weekStart: addDays(startOfWeek(today, 1), 7),
    });
    expect(await d.OutboxMessage.count({ where: { kind: "alert" } })).toBe(0);
  });

  it("has one athlete on modified training until a return date, whose plan respects it", async () => {
    const levels = [...(await currentAvailability({ teamId: club.teamId })).values()];
    expect(levels).toEqual([
      expect.objectContaining({ athleteId: club.athleteIds[MODIFIED_ATHLETE], level: "modified", startsOn: today }),
    ]);
    expect(levels[0]!.returnOn! > today).toBe(true);
    expect(await listSessionConflicts({ teamId: club.teamId, from: today })).toEqual([]);
  });

  it("has one pain report on the pain athlete's latest log, at the team's line", async () => {
    const reports = await d.PainReport.findAll();
    expect(reports.map((r) => ({ athleteId: r.athleteId, region: r.region, severity: r.severity }))).toEqual([
      { athleteId: club.athleteIds[PAIN_ATHLETE], region: "calf", severity: 3 },
    ]);
    expect(reports[0]!.date < today).toBe(true);
  });

  it("shows the demo's log notes to staff", async () => {
    expect((await recentLogNotes({ teamId: club.teamId })).length).toBeGreaterThan(0);
  });
});
