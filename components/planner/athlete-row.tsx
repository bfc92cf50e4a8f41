"use client";

import { clsx } from "clsx";
import { memo } from "react";
import type { Flag } from "@/lib/load/flags";
import { formatDayShort } from "@/lib/format/dates";
import type { RowPreview } from "@/lib/plan/preview";
import type { PlanAthlete } from "@/lib/plan/types";
import { DropCell } from "./day-cell";
import { RowLoadSummary } from "./row-load";
import { SessionCard, type CardActions } from "./session-card";

type Props = {
  athlete: PlanAthlete;
  days: string[];
  today: string;
  canEdit: boolean;
  preview: RowPreview | null;
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
export const AthleteRow = memo(function AthleteRow({ athlete, days, today, canEdit, preview, copyArmedId, actions }: Props) {
  const bySession = flagsBySession(athlete.load.flags);
  return (
    <>
      <tr data-testid="athlete-row" data-athlete-id={athlete.id} className={clsx("border-t border-ink-100", preview && "bg-lane-50/30")}>
        <th scope="row" className="sticky left-0 z-10 w-52 min-w-52 bg-paper-raised px-3 py-2 text-left align-top font-normal">
          <span className="block truncate text-sm font-medium text-ink-900">{athlete.name}</span>
          <RowLoadSummary load={athlete.load} preview={preview?.after ?? null} raised={preview?.warnings ?? NO_FLAGS} />
        </th>
        {days.map((date) => (
          <DropCell
            key={date}
            target={{ type: "cell", athleteId: athlete.id, date }}
            label={`${athlete.name}, ${formatDayShort(date)}`}
            enabled={canEdit}
            today={date === today}
          >
            <div className="flex min-h-16 flex-col gap-1 p-0.5">
              {athlete.sessions
                .filter((s) => s.date === date)
                .map((s) => (
                  <SessionCard key={s.id} session={s} athleteName={athlete.name} canEdit={canEdit} copyArmed={copyArmedId === s.id} flags={bySession.get(String(s.id)) ?? NO_FLAGS} actions={actions} />
                ))}
            </div>
          </DropCell>
        ))}
      </tr>
    </>
  );
});
