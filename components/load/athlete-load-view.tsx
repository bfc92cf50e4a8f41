"use client";

import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import { Card } from "@/components/ui/card";
import { LoadCaution } from "@/components/ui/caution";
import { fetchJson } from "@/lib/client/fetcher";
import { loadKeys } from "@/lib/client/keys";
import { Select } from "@/components/ui/field";
import type { AthleteLoadDto } from "@/lib/data/load-views";
import { addDays } from "@/lib/dates/plain-date";
import { figuresHref } from "@/lib/load/figures-link";
import { METRIC_INFO, METRICS, type LoadView, type Metric } from "@/lib/load/types";
import { FlagList } from "./flag-list";
import { LoadChart } from "./load-chart";
import { RatioChart } from "./ratio-chart";
import { Segmented } from "@/components/ui/segmented";
import { WeekTotals } from "./week-totals";

const RANGES = [4, 8, 12, 26] as const;

/** The server's default range ends with next week; keep that end and move the start back by whole weeks. */
function rangeFor(initial: AthleteLoadDto, weeks: number) {
  return { from: addDays(initial.to, -13 - 7 * weeks), to: initial.to };
}

export function AthleteLoadView({ initial }: { initial: AthleteLoadDto }) {
  const [metric, setMetric] = useState<Metric>(initial.metric);
  const [view, setView] = useState<LoadView>(initial.view);
  const [weeks, setWeeks] = useState<number>(8);
  const [showPlan, setShowPlan] = useState(true);
  const range = rangeFor(initial, weeks);
  const key = loadKeys.athlete(initial.athlete.id, { ...range, view, metric });
  const initialKey = loadKeys.athlete(initial.athlete.id, {
    from: initial.from,
    to: initial.to,
    view: initial.view,
    metric: initial.metric,
  });
  const {
    data = initial,
    error,
    isValidating,
  } = useSWR<AthleteLoadDto>(key, fetchJson, {
    fallbackData: key === initialKey ? initial : undefined,
    keepPreviousData: true,
  });
  const info = METRIC_INFO[data.metric];

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
          Metric
          <Select
            className="w-48"
            value={metric}
            onChange={(e) => setMetric(e.target.value as Metric)}
            data-testid="metric-select"
          >
            {METRICS.map((m) => (
              <option key={m} value={m}>
                {METRIC_INFO[m].label}
                {m === "sprintSteps" ? " (estimate)" : ""}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
          History
          <Select className="w-36" value={weeks} onChange={(e) => setWeeks(Number(e.target.value))}>
            {RANGES.map((w) => (
              <option key={w} value={w}>
                {w} weeks
              </option>
            ))}
          </Select>
        </label>
        <Segmented
          label="Which sessions count"
          value={view}
          onChange={setView}
          options={[
            ["actual", "Logged only"],
            ["projected", "Logged + plan"],
          ]}
        />
        <label className="flex h-10 items-center gap-2 text-sm text-ink-700">
          <input
            type="checkbox"
            checked={showPlan}
            onChange={(e) => setShowPlan(e.target.checked)}
            className="accent-lane-600"
            data-testid="show-plan"
          />
          Show planned
        </label>
      </div>
      {error ? (
        <p className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">{(error as Error).message}</p>
      ) : null}
      {/* Busy, not dimmed: text at reduced opacity falls below 4.5:1 while the figures reload. */}
      <Card className="p-4 sm:p-5" aria-busy={isValidating || undefined}>
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
          <h2 className="text-base font-semibold text-ink-900">
            {info.label} per day <span className="font-normal text-ink-500">({info.unit})</span>
          </h2>
          <p className="text-xs text-ink-500">{info.description}</p>
        </div>
        <LoadChart days={data.days} unit={info.unit} today={data.today} showPlan={showPlan} />
        <div className="mt-6 mb-2 flex flex-wrap items-baseline justify-between gap-2">
          <h2 className="text-base font-semibold text-ink-900">
            Acute:chronic ratio{" "}
            <Link href={figuresHref("acwr")} className="text-xs font-normal text-lane-700 underline">
              how it is worked out
            </Link>
          </h2>
          <p className="text-xs text-ink-500">
            {data.settings.acwrMethod === "ewma"
              ? "EWMA, 7 and 28 days"
              : data.settings.acwrMethod === "rolling_coupled"
                ? "Rolling, coupled"
                : "Rolling, uncoupled"}{" "}
            · shaded: under {data.settings.lowRatio}, comfortable, climbing from {data.settings.risingRatio}, spike from{" "}
            {data.settings.spikeRatio}
          </p>
        </div>
        <RatioChart days={data.days} settings={data.settings} today={data.today} />
        {data.days.some((d) => d.provisional && d.ratio !== null) ? (
          <p className="mt-2 text-xs text-ink-500">
            Dashed: provisional, fewer than 28 days of history behind the ratio.
          </p>
        ) : null}
      </Card>
      <div className="grid gap-5 lg:grid-cols-[1fr_1.2fr]">
        <WeekTotals week={data.week} estimated={data.settings.missingLogs === "estimate"} />
        <Card className="p-4 sm:p-5">
          <h2 className="mb-3 text-base font-semibold text-ink-900">Worth a look this week</h2>
          <FlagList flags={data.flags} />
          <h2 className="mt-5 mb-3 border-t border-ink-100 pt-4 text-base font-semibold text-ink-900">
            Next week as planned
          </h2>
          <FlagList flags={data.upcoming.flags} empty="Nothing flagged in next week's plan so far." />
        </Card>
      </div>
      <LoadCaution />
    </div>
  );
}
