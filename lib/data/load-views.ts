import "server-only";
import { addDays, dateFromDayIndex, dayIndex, startOfWeek } from "@/lib/dates/plain-date";
import {
  METRICS,
  type AthleteProfile,
  type Flag,
  type FlagLevel,
  type LoadView,
  type Metric,
  type MetricValues,
  type SessionInput,
  type TeamLoadSettings,
  type WeekSummary,
  type SpeedBands,
  type ContactsByIntensity,
} from "@/lib/load";
import { ledgerMethod, ledgerWindow, type LedgerWindow } from "@/lib/load/ledger";
import { ledgerPreviewContext, weekFromLedger } from "@/lib/load/ledger-week";
import { computeWeekPreview, weekDayValues } from "@/lib/load/week-preview";
import { AppError } from "@/lib/errors";
import type { LoadPreviewInput } from "@/lib/validations/load";
import { teamToday, type TeamClock } from "@/lib/dates/zoned";
import { getAthleteLedgerWeek, getLedgerWeek, MAX_LOOK_BACK_DAYS, readLedgerSpan } from "./load-ledger";
import { getTeamClock } from "./load";

/** The caller's already-known team clock (e.g. from the authorized viewer) saves a query on hot paths. */
type Clock = Omit<TeamClock, "teamId">;

// What the load handlers answer: the engine's numbers for one athlete or the squad, as plain JSON.

export type SquadWeekRowDto = {
  id: number;
  name: string;
  groupId: number | null;
  groupName: string | null;
  totals: MetricValues;
  previousTotals: MetricValues;
  changePct: Record<Metric, number | null>;
  /** The week's judged ACWR of the team metric (highest on days with 28+ days on record, else the highest early one); null when none. */
  ratio: number | null;
  ratioDate: string | null;
  ratioProvisional: boolean;
  /** The team metric's ACWR on each day of the week, and whether each is provisional. */
  dailyRatio: (number | null)[];
  dailyProvisional: boolean[];
  peakRatios: Record<Metric, number | null>;
  missingDays: number;
  /** Metres in the absolute and relative speed bands, and contacts by intensity (lib/load/README.md §11). */
  bands: SpeedBands;
  contactsByIntensity: ContactsByIntensity;
  flags: Flag[];
  topLevel: FlagLevel | null;
};

export type SquadWeekDto = {
  weekStart: string;
  weekEnd: string;
  previousWeek: string;
  nextWeek: string;
  today: string;
  /** ISO weekday the team's week starts on (1 = Monday … 7 = Sunday). */
  weekStartDay: number;
  view: LoadView;
  settings: TeamLoadSettings;
  groups: { id: number; name: string }[];
  rows: SquadWeekRowDto[];
};

/** The squad's week: totals per metric, ACWR (provisional marked) and flags with reasons, one row per athlete. */
export async function getSquadWeekLoad({
  teamId,
  week,
  view,
  today,
  clock,
}: {
  teamId: number;
  week?: string;
  view: LoadView;
  today?: string;
  clock?: Clock;
}): Promise<SquadWeekDto> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const now = today ?? teamToday({ timeZone: probe.timeZone, now: new Date() });
  const weekStart = startOfWeek(week ?? now, probe.weekStartDay);
  const weekEnd = addDays(weekStart, 6);
  // From the ledger: the week and the one before it, whatever the length of the history (README §12).
  const inputs = await getLedgerWeek({ teamId, weekStart, today: now, view });
  const rows = inputs.athletes.map((a) => a.load);
  const groups = new Map<number, string>();
  for (const a of inputs.athletes) if (a.groupId !== null && a.groupName) groups.set(a.groupId, a.groupName);
  return {
    weekStart,
    weekEnd,
    previousWeek: addDays(weekStart, -7),
    nextWeek: addDays(weekStart, 7),
    today: now,
    weekStartDay: probe.weekStartDay,
    view,
    settings: inputs.settings,
    groups: [...groups].map(([id, name]) => ({ id, name })),
    rows: rows.map((r, i) => {
      const a = inputs.athletes[i];
      return {
        id: a.id,
        name: a.name,
        groupId: a.groupId,
        groupName: a.groupName,
        totals: r.week.totals,
        previousTotals: r.week.previousTotals,
        changePct: r.week.changePct,
        ratio: r.week.peakRatio,
        ratioDate: r.week.peakRatioDate,
        ratioProvisional: r.week.ratioProvisional,
        dailyRatio: r.week.dailyRatio,
        dailyProvisional: r.week.dailyProvisional,
        peakRatios: r.peakRatios,
        missingDays: r.week.missingDays,
        bands: r.week.bands ?? { absHsrM: 0, absSprintM: 0, relHsrM: 0, relNearMaxM: 0, relMaximalM: 0 },
        contactsByIntensity: r.week.contactsByIntensity ?? { low: 0, moderate: 0, high: 0, total: 0, weighted: 0 },
        flags: r.flags,
        topLevel: r.topLevel,
      };
    }),
  };
}

