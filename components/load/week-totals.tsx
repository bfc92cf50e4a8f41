import { Card } from "@/components/ui/card";
import { formatNumber } from "@/lib/format/number";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { METRIC_INFO, METRICS } from "@/lib/load/types";
import type { WeekSummary } from "@/lib/load/week-summary";

/** The week's totals per metric with the change on last week, and the team metric's monotony and strain. */
export function WeekTotals({ week, estimated = true }: { week: WeekSummary; estimated?: boolean }) {
  const m = week.acwrMetric;
  return (
    <Card className="p-4 sm:p-5" data-testid="week-totals">
      <h2 className="text-base font-semibold text-ink-900">Week of {formatDayLabel(week.weekStart)}</h2>
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-3 sm:grid-cols-3">
        {METRICS.map((metric) => {
          const info = METRIC_INFO[metric];
          const change = week.changePct[metric];
          return (
            <div key={metric}>
              <dt className="text-2xs text-ink-500">
                {info.label}
                {metric === "sprintSteps" ? " (est.)" : ""}
              </dt>
              <dd className="text-lg font-semibold text-ink-900 tabular-nums">
                {formatNumber(week.totals[metric], 0)}{" "}
                <span className="text-xs font-normal text-ink-500">{info.unit}</span>
              </dd>
              <dd className="text-2xs text-ink-500 tabular-nums">
                {change === null ? "no last week" : `${change > 0 ? "+" : ""}${formatNumber(change, 0)}% on last week`}
              </dd>
            </div>
          );
        })}
      </dl>
      <p className="mt-4 border-t border-ink-100 pt-3 text-xs text-ink-500">
        {METRIC_INFO[m].short} monotony {week.monotony[m] === null ? "–" : formatNumber(week.monotony[m]!, 2)} · strain{" "}
        {week.strain[m] === null ? "–" : formatNumber(week.strain[m]!, 0)} (Foster 1998;{" "}
        {week.sdType === "population" ? "population" : "sample"} SD)
        {week.missingDays > 0
          ? ` · ${week.missingDays} day${week.missingDays === 1 ? "" : "s"} with a session not logged ` +
            `(${estimated ? "counted from the plan, an estimate" : "left out"})`
          : ""}
      </p>
    </Card>
  );
}
