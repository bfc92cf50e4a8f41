"use client";

import Link from "next/link";
import { useCallback, useState } from "react";
import useSWR from "swr";
import { Button, buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { seasonApi } from "@/lib/client/api";
import { fetchJson } from "@/lib/client/fetcher";
import { seasonKeys } from "@/lib/client/keys";
import { SEASON_PHASE_LABELS } from "@/lib/domain/season";
import type { SeasonViewDto } from "@/lib/data/season-view";
import { addDays, shiftWeek } from "@/lib/dates/plain-date";
import { formatDayShort } from "@/lib/format/dates";
import type { ForecastWarning } from "@/lib/season/forecast-warnings";
import { MeetForm } from "./meet-form";
import { PhaseForm } from "./phase-form";
import { ProgressionForm } from "./progression-form";
import { SeasonGrid } from "./season-grid";
import { SeasonPrint } from "./season-print";

const STEP_WEEKS = 4;

function warningText(w: ForecastWarning): string {
  if (w.kind === "taper_not_lowering")
    return (
      `The taper does not bring the ratio down before ${w.meet.name} (${formatDayShort(w.meet.date)}): ` +
      `${w.acwrBefore.toFixed(2)} before the taper, ${w.acwrAtMeet.toFixed(2)} in the meet's week.`
    );
  return (
    `The week of ${formatDayShort(w.weekStart)} rises ${Math.round(w.changePct)} % after an unload week ` +
    `(the weekly limit is ${w.limitPct} %).`
  );
}

export function SeasonView({ teamId, initial, canEdit }: { teamId: number; initial: SeasonViewDto; canEdit: boolean }) {
  const [from, setFrom] = useState(initial.from);
  const weeks = initial.weeks.length;
  const key = seasonKeys.view(teamId, from, weeks);
  const { data, mutate, isValidating } = useSWR<SeasonViewDto>(key, fetchJson, {
    fallbackData: from === initial.from ? initial : undefined,
    keepPreviousData: true,
  });
  const stored = data ?? initial;
  // A progression being chosen in the form: its forecast is drawn in the grid and the warnings before it is written.
  const [preview, setPreview] = useState<SeasonViewDto | null>(null);
  const onPreview = useCallback((v: SeasonViewDto | null) => setPreview(v), []);
  const view = preview ?? stored;
  const warnings = view.athletes.flatMap((a) => a.warnings.map((w) => ({ athlete: a, warning: w })));
  const refresh = () => void mutate();

  return (
    <>
      <SeasonPrint view={view} />
      <div className="space-y-4 print:hidden">
        <div className="flex flex-wrap items-center gap-2">
          <Button variant="secondary" onClick={() => setFrom(shiftWeek(from, -STEP_WEEKS))}>
            Earlier weeks
          </Button>
          <Button variant="secondary" onClick={() => setFrom(shiftWeek(view.currentWeekStart, -4))}>
            This part of the season
          </Button>
          <Button variant="secondary" onClick={() => setFrom(shiftWeek(from, STEP_WEEKS))}>
            Later weeks
          </Button>
          <p className="text-sm text-ink-700" aria-live="polite">
            {formatDayShort(view.from)} to {formatDayShort(addDays(shiftWeek(view.from, weeks - 1), 6))}
            {isValidating ? " · updating" : ""}
          </p>
          <a
            href={seasonKeys.export(teamId, view.from, weeks)}
            className={buttonClass({ variant: "secondary" }) + " ml-auto"}
            data-testid="season-csv"
          >
            Export CSV
          </a>
          <Button variant="secondary" onClick={() => window.print()} data-testid="season-print-button">
            Print
          </Button>
        </div>
        {preview ? (
          <p
            className="rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-800"
            role="status"
            data-testid="season-preview"
          >
            Showing the weeks from the form below as if they were written: cells marked &ldquo;not written yet&rdquo;
            change when the rule changes. Write them to keep them.
          </p>
        ) : null}
        <SeasonGrid view={view} />
        <LoadCaution />
        <section aria-labelledby="season-warnings" className="space-y-2">
          <h2 id="season-warnings" className="text-base font-semibold text-ink-900">
            Ahead in the plan
          </h2>
          {warnings.length === 0 ? (
            <p className="text-sm text-ink-700" data-testid="no-season-warnings">
              Nothing ahead to check: no taper leaves a ratio up before an A meet and no build jumps after an unload.
            </p>
          ) : (
            <ul className="space-y-1" data-testid="season-warnings-list">
              {warnings.map(({ athlete, warning }, i) => (
                <li key={i} className="text-sm text-ink-800" data-testid="season-warning" data-kind={warning.kind}>
                  <span className="font-medium">{athlete.name}</span>: {warningText(warning)}{" "}
                  <Link href={`/plan?week=${warning.weekStart}`} className="font-medium text-lane-700 underline">
                    Open the week
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
        {view.phases.length > 0 ? (
          <section aria-labelledby="season-phases-title" className="space-y-2">
            <h2 id="season-phases-title" className="text-base font-semibold text-ink-900">
              Phases shown
            </h2>
            <ul className="divide-y divide-ink-100 rounded-xl bg-paper-raised ring-1 ring-ink-100">
              {view.phases.map((p) => (
                <li
                  key={p.id}
                  className="flex flex-wrap items-center gap-2 px-3 py-2 text-sm"
                  data-testid="season-phase"
                >
                  <span className="font-medium text-ink-900">{p.name}</span>
                  <span className="text-ink-700">
                    {SEASON_PHASE_LABELS[p.kind]} · {formatDayShort(p.startsOn)} to {formatDayShort(p.endsOn)}
                  </span>
                  {p.groupId !== null ? (
                    <span className="text-ink-700">
                      · for {view.groups.find((g) => g.id === p.groupId)?.name ?? "one group"}
                    </span>
                  ) : null}
                  {p.goal ? <span className="text-ink-700">· {p.goal}</span> : null}
                  {canEdit ? (
                    <span className="ml-auto flex gap-2">
                      <Button
                        variant="secondary"
                        size="sm"
                        onClick={async () => {
                          await seasonApi.copyPhase(p.id, { weeksLater: 52 });
                          refresh();
                        }}
                      >
                        Copy to next season<span className="sr-only">: {p.name}</span>
                      </Button>
                      <Button
                        variant="secondary"
                        size="sm"
                        onClick={async () => {
                          await seasonApi.deletePhase(p.id);
                          refresh();
                        }}
                      >
                        Remove<span className="sr-only"> {p.name}</span>
                      </Button>
                    </span>
                  ) : null}
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        {canEdit ? (
          <div className="grid gap-4 lg:grid-cols-3">
            <Card className="p-4">
              <ProgressionForm
                teamId={teamId}
                sourceWeek={stored.currentWeekStart}
                firstWeek={shiftWeek(stored.currentWeekStart, 1)}
                view={stored}
                onPreview={onPreview}
                onSaved={refresh}
              />
            </Card>
            <Card className="p-4">
              <PhaseForm teamId={teamId} defaultStart={view.currentWeekStart} groups={view.groups} onSaved={refresh} />
            </Card>
            <Card className="p-4">
              <MeetForm teamId={teamId} choices={{ groups: view.groups, athletes: view.athletes }} onSaved={refresh} />
            </Card>
          </div>
        ) : null}
      </div>
    </>
  );
}
