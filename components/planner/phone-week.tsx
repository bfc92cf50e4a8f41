"use client";

import { memo, useMemo } from "react";
import type { PlanWeek } from "@/lib/plan/types";
import type { Restriction } from "@/lib/restrictions/rules";
import { phaseOfWeek } from "@/lib/season/season-grid";
import { RestrictionChip, RowDays } from "./athlete-row";
import { useRowPreview, type HoverStore } from "./hover-store";
import { RowLoadSummary } from "./row-load";
import { RowTarget } from "./row-target";
import type { CardActions } from "./session-card";

type Props = {
  week: PlanWeek;
  athleteId: number;
  onAthlete: (id: number) => void;
  hoverStore: HoverStore;
  copyArmedId: number | null;
  actions: CardActions;
};

const NO_RESTRICTIONS: Restriction[] = [];

/**
 * Below tablet width: one athlete's week, days stacked, with the same cards, drag, preview and numbers as the
 * grid (the cells carry the grid's data attributes, so drops and the keyboard find them the same way).
 */
export const PhoneWeek = memo(function PhoneWeek({
  week,
  athleteId,
  onAthlete,
  hoverStore,
  copyArmedId,
  actions,
}: Props) {
  const athlete = week.athletes.find((a) => a.id === athleteId) ?? week.athletes[0];
  const restrictions = useMemo(
    () => week.restrictions.filter((r) => r.athleteId === athlete?.id),
    [week.restrictions, athlete?.id],
  );
  const preview = useRowPreview(hoverStore, athlete?.id ?? -1);
  if (!athlete) return null;
  return (
    <section aria-label={`Week of ${athlete.name}`} data-testid="phone-week" className="space-y-2">
      {week.athletes.length > 1 ? (
        <label className="block text-xs font-medium text-ink-700">
          Athlete
          <select
            data-testid="phone-athlete"
            value={athlete.id}
            onChange={(e) => onAthlete(Number(e.target.value))}
            className="mt-1 block w-full rounded-md bg-paper-raised px-2 py-2 text-sm text-ink-900 ring-1 ring-ink-200"
          >
            {week.groups.map((g) => (
              <optgroup key={g.id ?? "none"} label={g.name}>
                {g.athleteIds.map((id) => (
                  <option key={id} value={id}>
                    {week.athletes.find((a) => a.id === id)?.name ?? ""}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </label>
      ) : null}
      <div
        data-testid="athlete-row"
        data-athlete-id={athlete.id}
        className="rounded-card bg-paper-raised px-3 py-2 shadow-card ring-1 ring-ink-100"
      >
        <h2 className="text-base font-semibold break-normal text-ink-900">{athlete.name}</h2>
        <RestrictionChip restrictions={restrictions.length ? restrictions : NO_RESTRICTIONS} />
        <RowLoadSummary load={athlete.load} preview={preview?.after ?? null} raised={preview?.warnings ?? []} />
        <RowTarget
          phase={phaseOfWeek(week.phases ?? [], athlete.groupId, week.weekStart)}
          load={preview?.after ?? athlete.load}
        />
      </div>
      <ol className="space-y-2" data-testid="plan-grid" aria-label="Days of the week">
        <RowDays
          athlete={athlete}
          restrictions={restrictions}
          days={week.days}
          today={week.today}
          canEdit={week.canEdit}
          hoverStore={hoverStore}
          copyArmedId={copyArmedId}
          actions={actions}
          stacked="day"
        />
      </ol>
    </section>
  );
});
