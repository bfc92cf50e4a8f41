import "server-only";
import { listSquad } from "@/lib/data/athletes";
import { getAthleteLoad } from "@/lib/data/load-views";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { Metric } from "@/lib/load/types";

/** The figures "My load" shows: what the athlete did, week by week. */
export const MY_LOAD_METRICS = ["hsrM", "contacts", "srpe"] as const satisfies readonly Metric[];
type MyLoadMetric = (typeof MY_LOAD_METRICS)[number];
export const MY_LOAD_WEEKS = 8;

export type MyLoad = {
  weeks: string[];
  /** Week totals, oldest first (the last is this week so far), per metric. */
  totals: Record<MyLoadMetric, number[]>;
  speed: { vmaxMs: number; testedOn: string | null } | null;
};

/**
 * One athlete's own logged load (the "actual" view: only what was logged counts, drafts never) for the last
 * MY_LOAD_WEEKS weeks, and their own speed test. The caller has authorized the athlete; nobody else's figures.
 */
export async function getMyLoad({
  teamId,
  athleteId,
  today,
  timeZone,
  weekStartDay,
}: {
  teamId: number;
  athleteId: number;
  today: string;
  timeZone: string;
  weekStartDay: number;
}): Promise<MyLoad> {
  const thisWeek = startOfWeek(today, weekStartDay);
  const weeks = Array.from({ length: MY_LOAD_WEEKS }, (_, i) => addDays(thisWeek, 7 * (i - MY_LOAD_WEEKS + 1)));
  const from = weeks[0];
  const to = addDays(thisWeek, 6);
  const [series, profile] = await Promise.all([
    Promise.all(
      MY_LOAD_METRICS.map((metric) =>
        getAthleteLoad({
          teamId,
          athleteId,
          from,
          to,
          view: "actual",
          metric,
          today,
          clock: { timeZone, weekStartDay },
          withDrafts: false,
        }),
      ),
    ),
    listSquad({ teamId, athleteId }),
  ]);
  const totals = Object.fromEntries(
    MY_LOAD_METRICS.map((metric, m) => [
      metric,
      weeks.map((w) =>
        series[m].days.filter((d) => d.date >= w && d.date < addDays(w, 7)).reduce((s, d) => s + d.value, 0),
      ),
    ]),
  ) as Record<MyLoadMetric, number[]>;
  const me = profile[0];
  return { weeks, totals, speed: me?.vmaxMs ? { vmaxMs: me.vmaxMs, testedOn: me.vmaxTestedOn } : null };
}
