// The demo club through every reader of load figures: the squad table, the week plan (server rows and the
// browser's drag preview over the context it sends), the athlete page and the alert evaluation must give the
// same ACWR for every athlete and every day of the last 10 weeks (one series, lib/load/README.md §5), and the
// demo history must raise no flag that comes from how a series starts (§6, §7).
import { beforeEach, describe, expect, it } from "vitest";
import { notices, who } from "../helpers/handler-session";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { Flag } from "@/lib/load/flags";
import type { WeekSummary } from "@/lib/load/week-summary";
import type { PlanWeek } from "@/lib/plan/types";
import { seedDemo } from "@/lib/seed";
import { DEMO_ATHLETES, DEMO_STAFF } from "@/lib/seed/demo-club";
import { HISTORY_WEEKS } from "@/lib/seed/seed-load";
import { setupTestDb } from "../helpers/db";

// Alerts, calendar invitations and their e-mails run for real here.
notices.hooks = "on";

const d = await setupTestDb();
const { getAthleteLoadInputs } = await import("@/lib/data/load");
const { teamToday } = await import("@/lib/dates/zoned");
const { alertWeekLoad } = await import("@/lib/notices/load-alerts");
const { rowLoad } = await import("@/lib/plan/preview");
const athleteLoad = await import("@/app/api/athletes/[athleteId]/load/route");
const squadLoad = await import("@/app/api/teams/[teamId]/load/route");
const planRoute = await import("@/app/api/teams/[teamId]/plan/route");

const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const club = await seedDemo(d, { today });
const head = (await d.User.findOne({ where: { email: DEMO_STAFF.find((s) => s.role === "head_coach")!.email } }))!.id;
const thisWeek = startOfWeek(today, 1);
const weeks = Array.from({ length: 10 }, (_, k) => addDays(thisWeek, -7 * (9 - k)));
const athleteIds = DEMO_ATHLETES.map((a) => club.athleteIds[a.name]!);

const p = <T>(v: T) => ({ params: Promise.resolve(v) });
const get = (path: string) => new Request(`http://test${path}`);
async function body<T>(res: Response): Promise<T> {
  expect(res.status).toBe(200);
  return (await res.json()) as T;
}

type Daily = { ratio: (number | null)[]; provisional: boolean[] };
/** reader → athlete → date → ratio and provisional mark. */
const seen = new Map<string, Map<number, Map<string, { ratio: number | null; provisional: boolean }>>>();
function record(reader: string, athleteId: number, weekStart: string, daily: Daily) {
  const byAthlete = seen.get(reader) ?? new Map();
  seen.set(reader, byAthlete);
  const byDate = byAthlete.get(athleteId) ?? new Map();
  byAthlete.set(athleteId, byDate);
  daily.ratio.forEach((r, i) => byDate.set(addDays(weekStart, i), { ratio: r, provisional: daily.provisional[i] }));
}
const fromWeek = (w: WeekSummary): Daily => ({ ratio: w.dailyRatio, provisional: w.dailyProvisional });

beforeEach(() => {
  who.userId = head;
});