export type AthleteLoadDayDto = {
  date: string;
  /** The metric's daily value in the chosen view. */
  value: number;
  /** The same day as planned (every non-cancelled session, logs ignored). */
  planned: number;
  acute: number;
  chronic: number;
  ratio: number | null;
  provisional: boolean;
  logged: boolean;
  missing: boolean;
  /** A missing day whose plan stands in as an estimate (settings.missingLogs "estimate"; README §11.3). */
  estimated: boolean;
};

export type AthleteLoadDto = {
  athlete: { id: number; name: string; groupName: string | null; profile: AthleteProfile };
  from: string;
  to: string;
  today: string;
  view: LoadView;
  metric: Metric;
  settings: TeamLoadSettings;
  days: AthleteLoadDayDto[];
  /** The week holding today (or `to` when the range ends earlier). */
  week: WeekSummary;
  flags: Flag[];
  /** Next week as planned so far (logged work plus the plan, drafts included). */
  upcoming: { week: WeekSummary; flags: Flag[] };
};

/** Default athlete range: eight weeks back to the end of next week. */
function defaultRange(today: string, weekStartDay: number): { from: string; to: string } {
  const ws = startOfWeek(today, weekStartDay);
  return { from: addDays(ws, -56), to: addDays(ws, 13) };
}

/** One athlete's daily series, acute/chronic/ratio for one metric, planned alongside, and this week's flags. */
/**
 * `withDrafts: false` is the athlete's own view: a coach's drafts are invisible to athletes, so their figures must
 * not count (and so reveal) them; staff see the week being planned.
 */
export async function getAthleteLoad({
  teamId,
  athleteId,
  from,
  to,
  view,
  metric,
  today,
  clock,
  withDrafts = true,
}: {
  teamId: number;
  athleteId: number;
  from?: string;
  to?: string;
  view: LoadView;
  metric?: Metric;
  today?: string;
  clock?: Clock;
  withDrafts?: boolean;
}): Promise<AthleteLoadDto> {
  const probe = clock ?? (await getTeamClock({ teamId }));
  const now = today ?? teamToday({ timeZone: probe.timeZone, now: new Date() });
  const fallback = defaultRange(now, probe.weekStartDay);
  const range = {
    from: from ?? (to ? addDays(to, -69) : fallback.from),
    to: to ?? (from ? addDays(from, 69) : fallback.to),
  };
  if (dayIndex(range.to) < dayIndex(range.from))
    throw new AppError("invalid", "Invalid to", { fields: { to: ["Must be on or after from"] } });
  const weekStart = startOfWeek(now <= range.to ? now : range.to, probe.weekStartDay);
  const ws = dayIndex(weekStart);
  const todayDay = dayIndex(now);
  const fromDay = Math.min(dayIndex(range.from), ws - 7);
  // Through the end of next week as well: the "upcoming" summary reads it.
  const toDay = Math.max(dayIndex(range.to), ws + 13);
  // From the ledger: the days shown and the 28 before, whatever the length of the history (README §12).
  const span = await readLedgerSpan({
    teamId,
    athleteIds: [athleteId],
    fromDay,
    toDay,
    todayDay,
    sessionsFrom: ws - MAX_LOOK_BACK_DAYS,
    withDrafts,
  });
  const athlete = span.athletes[0];
  if (!athlete) throw new AppError("not_found", "Not found");
  const { settings } = span;
  const chosen = metric ?? settings.acwrMetric;
  const method = ledgerMethod(settings);
  const windowOf = (v: LoadView) => ledgerWindow({ rows: athlete.rows, fromDay, toDay, todayDay, view: v, method });
  const win = windowOf(view);
  const week = (w: LedgerWindow, v: LoadView, weekStartDay: number) =>
    weekFromLedger({
      window: w,
      sessions: athlete.sessions,
      logs: athlete.logs,
      profile: athlete.profile,
      settings,
      view: v,
      todayDay,
      weekStartDay,
    });
  // Flags judge the team's own metric, not the one charted.
  const flagged = week(win, view, ws);
  const next = week(view === "projected" ? win : windowOf("projected"), "projected", ws + 7);
  // "Planned": every session not cancelled, logs ignored (the ledger's plan values).
  const k = METRICS.indexOf(chosen);
  const planned = new Map(athlete.rows.map((r) => [r.day, r.planned[k]]));
  const days: AthleteLoadDayDto[] = [];
  for (let d = dayIndex(range.from); d <= dayIndex(range.to); d++) {
    const i = d - win.startDay;
    const ratio = win.acwr[chosen].ratio[i];
    const missing = win.missing[i] === 1;
    days.push({
      date: dateFromDayIndex(d),
      value: win.values[chosen][i],
      planned: planned.get(d) ?? 0,
      acute: win.acwr[chosen].acute[i],
      chronic: win.acwr[chosen].chronic[i],
      ratio: Number.isFinite(ratio) ? ratio : null,
      provisional: win.provisional[i] === 1,
      logged: win.logged[i] === 1,
      missing,
      estimated: missing && settings.missingLogs === "estimate",
    });
  }
  return {
    athlete: { id: athlete.id, name: athlete.name, groupName: athlete.groupName, profile: athlete.profile },
    from: range.from,
    to: range.to,
    today: now,
    view,
    metric: chosen,
    settings,
    days,
    week: flagged.week,
    flags: flagged.flags,
    upcoming: { week: next.week, flags: next.flags },
  };
}

