"use client";

import { clsx } from "clsx";
import { memo, useMemo } from "react";
import type { PlanWeek } from "@/lib/plan/types";
import type { Restriction } from "@/lib/restrictions/rules";
import { dayHeading } from "@/lib/dates/plain-date";
import { phaseOfWeek } from "@/lib/season/season-grid";
import { AthleteRow } from "./athlete-row";
import { GroupRow, groupKey } from "./group-row";
import type { HoverStore } from "./hover-store";
import type { CardActions } from "./session-card";

type Props = {
  week: PlanWeek;
  collapsed: ReadonlySet<string>;
  onToggleGroup: (key: string) => void;
  hoverStore: HoverStore;
  templateDrag: boolean;
  /** Something is being dragged (cells tint; only editors can drag). */
  dragging: boolean;
  copyArmedId: number | null;
  actions: CardActions;
};

const NO_RESTRICTIONS: Restriction[] = [];

/** Rows = athletes grouped by training group; columns = the days of the team's week. */
export const WeekGrid = memo(function WeekGrid({
  week,
  collapsed,
  onToggleGroup,
  hoverStore,
  templateDrag,
  dragging,
  copyArmedId,
  actions,
}: Props) {
  const byId = new Map(week.athletes.map((a) => [a.id, a]));
  // One stable list per athlete, so rows stay memoised while something is dragged.
  const limits = useMemo(() => {
    const out = new Map<number, Restriction[]>();
    for (const r of week.restrictions) out.set(r.athleteId, [...(out.get(r.athleteId) ?? []), r]);
    return out;
  }, [week.restrictions]);
  const phases = useMemo(
    () => new Map(week.athletes.map((a) => [a.id, phaseOfWeek(week.phases ?? [], a.groupId, week.weekStart)])),
    [week.athletes, week.phases, week.weekStart],
  );
  return (
    // Positioned, so absolutely placed screen-reader text in the cells stays inside this scroll box (not the page).
    <div className="relative overflow-x-auto rounded-card bg-paper-raised shadow-card ring-1 ring-ink-100">
      <table
        data-testid="plan-grid"
        data-dragging={dragging || undefined}
        className="group/grid w-full min-w-[52rem] table-fixed border-collapse text-sm"
      >
        <colgroup>
          <col className="w-52" />
          {week.days.map((d) => (
            <col key={d} />
          ))}
        </colgroup>
        <thead>
          <tr className="text-left">
            <th scope="col" className="sticky left-0 z-10 bg-paper-raised px-3 py-2 text-xs font-medium text-ink-500">
              Athlete · week load
            </th>
            {week.days.map((date) => {
              const h = dayHeading(date);
              const today = date === week.today;
              return (
                <th
                  key={date}
                  scope="col"
                  data-testid="day-heading"
                  data-day-column={date}
                  className={clsx(
                    "border-l border-ink-100 px-2 py-2 text-xs font-medium",
                    today ? "text-clay-700" : "text-ink-500",
                  )}
                >
                  <span className="block tracking-wider uppercase">{h.weekday}</span>
                  <span className={clsx("tabular-nums", today ? "font-semibold" : "text-ink-800")}>{h.date}</span>
                  {today ? <span className="ml-1 rounded bg-clay-100 px-1 text-2xs text-clay-700">today</span> : null}
                </th>
              );
            })}
          </tr>
        </thead>
        {week.groups.map((g) => {
          const folded = collapsed.has(groupKey(g));
          return (
            <tbody key={groupKey(g)} data-testid="group-body">
              {week.scope === "team" ? (
                <GroupRow
                  group={g}
                  days={week.days}
                  today={week.today}
                  collapsed={folded}
                  onToggle={onToggleGroup}
                  templateDrag={templateDrag}
                  canEdit={week.canEdit}
                  hoverStore={hoverStore}
                />
              ) : null}
              {folded
                ? null
                : g.athleteIds.map((id) => {
                    const athlete = byId.get(id);
                    return athlete ? (
                      <AthleteRow
                        key={id}
                        athlete={athlete}
                        phase={phases.get(id) ?? null}
                        restrictions={limits.get(id) ?? NO_RESTRICTIONS}
                        days={week.days}
                        today={week.today}
                        canEdit={week.canEdit}
                        hoverStore={hoverStore}
                        copyArmedId={copyArmedId}
                        actions={actions}
                      />
                    ) : null;
                  })}
            </tbody>
          );
        })}
      </table>
    </div>
  );
});
