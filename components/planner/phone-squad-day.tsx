"use client";

import { memo, useMemo } from "react";
import { formatDayShort } from "@/lib/format/dates";
import type { PlanWeek } from "@/lib/plan/types";
import type { Restriction } from "@/lib/restrictions/rules";
import { RowDays } from "./athlete-row";
import type { HoverStore } from "./hover-store";
import type { CardActions } from "./session-card";

type Props = {
  week: PlanWeek;
  day: string;
  onDay: (date: string) => void;
  hoverStore: HoverStore;
  copyArmedId: number | null;
  actions: CardActions;
};

const NO_RESTRICTIONS: Restriction[] = [];

/**
 * Below tablet width, the other way round from one athlete's week: one day for the whole squad, an athlete per
 * item in group order, with the same cells (data attributes, drag, preview) as the grid.
 */
export const PhoneSquadDay = memo(function PhoneSquadDay({
  week,
  day,
  onDay,
  hoverStore,
  copyArmedId,
  actions,
}: Props) {
  const byId = useMemo(() => new Map(week.athletes.map((a) => [a.id, a])), [week.athletes]);
  const limits = useMemo(() => {
    const out = new Map<number, Restriction[]>();
    for (const r of week.restrictions) out.set(r.athleteId, [...(out.get(r.athleteId) ?? []), r]);
    return out;
  }, [week.restrictions]);
  const days = useMemo(() => [day], [day]);
  return (
    <section aria-label={`The squad on ${formatDayShort(day)}`} data-testid="phone-squad-day" className="space-y-2">
      <label className="block text-xs font-medium text-ink-700">
        Day
        <select
          data-testid="phone-day"
          value={day}
          onChange={(e) => onDay(e.target.value)}
          className="mt-1 block w-full rounded-md bg-paper-raised px-2 py-2 text-sm text-ink-900 ring-1 ring-ink-200"
        >
          {week.days.map((d) => (
            <option key={d} value={d}>
              {formatDayShort(d)}
              {d === week.today ? " (today)" : ""}
            </option>
          ))}
        </select>
      </label>
      <ol className="space-y-2" data-testid="plan-grid" aria-label={`Athletes on ${formatDayShort(day)}`}>
        {week.groups.flatMap((g) =>
          g.athleteIds.map((id) => {
            const athlete = byId.get(id);
            return athlete ? (
              <RowDays
                key={id}
                athlete={athlete}
                restrictions={limits.get(id) ?? NO_RESTRICTIONS}
                days={days}
                today={week.today}
                canEdit={week.canEdit}
                hoverStore={hoverStore}
                copyArmedId={copyArmedId}
                actions={actions}
                stacked="athlete"
              />
            ) : null;
          }),
        )}
      </ol>
    </section>
  );
});
