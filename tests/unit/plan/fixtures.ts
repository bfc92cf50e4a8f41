import { topFlagLevel } from "@/lib/load/flags";
import { computeSquadWeek } from "@/lib/load/squad";
import { DEFAULT_TEAM_LOAD_SETTINGS, type AthleteProfile, type LogInput, type SessionInput } from "@/lib/load/types";
import { buildWeekPreviewContext } from "@/lib/load/week-preview";
import { toSessionInput } from "@/lib/plan/blocks";
import { compactContext } from "@/lib/plan/context";
import type { PlanAthlete, PlanBlock, PlanSession, PlanTemplate, PlanWeek } from "@/lib/plan/types";
import { addDays, weekDays } from "@/lib/dates/plain-date";

// Invented athletes and templates; the week is built the way lib/data/plan.ts builds it (same engine calls).

export const WEEK = "2026-03-02"; // a Monday
const TODAY = "2026-03-01"; // the Sunday before: the whole week is plan
const settings = { ...DEFAULT_TEAM_LOAD_SETTINGS };
const profile: AthleteProfile = { vmax: 9.6, tau: 1.15, stepLengthM: 2.15, plyoLevel: "intermediate" };

const templates: PlanTemplate[] = [
  {
    id: 1,
    kind: "max_velocity",
    title: "Flying 30s",
    running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
    drills: null,
    notes: null,
    durationMin: 50,
    plannedRpe: 7,
    version: 1,
  },
  {
    id: 2,
    kind: "plyometric",
    title: "Bounds",
    running: null,
    drills: [{ name: "Bounding", sets: 4, reps: 10, contactsPerRep: 4, intensity: "high" }],
    notes: null,
    durationMin: 30,
    plannedRpe: 6,
    version: 1,
  },
  {
    id: 3,
    kind: "speed_endurance",
    title: "Big 150s",
    running: { sets: 2, reps: 3, distanceM: 150, intensityPct: 92, start: "standing", runInM: 0, restSec: 600 },
    drills: null,
    notes: null,
    durationMin: 100,
    plannedRpe: 9,
    version: 1,
  },
];

let nextId = 1000;
export function session(athleteId: number, date: string, over: Partial<PlanSession> = {}): PlanSession {
  const id = nextId++;
  const blocks: PlanBlock[] = over.blocks ?? [
    {
      id: nextId++,
      templateId: 1,
      position: 0,
      kind: "acceleration",
      title: "Starts",
      running: { sets: 1, reps: 5, distanceM: 20, intensityPct: 95, start: "crouch", runInM: 0, restSec: 180 },
      drills: null,
      notes: null,
    },
  ];
  return {
    id,
    athleteId,
    date,
    startTime: "17:00",
    durationMin: 40,
    title: "Starts",
    plannedRpe: 5,
    status: "draft",
    notes: null,
    version: 1,
    sequence: 0,
    publishedAt: null,
    logged: false,
    ...over,
    blocks,
  };
}

export type Past = { sessions: SessionInput[]; logs: LogInput[] };

/** Five weeks of light history (three logged 200 AU sessions a week), as the engine sees it. */
export function history(athleteId: number, weeks = 5): Past {
  const out: Past = { sessions: [], logs: [] };
  for (let w = weeks; w >= 1; w--) {
    for (const d of [0, 2, 4]) {
      const s = toSessionInput(session(athleteId, addDays(WEEK, -7 * w + d), { status: "published" }));
      out.sessions.push(s);
      out.logs.push({ sessionId: s.id, completion: "yes", rpe: 5, minutes: 40, completedReps: null });
    }
  }
  return out;
}

const NO_PAST: Past = { sessions: [], logs: [] };
type AthleteSpec = { id: number; name: string; groupId: number | null; past?: Past; sessions: PlanSession[] };
const all = (a: AthleteSpec, sessions: PlanSession[]) => [
  ...(a.past ?? NO_PAST).sessions,
  ...sessions.map(toSessionInput),
];
const logsOf = (a: AthleteSpec) => (a.past ?? NO_PAST).logs;

/** A PlanWeek built like the server does: context from buildWeekPreviewContext, load from computeSquadWeek. */
export function planWeek(specs: AthleteSpec[]): PlanWeek {
  const rows = computeSquadWeek(
    specs.map((a) => ({
      id: String(a.id),
      name: a.name,
      group: null,
      profile,
      sessions: all(a, a.sessions),
      logs: logsOf(a),
    })),
    settings,
    WEEK,
    TODAY,
    "projected",
  );
  const athletes: PlanAthlete[] = specs.map((a, i) => ({
    id: a.id,
    name: a.name,
    groupId: a.groupId,
    profile,
    sessions: a.sessions,
    logs: [],
    // Compacted exactly as lib/data/plan.ts sends it, so the equality tests cover the compaction too.
    context: compactContext(
      buildWeekPreviewContext({
        profile,
        settings,
        sessions: all(a, a.sessions),
        logs: logsOf(a),
        weekStart: WEEK,
        today: TODAY,
      }),
      settings.acwrMetric,
    ),
    load: { week: rows[i].week, flags: rows[i].flags, topLevel: topFlagLevel(rows[i].flags) },
  }));
  const groupIds = [...new Set(specs.map((a) => a.groupId))];
  return {
    teamId: 1,
    timeZone: "Europe/London",
    weekStartDay: 1,
    weekStart: WEEK,
    weekEnd: addDays(WEEK, 6),
    isoWeek: 10,
    isoYear: 2026,
    days: weekDays(WEEK),
    today: TODAY,
    settings,
    groups: groupIds.map((g) => ({
      id: g,
      name: g === null ? "No group" : `Group ${g}`,
      athleteIds: specs.filter((a) => a.groupId === g).map((a) => a.id),
    })),
    athletes,
    templates,
    restrictions: [],
    canEdit: true,
    scope: "team",
  };
}

/** The server's numbers for an athlete after a change: computeSquadWeek over history + the sessions as saved. */
export function serverRow(week: PlanWeek, spec: AthleteSpec, sessions: PlanSession[]) {
  const [row] = computeSquadWeek(
    [{ id: String(spec.id), name: spec.name, group: null, profile, sessions: all(spec, sessions), logs: logsOf(spec) }],
    week.settings,
    week.weekStart,
    week.today,
    "projected",
  );
  return row;
}
