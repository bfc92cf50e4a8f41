import { describe, expect, it } from "vitest";
import { computeAthleteColumns } from "@/lib/load/athlete-load";
import { addDays, dayIndex, startOfWeek } from "@/lib/dates/plain-date";
import { packSessions } from "@/lib/load/packed";
import { alignLogs } from "@/lib/load/series";
import { computeSquadWeek } from "@/lib/load/squad";
import {
  ACWR_METHODS,
  DEFAULT_TEAM_LOAD_SETTINGS,
  METRICS,
  type LoadView,
  type LogInput,
  type SessionInput,
} from "@/lib/load/types";
import { synthAthlete } from "./synth";

// The packed columns are an input format, not a second set of rules: every number must equal the object
// path's exactly (same operations in the same order), on an invented squad with logs, partial completions,
// completed-reps logs, drafts, cancelled sessions and untested athletes.
const START = "2025-01-06";
const DAYS = 300;
const TODAY = addDays(START, DAYS - 40);
const WEEK = startOfWeek(TODAY);
const squad = Array.from({ length: 12 }, (_, i) => synthAthlete(500 + i, START, DAYS, TODAY));
const VIEWS: LoadView[] = ["projected", "actual"];

describe("packed sessions give the object path's numbers exactly", () => {
  for (const view of VIEWS) {
    for (const [acwrMethod, speedZones] of [
      ...ACWR_METHODS.map((m) => [m, "absolute"] as const),
      ["ewma", "relative"] as const,
    ]) {
      it(`daily columns and ACWR, ${view} view, ${acwrMethod}, ${speedZones} speed zones`, () => {
        const settings = { ...DEFAULT_TEAM_LOAD_SETTINGS, acwrMethod, speedZones };
        for (const a of squad) {
          const req = {
            profile: a.profile,
            settings,
            sessions: a.sessions,
            logFor: alignLogs(a.sessions, a.logs),
            view,
            todayDay: dayIndex(TODAY),
            fromDay: dayIndex(WEEK) - 7,
            toDay: dayIndex(WEEK) + 13,
          };
          const plain = computeAthleteColumns(req);
          const packed = computeAthleteColumns({ ...req, packed: packSessions(a.sessions, a.logs) });
          expect(packed.startDay).toBe(plain.startDay);
          expect(packed.firstDataIndex).toBe(plain.firstDataIndex);
          expect(Array.from(packed.logged)).toEqual(Array.from(plain.logged));
          expect(Array.from(packed.missing)).toEqual(Array.from(plain.missing));
          for (const m of METRICS) {
            expect(Array.from(packed.values[m])).toEqual(Array.from(plain.values[m]));
            expect(Array.from(packed.acwr[m].ratio)).toEqual(Array.from(plain.acwr[m].ratio));
          }
        }
      });
    }
  }

  it("the squad week (totals, ratios, flags) is the same with packed input", () => {
    const settings = DEFAULT_TEAM_LOAD_SETTINGS;
    const plain = computeSquadWeek(squad, settings, WEEK, TODAY, "projected");
    const packed = computeSquadWeek(
      squad.map((a) => ({ ...a, packed: packSessions(a.sessions, a.logs) })),
      settings,
      WEEK,
      TODAY,
      "projected",
    );
    expect(packed).toEqual(plain);
    expect(plain.some((r) => r.flags.length > 0)).toBe(true);
  });

  it("logs in any order, a null RPE or minutes, completed reps, unknown blocks and odd numbers", () => {
    const s = (id: string, date: string, over: Partial<SessionInput> = {}): SessionInput => ({
      id,
      date,
      startTime: "17:00",
      durationMin: 60,
      plannedRpe: 6,
      status: "published",
      blocks: [
        {
          id: `${id}-r`,
          kind: "max_velocity",
          title: "Flys",
          running: { sets: 2, reps: 3, distanceM: 30, intensityPct: 97.3, start: "flying", runInM: 20, restSec: 240 },
        },
        {
          id: `${id}-p`,
          kind: "plyometric",
          title: "Bounds",
          drills: [
            { name: "Bound", sets: 3, reps: 8, contactsPerRep: 2, intensity: "high" },
            { name: "Pogo", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" },
          ],
        },
        { id: `${id}-x`, kind: "tempo", title: "No prescription", running: null },
        { id: `${id}-g`, kind: "strength", title: "Gym" },
      ],
      ...over,
    });
    const sessions = [
      s("a", "2025-03-03"),
      s("b", "2025-03-05", { durationMin: Number.NaN }),
      s("c", "2025-03-07", { status: "cancelled" }),
      s("d", "2025-03-08", { status: "draft" }),
    ];
    const logs: LogInput[] = [
      { sessionId: "c", completion: "yes", rpe: 5, minutes: 40 },
      {
        sessionId: "a",
        completion: "partly",
        rpe: null,
        minutes: null,
        completedReps: { "a-r": 4, "a-p": 50, "a-g": 3 },
      },
      { sessionId: "b", completion: "no", rpe: 7, minutes: 30 },
    ];
    const req = {
      profile: { vmax: null, tau: null, stepLengthM: null, plyoLevel: "beginner" as const },
      settings: DEFAULT_TEAM_LOAD_SETTINGS,
      sessions,
      logFor: alignLogs(sessions, logs),
      view: "projected" as const,
      todayDay: dayIndex("2025-03-06"),
      fromDay: dayIndex("2025-03-03"),
      toDay: dayIndex("2025-03-09"),
    };
    const plain = computeAthleteColumns(req);
    const packed = computeAthleteColumns({ ...req, packed: packSessions(sessions, logs) });
    for (const m of METRICS) expect(Array.from(packed.values[m])).toEqual(Array.from(plain.values[m]));
    expect(plain.values.contacts.some((v) => v > 0)).toBe(true);
  });
});
