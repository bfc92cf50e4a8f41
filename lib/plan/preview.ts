import { computeWeekPreview } from "@/lib/load/week-preview";
import { topFlagLevel, type Flag } from "@/lib/load/flags";
import { logsFor, toSessionInput } from "./blocks";
import { affectedAthletes, sessionsAfter, tempIdCounter } from "./apply";
import type { PlanChange } from "./drop";
import type { PlanAthlete, PlanSession, PlanWeek, RowLoad } from "./types";

type WeekFrame = Pick<PlanWeek, "weekStart" | "today" | "settings">;

/**
 * A row's week numbers for a given list of sessions, computed in the browser with the same engine the
 * server uses (lib/load) over the history the plan GET sent. With no change it equals the server's row.
 */
export function rowLoad(
  frame: WeekFrame,
  athlete: PlanAthlete,
  sessions: readonly PlanSession[] = athlete.sessions,
): RowLoad {
  const ctx = athlete.context;
  const { week, flags } = computeWeekPreview({
    historyDates: ctx.historyDates,
    historyValues: ctx.historyValues,
    firstDataDate: ctx.firstDataDate,
    priorSessions: ctx.priorSessions,
    seed: ctx.seed,
    weekSessions: sessions.map(toSessionInput),
    weekLogs: logsFor(athlete.logs, sessions),
    profile: athlete.profile,
    settings: frame.settings,
    weekStart: frame.weekStart,
    today: frame.today,
  });
  return { week, flags, topLevel: topFlagLevel(flags) };
}

// One ACWR zone flag per week, one jump flag per metric, session flags per day.
function flagKey(f: Flag): string {
  if (f.kind === "spike" || f.kind === "rising" || f.kind === "low") return f.kind;
  if (f.kind === "weekly_jump") return `${f.kind}:${f.metric}`;
  return `${f.kind}:${f.date}`;
}

/** Flags the change would raise that the row does not have now: what the grid marks on a drop. */
function newFlags(before: readonly Flag[], after: readonly Flag[]): Flag[] {
  const had = new Set(before.map(flagKey));
  return after.filter((f) => !had.has(flagKey(f)) && f.kind !== "low");
}

export type RowPreview = { athleteId: number; before: RowLoad; after: RowLoad; warnings: Flag[] };

/** What each touched row would become if the change were saved. */
export function previewChange(week: PlanWeek, change: PlanChange): RowPreview[] {
  const after = sessionsAfter(week, change, tempIdCounter(-1_000_000));
  const out: RowPreview[] = [];
  for (const id of affectedAthletes(week, change)) {
    const athlete = week.athletes.find((a) => a.id === id);
    const sessions = after.get(id);
    if (!athlete || !sessions) continue;
    const load = rowLoad(week, athlete, sessions);
    out.push({ athleteId: id, before: athlete.load, after: load, warnings: newFlags(athlete.load.flags, load.flags) });
  }
  return out;
}
