"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { dayHeading, weekRangeLabel } from "@/lib/dates/plain-date";
import { blockDescription } from "@/lib/format/block-summary";
import { toBlockInput } from "@/lib/plan/blocks";
import type { PlanAthlete, PlanSession, PlanWeek } from "@/lib/plan/types";

const STATE_WORD = { draft: "draft", published: null, cancelled: "cancelled" } as const;

/** One session as printed: time, title, length, state, then every block's whole prescription. */
function PrintedSession({ session: s }: { session: PlanSession }) {
  const state = STATE_WORD[s.status];
  return (
    <div data-testid="print-session" data-session-id={s.id} className="mb-1.5 break-inside-avoid">
      <p className={s.status === "cancelled" ? "font-semibold line-through" : "font-semibold"}>
        {s.startTime} {s.title}
        <span className="font-normal">
          {" "}
          · {s.durationMin} min{state ? ` · ${state}` : ""}
        </span>
      </p>
      <ul>
        {s.blocks.flatMap((b) =>
          blockDescription(toBlockInput(b)).map((line, i) => (
            <li key={`${b.id}-${i}`} data-testid="print-line" className={line.startsWith("•") ? "pl-2" : undefined}>
              {line}
            </li>
          )),
        )}
      </ul>
      {s.notes ? <p className="italic">{s.notes}</p> : null}
    </div>
  );
}

function sessionsOn(a: PlanAthlete, day: string) {
  return a.sessions.filter((s) => s.date === day);
}

function DayLabel({ day }: { day: string }) {
  const h = dayHeading(day);
  return (
    <>
      {h.weekday} {h.date}
    </>
  );
}

/** The whole squad: athletes down, days across, every prescription written out (A4 landscape). */
function SquadSheet({ week }: { week: PlanWeek }) {
  return (
    <table className="w-full table-fixed border-collapse text-[7.5pt] leading-tight">
      <thead>
        <tr>
          <th className="w-[11%] border border-ink-300 p-1 text-left">Athlete</th>
          {week.days.map((d) => (
            <th key={d} className="border border-ink-300 p-1 text-left">
              <DayLabel day={d} />
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {week.athletes.map((a) => (
          <tr key={a.id} data-testid="print-athlete" className="break-inside-avoid">
            <th scope="row" className="border border-ink-300 p-1 text-left align-top">
              {a.name}
            </th>
            {week.days.map((d) => (
              <td key={d} className="border border-ink-300 p-1 align-top break-words">
                {sessionsOn(a, d).map((s) => (
                  <PrintedSession key={s.id} session={s} />
                ))}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** One athlete's week: a day per row, larger type, room for notes. */
function AthleteSheet({ athlete }: { athlete: PlanAthlete }) {
  return (
    <table className="w-full border-collapse text-[10pt] leading-snug">
      <tbody>
        {athlete.sessions.length === 0 ? (
          <tr>
            <td className="p-2">No sessions this week.</td>
          </tr>
        ) : null}
        {[...new Set(athlete.sessions.map((s) => s.date))].map((d) => (
          <tr key={d} className="break-inside-avoid">
            <th scope="row" className="w-28 border-b border-ink-300 p-2 text-left align-top">
              <DayLabel day={d} />
            </th>
            <td className="border-b border-ink-300 p-2 align-top">
              {sessionsOn(athlete, d).map((s) => (
                <PrintedSession key={s.id} session={s} />
              ))}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * Printing the week: a "Print" control on screen, and a sheet that only paper shows (A4 landscape, app/globals.css)
 * with every prescription in full. The planner itself is hidden in print; this sheet reads the same week.
 */
export function WeekPrint({ week }: { week: PlanWeek }) {
  const single = week.athletes.length === 1 ? week.athletes[0] : null;
  const [choice, setChoice] = useState<number | "all">("all");
  const chosen = single ?? week.athletes.find((a) => a.id === choice) ?? null;
  // The planner hides its children in print (print:*:hidden); this one stays (print:block!).
  return (
    <div className="print:block!">
      <div className="mt-4 flex flex-wrap items-end gap-2 print:hidden" data-testid="print-controls">
        {single ? null : (
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
            Print
            <select
              value={String(choice)}
              onChange={(e) => setChoice(e.target.value === "all" ? "all" : Number(e.target.value))}
              className="h-8 rounded-lg bg-paper-raised px-2 text-sm text-ink-900 ring-1 ring-ink-200 ring-inset"
              data-testid="print-choice"
            >
              <option value="all">The whole week</option>
              {week.athletes.map((a) => (
                <option key={a.id} value={a.id}>
                  {a.name}&apos;s week
                </option>
              ))}
            </select>
          </label>
        )}
        <Button variant="secondary" size="sm" onClick={() => window.print()} data-testid="print-week">
          {single ? "Print my week" : "Print"}
        </Button>
      </div>
      <section className="hidden text-ink-950 print:block" data-testid="week-print" aria-label="Printed week">
        <h1 className="mb-2 text-[12pt] font-semibold">
          {chosen ? `${chosen.name} · ` : ""}Week {week.isoWeek} · {weekRangeLabel(week.weekStart)}
        </h1>
        {chosen ? <AthleteSheet athlete={chosen} /> : <SquadSheet week={week} />}
      </section>
    </div>
  );
}
