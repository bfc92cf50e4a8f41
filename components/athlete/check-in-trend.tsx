import { Card } from "@/components/ui/card";
import type { CheckInDto } from "@/lib/data/check-ins";
import { CHECK_IN_ITEMS, CHECK_IN_SCALE } from "@/lib/domain/wellbeing";
import { formatDayShort } from "@/lib/format/dates";
import { WeekBars } from "./week-bars";

/** The athlete's own check-in scores (sum of five, 5–25) over the last weeks, and today's items. */
export function CheckInTrend({ checkIns }: { checkIns: CheckInDto[] }) {
  if (checkIns.length === 0) return null;
  const last = checkIns.at(-1)!;
  return (
    <Card className="p-4" data-testid="check-in-trend">
      <h2 className="font-semibold text-ink-950">Your check-ins</h2>
      <p className="text-xs text-ink-500">
        Sum of the five answers, 5 to 25 (higher is better), last {checkIns.length}.
      </p>
      <WeekBars
        values={checkIns.map((c) => c.total)}
        labels={checkIns.map((c) => formatDayShort(c.date))}
        describe={(v) => `${v} of 25`}
        className="mt-2"
      />
      <p className="mt-2 text-sm text-ink-700">
        Latest ({formatDayShort(last.date)}): {last.total} of 25 ·{" "}
        {CHECK_IN_ITEMS.map((k) => `${CHECK_IN_SCALE[k].label} ${last[k]}`).join(", ")}
      </p>
    </Card>
  );
}