describe("one series for the demo club, whoever reads it", () => {
  // Every reader for 13 athletes × 10 weeks: 12–19 s on a busy two-core machine, so more than the 20 s default.
  it(
    "squad week, plan rows, drag preview, athlete page and alert evaluation agree to 1e-12 on every day of 10 weeks",
    { timeout: 90_000 },
    async () => {
      const zoneFlags: { athleteId: number; flag: Flag }[] = [];
      for (const week of weeks) {
        const squad = await body<{
          rows: { id: number; dailyRatio: (number | null)[]; dailyProvisional: boolean[]; flags: Flag[] }[];
        }>(
          await squadLoad.GET(
            get(`/api/teams/${club.teamId}/load?week=${week}&view=projected`),
            p({ teamId: String(club.teamId) }),
          ),
        );
        for (const r of squad.rows) {
          record("squad", r.id, week, { ratio: r.dailyRatio, provisional: r.dailyProvisional });
          for (const f of r.flags)
            if (f.kind === "spike" || f.kind === "rising" || f.kind === "low")
              zoneFlags.push({ athleteId: r.id, flag: f });
        }
        const plan = await body<PlanWeek>(
          await planRoute.GET(get(`/api/teams/${club.teamId}/plan?week=${week}`), p({ teamId: String(club.teamId) })),
        );
        for (const a of plan.athletes) {
          record("plan", a.id, week, fromWeek(a.load.week));
          record("preview", a.id, week, fromWeek(rowLoad(plan, a).week));
        }
        for (const id of athleteIds) {
          const inputs = await getAthleteLoadInputs({ athleteId: id, through: addDays(week, 20) });
          record("alerts", id, week, fromWeek(alertWeekLoad({ inputs, weekStart: week, today }).week));
        }
      }
      for (const id of athleteIds) {
        const page = await body<{ days: { date: string; ratio: number | null; provisional: boolean }[] }>(
          await athleteLoad.GET(
            get(`/api/athletes/${id}/load?from=${weeks[0]}&to=${addDays(thisWeek, 6)}&view=projected&metric=srpe`),
            p({ athleteId: String(id) }),
          ),
        );
        record("athlete", id, weeks[0], {
          ratio: page.days.map((x) => x.ratio),
          provisional: page.days.map((x) => x.provisional),
        });
      }

      const reference = seen.get("athlete")!;
      let compared = 0;
      for (const [reader, byAthlete] of seen) {
        expect(byAthlete.size, reader).toBe(athleteIds.length);
        for (const [id, byDate] of byAthlete) {
          expect(byDate.size, `${reader} ${id}`).toBe(70);
          for (const [date, v] of byDate) {
            const ref = reference.get(id)!.get(date)!;
            expect(v.provisional, `${reader} athlete ${id} ${date}`).toBe(ref.provisional);
            expect(v.ratio === null, `${reader} athlete ${id} ${date}`).toBe(ref.ratio === null);
            if (v.ratio !== null && ref.ratio !== null)
              expect(Math.abs(v.ratio - ref.ratio), `${reader} athlete ${id} ${date}`).toBeLessThanOrEqual(1e-12);
            compared++;
          }
        }
      }
      expect(compared).toBe(5 * athleteIds.length * 70);

      // Every series starts on the athlete's first day on record, HISTORY_WEEKS ago, seeded with that day's load:
      // its first day reads 1, never λ7/λ28 = 3.625, and no zone flag comes from a day with a short history.
      const first = addDays(thisWeek, -7 * HISTORY_WEEKS);
      for (const id of athleteIds) {
        const early = await body<{ days: { date: string; ratio: number | null }[] }>(
          await athleteLoad.GET(
            get(
              `/api/athletes/${id}/load?from=${addDays(first, -7)}&to=${addDays(first, 6)}&view=projected&metric=srpe`,
            ),
            p({ athleteId: String(id) }),
          ),
        );
        const firstDay = early.days.find((x) => x.ratio !== null)!;
        expect(firstDay).toEqual({ ...firstDay, date: first, ratio: 1 });
      }
      expect(zoneFlags.filter((z) => z.flag.provisional)).toEqual([]);
    },
  );

  it(
    "the demo history, from its first week to next week's plan, raises no flag from how a series starts",
    { timeout: 60_000 },
    async () => {
      const early: { name: string; flag: Flag }[] = [];
      for (let k = -HISTORY_WEEKS; k <= 1; k++) {
        const week = addDays(thisWeek, 7 * k);
        const squad = await body<{ rows: { name: string; flags: Flag[] }[] }>(
          await squadLoad.GET(
            get(`/api/teams/${club.teamId}/load?week=${week}&view=projected`),
            p({ teamId: String(club.teamId) }),
          ),
        );
        for (const r of squad.rows)
          for (const f of r.flags)
            if (f.provisional || (k < -HISTORY_WEEKS + 4 && ["spike", "rising", "low"].includes(f.kind)))
              early.push({ name: r.name, flag: f });
      }
      expect(early).toEqual([]);
    },
  );
});
