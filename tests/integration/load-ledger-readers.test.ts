// The athlete page, the athlete's own view (no drafts) and the week preview read the ledger for the days they
// show (lib/load/README.md §12); each must give exactly what the whole-history engine gives (computeAthleteLoad
// over every session from the first day on record, drafts left out where the athlete looks). Demo club, real file.
import { describe, expect, it } from "vitest";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { computeAthleteLoad } from "@/lib/load";
import { seedDemo } from "@/lib/seed";
import { DEMO_ATHLETES } from "@/lib/seed/demo-club";
import { loadPreviewSchema } from "@/lib/validations/load";
import { setupTestDb } from "../helpers/db";

const d = await setupTestDb();
const { getAthleteLoadInputs } = await import("@/lib/data/load");
const { getAthleteLoad, previewAthleteWeek } = await import("@/lib/data/load-views");
const { getPlanWeek } = await import("@/lib/data/plan");

const today = teamToday({ timeZone: "Europe/London", now: new Date() });
const club = await seedDemo(d, { today });
const thisWeek = startOfWeek(today, 1);
const ids = DEMO_ATHLETES.map((a) => club.athleteIds[a.name]!);

function close(a: number | null, b: number | null, what: string) {
  expect(a === null, what).toBe(b === null);
  if (a !== null && b !== null) expect(Math.abs(a - b), what).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(b)));
}