export type LoadPreviewDto = {
  weekStart: string;
  weekEnd: string;
  today: string;
  /** The week as proposed (projected view: logs up to today, the proposal from today on). */
  proposed: { week: WeekSummary; flags: Flag[]; days: { date: string; values: MetricValues }[] };
  /** The week as saved now, for comparison. */
  current: { week: WeekSummary; flags: Flag[] };
};

/** Projected totals and flags for a proposed week, without saving anything. */
export async function previewAthleteWeek({
  input,
  today,
}: {
  input: LoadPreviewInput;
  today?: string;
}): Promise<LoadPreviewDto> {
  const probe = await getTeamClock({ teamId: input.teamId });
  const weekStart = startOfWeek(input.week, probe.weekStartDay);
  const weekEnd = addDays(weekStart, 6);
  const fields: Record<string, string[]> = {};
  input.sessions.forEach((s, i) => {
    if (s.date < weekStart || s.date > weekEnd)
      fields[`sessions.${i}.date`] = [`Must be inside the week ${weekStart} to ${weekEnd}`];
  });
  if (Object.keys(fields).length > 0)
    throw new AppError("invalid", `Invalid ${Object.keys(fields).join(", ")}`, { fields });
  const now = today ?? teamToday({ timeZone: probe.timeZone, now: new Date() });
  // An athlete of another team is "not found", whatever the caller may do in its own team.
  const { athlete, settings } = await getAthleteLedgerWeek({
    teamId: input.teamId,
    athleteId: input.athleteId,
    weekStart,
    from: addDays(weekStart, -28),
    today: now,
    view: "projected",
  });
  const proposed: SessionInput[] = input.sessions.map((s, i) => ({
    id: s.id === undefined ? `proposed-${i}` : String(s.id),
    date: s.date,
    startTime: s.startTime,
    durationMin: s.durationMin,
    plannedRpe: s.plannedRpe,
    status: s.status,
    blocks: s.blocks.map((b) => ({
      id: b.id === undefined ? undefined : String(b.id),
      kind: b.kind,
      title: b.title,
      running: b.running,
      drills: b.drills,
    })),
  }));
  // Logs carry over to proposed sessions that are the same saved session (same id), per-block reps included:
  // reps logged against a block id the proposal still holds count as logged (lib/load/README.md §4).
  const proposedIds = new Set(proposed.map((s) => s.id));
  const weekLogs = athlete.logs.filter((l) => proposedIds.has(l.sessionId));
  const todayDay = dayIndex(now);
  // The saved series up to the week, then the proposal: the drag preview's computation (README §12).
  const context = ledgerPreviewContext(athlete.window, {
    sessions: athlete.sessions,
    logs: athlete.logs,
    profile: athlete.profile,
    settings,
    todayDay,
    weekStart,
  });
  const next = computeWeekPreview({
    ...context,
    weekSessions: proposed,
    weekLogs,
    profile: athlete.profile,
    settings,
    weekStart,
    today: now,
    view: "projected",
  });
  const days = weekDayValues({
    sessions: proposed,
    logs: weekLogs,
    profile: athlete.profile,
    settings,
    weekStart,
    todayDay,
  });
  return {
    weekStart,
    weekEnd,
    today: now,
    proposed: { week: next.week, flags: next.flags, days },
    current: { week: athlete.load.week, flags: athlete.load.flags },
  };
}
