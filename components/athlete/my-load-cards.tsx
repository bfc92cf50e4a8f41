import { Card } from "@/components/ui/card";
import { formatDayShort } from "@/lib/format/dates";
import { formatNumber } from "@/lib/format/number";
import { METRIC_INFO } from "@/lib/load/types";
import { MY_LOAD_METRICS, type MyLoad } from "./my-load";
import { WeekBars } from "./week-bars";

function change(now: number, before: number): string {
  if (before <= 0) return now > 0 ? "none the week before" : "";
  const pct = Math.round(((now - before) / before) * 100);
  return pct === 0 ? "same as the week before" : `${pct > 0 ? "+" : ""}${pct}% on the week before`;
}

/** This week's HSR metres, ground contacts and sRPE so far, against last week, with an eight-week trend. */
export function MyLoadCards({ load, compact = false }: { load: MyLoad; compact?: boolean }) {
  const labels = load.weeks.map((w) => `week of ${formatDayShort(w)}`);
  return (
    <div className={compact ? "grid grid-cols-3 gap-2" : "space-y-3"} data-testid="my-load">
      {MY_LOAD_METRICS.map((metric) => {
        const info = METRIC_INFO[metric];
        const series = load.totals[metric];
        const now = series.at(-1) ?? 0;
        const before = series.at(-2) ?? 0;
        const fmt = (v: number) => `${formatNumber(v, info.decimals)} ${info.unit}`.trim();
        return (
          <Card key={metric} className={compact ? "p-3" : "p-4"} data-testid={`my-load-${metric}`}>
            <p className="text-xs font-semibold tracking-wider text-ink-500 uppercase">{info.short}</p>
            <p className="mt-0.5 text-xl font-semibold text-ink-950 tabular-nums" data-testid="my-load-value">
              {formatNumber(now, info.decimals)}
              <span className="ml-1 text-xs font-normal text-ink-600">{info.unit}</span>
            </p>
            {compact ? null : (
              <>
                <p className="text-xs text-ink-600">This week so far · {change(now, before)}</p>
                <WeekBars values={series} labels={labels} describe={fmt} className="mt-2" />
              </>
            )}
          </Card>
        );
      })}
    </div>
  );
}