describe("readers of a few days from the ledger equal the whole-history engine", () => {
  it("athlete page, staff and own view, both views, charted metric's daily figures, week, flags and next week", async () => {
    const from = addDays(thisWeek, -56);
    const to = addDays(thisWeek, 13);
    let drafts = 0;
    for (const id of ids) {
      const inputs = await getAthleteLoadInputs({ athleteId: id, through: to });
      for (const withDrafts of [true, false]) {
        const sessions = inputs.athlete.sessions.filter((s) => withDrafts || s.status !== "draft");
        if (!withDrafts) drafts += inputs.athlete.sessions.length - sessions.length;
        // Each view once, charting the team metric in one and another metric in the other.
        for (const [view, metric] of [
          ["projected", "srpe"],
          ["actual", "hsrM"],
        ] as const) {
          const page = await getAthleteLoad({ teamId: club.teamId, athleteId: id, view, metric, today, withDrafts });
          const base = {
            profile: inputs.athlete.profile,
            settings: inputs.settings,
            sessions,
            logs: inputs.athlete.logs,
            from,
            to,
            today,
            weekStart: thisWeek,
          };
          const ref = computeAthleteLoad({ ...base, settings: { ...inputs.settings, acwrMetric: metric }, view });
          const plan = computeAthleteLoad({ ...base, logs: [], today: "1970-01-01", view: "projected" });
          const flagged = computeAthleteLoad({ ...base, view });
          const next = computeAthleteLoad({ ...base, view: "projected", weekStart: addDays(thisWeek, 7) });
          expect(page.days.map((x) => x.date)).toEqual(ref.days.map((x) => x.date));
          page.days.forEach((day, i) => {
            const r = ref.days[i];
            const what = `${id} ${withDrafts} ${view} ${metric} ${day.date}`;
            close(day.value, r.values[metric], `${what} value`);
            close(day.planned, plan.days[i].values[metric], `${what} planned`);
            close(day.acute, r.acute[metric], `${what} acute`);
            close(day.chronic, r.chronic[metric], `${what} chronic`);
            close(day.ratio, r.ratio[metric], `${what} ratio`);
            expect([day.provisional, day.logged, day.missing], what).toEqual([r.provisional, r.logged, r.missing]);
          });
          expect(page.week).toEqual(flagged.week);
          expect(page.flags).toEqual(flagged.flags);
          expect(page.upcoming).toEqual({ week: next.week, flags: next.flags });
        }
      }
    }
    // The demo plans next week partly in draft: the own view has something to leave out.
    expect(drafts).toBeGreaterThan(0);
  }, 120_000);

  it("the athlete's own week plan leaves drafts out of the week numbers", async () => {
    const week = addDays(thisWeek, 7);
    for (const id of ids.slice(0, 6)) {
      const inputs = await getAthleteLoadInputs({ athleteId: id, through: addDays(week, 6) });
      const own = await getPlanWeek({
        teamId: club.teamId,
        date: week,
        today,
        audience: { scope: "own", canEdit: false, ownAthleteId: id },
      });
      const ref = computeAthleteLoad({
        profile: inputs.athlete.profile,
        settings: inputs.settings,
        sessions: inputs.athlete.sessions.filter((s) => s.status !== "draft"),
        logs: inputs.athlete.logs,
        from: week,
        to: addDays(week, 6),
        today,
        view: "projected",
        weekStart: week,
      });
      expect(own.athletes.map((a) => a.id)).toEqual([id]);
      expect(own.athletes[0].load.week).toEqual(ref.week);
      expect(own.athletes[0].load.flags).toEqual(ref.flags);
    }
  });

  it("the week grid's sessions, read in the ledger's one query, are the model reader's sessions of the week", async () => {
    const { loadSessionsBetween } = await import("@/lib/data/plan-rows");
    // This week (logged, published, drafts) and last week (logs): every field the grid and its writes read.
    for (const week of [addDays(thisWeek, -7), thisWeek, addDays(thisWeek, 7)]) {
      const staff = await getPlanWeek({
        teamId: club.teamId,
        date: week,
        today,
        audience: { scope: "team", canEdit: true, ownAthleteId: null },
      });
      const stored = (await loadSessionsBetween({ teamId: club.teamId, from: week, to: addDays(week, 6) })).map(
        (l) => l.dto,
      );
      expect(stored.length).toBeGreaterThan(0);
      // Each athlete's in calendar order, as the model reader orders them.
      for (const a of staff.athletes) expect(a.sessions).toEqual(stored.filter((s) => s.athleteId === a.id));
      expect(staff.athletes.flatMap((a) => a.sessions)).toHaveLength(stored.length);
      const own = await getPlanWeek({
        teamId: club.teamId,
        date: week,
        today,
        audience: { scope: "own", canEdit: false, ownAthleteId: ids[0] },
      });
      expect(own.athletes[0].sessions).toEqual(stored.filter((s) => s.athleteId === ids[0] && s.status !== "draft"));
    }
  });

  it("a proposed week: the preview's numbers equal the engine over the saved history and the proposal", async () => {
    for (const id of ids) {
      const inputs = await getAthleteLoadInputs({ athleteId: id, through: addDays(thisWeek, 6) });
      const inWeek = inputs.athlete.sessions.filter((s) => s.date >= thisWeek && s.date <= addDays(thisWeek, 6));
      // The week with its first session moved to Sunday, and one new plyometric session on Wednesday.
      const moved = inWeek.map((s, i) => (i === 0 ? { ...s, date: addDays(thisWeek, 6) } : s));
      const added = {
        date: addDays(thisWeek, 2),
        startTime: "18:00",
        durationMin: 45,
        plannedRpe: 7,
        status: "draft" as const,
        blocks: [
          {
            kind: "plyometric" as const,
            title: "Bounds",
            notes: "",
            running: null,
            drills: [{ name: "Bounds", sets: 4, reps: 6, contactsPerRep: 2, intensity: "high" as const }],
          },
        ],
      };
      const input = loadPreviewSchema.parse({
        teamId: club.teamId,
        athleteId: id,
        week: thisWeek,
        sessions: [
          // The request carries numeric ids; everything else as the engine holds it.
          ...moved.map(({ id: sessionId, blocks, ...rest }) => ({
            ...rest,
            id: Number(sessionId),
            blocks: blocks.map(({ id: blockId, ...b }) => ({
              ...b,
              notes: "",
              id: blockId === undefined ? undefined : Number(blockId),
            })),
          })),
          added,
        ],
      });
      const preview = await previewAthleteWeek({ input, today });
      const outside = inputs.athlete.sessions.filter((s) => s.date < thisWeek || s.date > addDays(thisWeek, 6));
      const proposed = [...moved, { ...added, id: `proposed-${moved.length}` }];
      const base = {
        profile: inputs.athlete.profile,
        settings: inputs.settings,
        logs: inputs.athlete.logs,
        from: thisWeek,
        to: addDays(thisWeek, 6),
        today,
        view: "projected" as const,
        weekStart: thisWeek,
      };
      const next = computeAthleteLoad({ ...base, sessions: [...outside, ...proposed] });
      const saved = computeAthleteLoad({ ...base, sessions: inputs.athlete.sessions });
      expect(preview.proposed.week).toEqual(next.week);
      expect(preview.proposed.flags).toEqual(next.flags);
      expect(preview.proposed.days).toEqual(next.days.map((x) => ({ date: x.date, values: x.values })));
      expect(preview.current).toEqual({ week: saved.week, flags: saved.flags });
    }
  });
});
