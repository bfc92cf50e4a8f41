// Warnings the season forecast raises over an athlete's coming weeks as the plan stands. Pure; the weekly
// figures come from the same engine and ledger the week grid reads, so a warned ratio is the grid's ratio.
import { diffDays } from "@/lib/dates/plain-date";
import { exceedsWeeklyLimit } from "@/lib/load/weekly-change";
import type { MeetPriority } from "@/lib/domain/season";

export type ForecastWeek = {
  weekStart: string;
  /** The week's closing ACWR, null while the chronic load is still zero. */
  acwr: number | null;
  /** Change of the week's load on the week before, %; null when that week was zero. */
  weeklyChangePct: number | null;
  /** The week is an unload week (lower volume than the one before, by the progression or the phase). */
  unload: boolean;
  /** The week lies in a taper phase. */
  taper: boolean;
};

export type Meet = { date: string; priority: MeetPriority; name: string };

export type ForecastWarning =
  | { kind: "taper_not_lowering"; meet: Meet; weekStart: string; acwrBefore: number; acwrAtMeet: number }
  | { kind: "jump_after_unload"; weekStart: string; changePct: number; limitPct: number };

function weekOf(weeks: ForecastWeek[], date: string): number {
  return weeks.findIndex((w) => diffDays(date, w.weekStart) >= 0 && diffDays(date, w.weekStart) < 7);
}

/**
 * A taper should bring the ratio down by the A meet (lib/season/README.md): the ratio of the meet's week is
 * compared with the ratio of the last week before the taper began.
 */
function taperWarnings(weeks: ForecastWeek[], meets: Meet[]): ForecastWarning[] {
  return meets.flatMap((meet): ForecastWarning[] => {
    if (meet.priority !== "A") return [];
    const at = weekOf(weeks, meet.date);
    if (at < 0) return [];
    let first = at;
    while (first > 0 && weeks[first - 1].taper) first--;
    if (first === at && !weeks[at].taper) return [];
    const before = weeks[first - 1]?.acwr ?? null;
    const atMeet = weeks[at].acwr;
    if (before === null || atMeet === null || atMeet < before) return [];
    return [
      { kind: "taper_not_lowering", meet, weekStart: weeks[at].weekStart, acwrBefore: before, acwrAtMeet: atMeet },
    ];
  });
}

/** The first week after an unload rebuilds from a low base, so its weekly change is where spikes hide. */
function unloadJumpWarnings(weeks: ForecastWeek[], limitPct: number): ForecastWarning[] {
  return weeks.flatMap((week, i): ForecastWarning[] => {
    if (i === 0 || !weeks[i - 1].unload || !exceedsWeeklyLimit(week.weeklyChangePct, limitPct)) return [];
    return [{ kind: "jump_after_unload", weekStart: week.weekStart, changePct: week.weeklyChangePct ?? 0, limitPct }];
  });
}

export function forecastWarnings(
  weeks: ForecastWeek[],
  meets: Meet[],
  weeklyChangeLimitPct: number,
): ForecastWarning[] {
  return [...taperWarnings(weeks, meets), ...unloadJumpWarnings(weeks, weeklyChangeLimitPct)];
}
