"use client";

import { Button } from "@/components/ui/button";
import { addDays, diffDays, formatDayLabel, startOfWeek } from "@/lib/dates/plain-date";

/** Previous / this / next week, with the week's dates as the label. */
export function WeekNav({
  week,
  today,
  onChange,
  weekStartDay = 1,
}: {
  week: string;
  today: string;
  onChange: (week: string) => void;
  weekStartDay?: number;
}) {
  const current = startOfWeek(today, weekStartDay);
  const offset = Math.round(diffDays(week, current) / 7);
  const note =
    offset === 0
      ? "This week"
      : offset === 1
        ? "Next week"
        : offset === -1
          ? "Last week"
          : offset > 0
            ? `In ${offset} weeks`
            : `${-offset} weeks ago`;
  return (
    <div className="flex items-center gap-2" data-testid="week-nav">
      <Button variant="secondary" size="sm" onClick={() => onChange(addDays(week, -7))} aria-label="Previous week">
        ←
      </Button>
      <div className="min-w-44 text-center">
        <p className="text-sm font-semibold text-ink-900" data-testid="week-label">
          {formatDayLabel(week)} – {formatDayLabel(addDays(week, 6))}
        </p>
        <p className="text-2xs text-ink-500">{note}</p>
      </div>
      <Button variant="secondary" size="sm" onClick={() => onChange(addDays(week, 7))} aria-label="Next week">
        →
      </Button>
      {offset !== 0 ? (
        <Button variant="ghost" size="sm" onClick={() => onChange(current)}>
          Today
        </Button>
      ) : null}
    </div>
  );
}
