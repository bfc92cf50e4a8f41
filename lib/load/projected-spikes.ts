// Spikes the current plan projects over the next days (lib/load/README.md §13.1): the ACWR zone rule of the week
// flags (§7, flags.ts) applied to a window of days instead of a training week. The ratios are the squad week's own
// daily ratios in the projected view (logs up to today, the plan after), so every number matches that screen.
import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import { atOrAbove } from "./weekly-change";
import { judgedPeak } from "./week-summary";

/** One week's daily ratios of the team metric, as WeekSummary carries them. */
export interface RatioWeek {
  weekStart: string;
  dailyRatio: readonly (number | null)[];
  dailyProvisional: readonly boolean[];
}

export interface ProjectedSpike {
  date: string;
  ratio: number;
  /** Fewer than 28 days on record behind the ratio: a caution, not an alert (§7). */
  provisional: boolean;
}

/**
 * The judged peak of [from, from + days) (days with a full history first, as the week's flag judges) when it is at
 * or above the spike line; null otherwise. `weeks` must cover the window (consecutive weeks, any order).
 */
export function projectedSpike({
  weeks,
  from,
  days = 7,
  spikeRatio,
}: {
  weeks: readonly RatioWeek[];
  from: string;
  days?: number;
  spikeRatio: number;
}): ProjectedSpike | null {
  const start = dayIndex(from);
  const ratio: (number | null)[] = new Array(days).fill(null);
  const provisional: boolean[] = new Array(days).fill(true);
  for (const w of weeks) {
    const ws = dayIndex(w.weekStart);
    for (let i = 0; i < 7; i++) {
      const at = ws + i - start;
      if (at < 0 || at >= days) continue;
      ratio[at] = w.dailyRatio[i];
      provisional[at] = w.dailyProvisional[i];
    }
  }
  const peak = judgedPeak(ratio, provisional, 0, days);
  if (!peak || !atOrAbove(peak.value, spikeRatio)) return null;
  return { date: dateFromDayIndex(start + peak.index), ratio: peak.value, provisional: peak.provisional };
}
