"use client";

import { clsx } from "clsx";
import { memo } from "react";
import type { Flag } from "@/lib/load/flags";
import { formatDayShort } from "@/lib/format/dates";
import { dayHeading } from "@/lib/dates/plain-date";
import { sessionHits } from "@/lib/plan/restrictions";
import type { PlanAthlete } from "@/lib/plan/types";
import type { GridPhase } from "@/lib/season/season-grid";
import { describeRestriction, type Restriction } from "@/lib/restrictions/rules";
import { DropCell } from "./day-cell";
import { useRowPreview, type HoverStore } from "./hover-store";
import { RowLoadSummary } from "./row-load";
import { RowTarget } from "./row-target";
import { SessionCard, type CardActions } from "./session-card";

type Props = {
  athlete: PlanAthlete;
  /** The season phase in force for the athlete this week, if any (its weekly targets). */
  phase?: GridPhase | null;
  /** The athlete's physio restrictions that touch this week. */
  restrictions: readonly Restriction[];
  days: string[];
  today: string;
  canEdit: boolean;
  hoverStore: HoverStore;
  copyArmedId: number | null;
  actions: CardActions;
};

const NO_FLAGS: Flag[] = [];

function flagsBySession(flags: readonly Flag[]): Map<string, Flag[]> {
  const out = new Map<string, Flag[]>();
  for (const f of flags) if (f.sessionId) out.set(f.sessionId, [...(out.get(f.sessionId) ?? []), f]);
  return out;
}

/** One athlete: name and week numbers, then a cell per day holding that day's session cards. */
export const AthleteRow = memo(function AthleteRow({
  athlete,
  phase,
  restrictions,
  days,
  today,
  canEdit,
  hoverStore,
  copyArmedId,
  actions,
}: Props) {
  const preview = useRowPreview(hoverStore, athlete.id);
  return (
    <tr
      data-testid="athlete-row"
      data-athlete-id={athlete.id}
      className={clsx("border-t border-ink-100", preview && "bg-lane-50/30")}
    >
      <th
        scope="row"
        className="sticky left-0 z-10 w-52 min-w-52 bg-paper-raised px-3 py-2 text-left align-top font-normal"
      >
        {/* Long names wrap between words, never inside one. */}
        <span className="block text-sm font-medium break-normal text-ink-900">{athlete.name}</span>
        <RestrictionChip restrictions={restrictions} />
        <RowLoadSummary load={athlete.load} preview={preview?.after ?? null} raised={preview?.warnings ?? NO_FLAGS} />
        <RowTarget phase={phase ?? null} load={preview?.after ?? athlete.load} />
      </th>
      <RowDays
        athlete={athlete}
        restrictions={restrictions}
        days={days}
        today={today}
        canEdit={canEdit}
        hoverStore={hoverStore}
        copyArmedId={copyArmedId}
        actions={actions}
      />
    </tr>
  );
});

export const RestrictionChip = memo(function RestrictionChip({
  restrictions,
}: {
  restrictions: readonly Restriction[];
}) {
  if (restrictions.length === 0) return null;
  const limitsText = restrictions.map((r) => `${describeRestriction(r)} (${r.setByName}): ${r.note}`).join("\n");
  return (
    <span
      data-testid="row-restriction"
      title={limitsText}
      className={clsx(
        "mt-0.5 inline-flex max-w-full items-center gap-1 rounded-full border border-dashed border-limit",
        "bg-limit-soft px-1.5 py-px text-2xs font-medium text-limit",
      )}
    >
      <span aria-hidden>⚕</span>
      {restrictions.length === 1 ? "Physio restriction" : `${restrictions.length} physio restrictions`}
      <span className="sr-only">: {limitsText}</span>
    </span>
  );
});

/**
 * The row's day cells: memoised apart from the preview, so hovering a row does not re-render its cards. `stacked`:
 * the phone's views, one list item per cell headed by its day (one athlete's week) or by the athlete (the squad's
 * day; long names wrap between words).
 */
export const RowDays = memo(function RowDays({
  athlete,
  restrictions,
  days,
  today,
  canEdit,
  hoverStore,
  copyArmedId,
  actions,
  stacked = false,
}: Props & { stacked?: false | "day" | "athlete" }) {
  const bySession = flagsBySession(athlete.load.flags);
  const restrictedText = (s: PlanAthlete["sessions"][number]) => {
    const hits = sessionHits({ restrictions }, s);
    return hits.length > 0 ? hits.map((h) => `${h.rule}. ${h.detail}`).join("\n") : null;
  };
  return (
    <>
      {days.map((date) => (
        <DropCell
          key={date}
          store={hoverStore}
          target={{ type: "cell", athleteId: athlete.id, date }}
          label={`${athlete.name}, ${formatDayShort(date)}`}
          enabled={canEdit}
          today={date === today}
          as={stacked ? "li" : "td"}
        >
          {stacked === "day" ? <StackedDayHeading date={date} today={date === today} /> : null}
          {stacked === "athlete" ? (
            <h3 className="px-2 pt-1.5 text-sm font-medium break-normal text-ink-900">{athlete.name}</h3>
          ) : null}
          <div className={clsx("flex flex-col gap-1 p-0.5", stacked ? "min-h-12" : "min-h-16")}>
            {athlete.sessions
              .filter((s) => s.date === date)
              .map((s) => (
                <SessionCard
                  key={s.id}
                  session={s}
                  athleteName={athlete.name}
                  canEdit={canEdit}
                  copyArmed={copyArmedId === s.id}
                  flags={bySession.get(String(s.id)) ?? NO_FLAGS}
                  restricted={restrictions.length > 0 ? restrictedText(s) : null}
                  actions={actions}
                />
              ))}
          </div>
        </DropCell>
      ))}
    </>
  );
});

function StackedDayHeading({ date, today }: { date: string; today: boolean }) {
  const h = dayHeading(date);
  return (
    <h3 className={clsx("px-2 pt-1.5 text-xs font-medium", today ? "text-clay-700" : "text-ink-600")}>
      <span className="tracking-wider uppercase">{h.weekday}</span> <span className="tabular-nums">{h.date}</span>
      {today ? <span className="ml-1 rounded bg-clay-100 px-1 text-2xs text-clay-700">today</span> : null}
    </h3>
  );
}
