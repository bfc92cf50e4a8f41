"use client";

import { clsx } from "clsx";
import Link from "next/link";
import { useState } from "react";
import { Segmented } from "@/components/ui/segmented";
import { shortDate } from "@/components/load/chart-theme";
import { Card } from "@/components/ui/card";
import { formatNumber } from "@/lib/format/number";
import { figuresHref } from "@/lib/load/figures-link";
import { PLAN_ACTUAL_METRICS, type PlanActualWeek } from "@/lib/load/plan-vs-actual";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import { CompletionText, DifferenceText, NUMERIC, PHONE_HIDDEN } from "./plan-actual-columns";
import { PlanActualTrend } from "./plan-actual-chart";

const METRIC_OPTIONS = PLAN_ACTUAL_METRICS.map((m): [Metric, string] => [m, METRIC_INFO[m].short]);

const COLUMNS: [string, string][] = [
  ["week", "Week of"],
  ["prescribed", "Week plan"],
  ["toDate", "Due so far"],
  ["done", "Done"],
  ["difference", "Difference"],
  ["completion", "Sessions"],
];

const cell = (id: string) =>
  clsx(
    "px-2 py-2 sm:px-3",
    NUMERIC.has(id) ? "text-right" : "text-left",
    PHONE_HIDDEN.has(id) && "hidden sm:table-cell",
  );

/** One athlete's plan versus actual week by week (newest first) and as a chart, one metric at a time. */
export function AthletePlanActual({ weeks, athleteName }: { weeks: PlanActualWeek[]; athleteName: string }) {
  const [metric, setMetric] = useState<Metric>("hsrM");
  const info = METRIC_INFO[metric];
  const newestFirst = [...weeks].reverse();
  return (
    <section aria-labelledby="athlete-pva" className="space-y-3" data-testid="athlete-plan-actual">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <h2 id="athlete-pva" className="font-semibold text-ink-950">
          Plan versus actual, last {weeks.length} weeks
        </h2>
        <Link href="/plan-vs-actual" className="text-sm font-medium text-lane-700 underline">
          The squad&apos;s week
        </Link>
      </div>
      <Segmented label="Metric compared" value={metric} onChange={setMetric} options={METRIC_OPTIONS} />
      <Card className="overflow-x-auto [contain:inline-size]">
        <table className="w-full text-sm" data-testid="athlete-plan-actual-table">
          <caption className="sr-only">
            {athleteName}: prescribed against done per week, {info.unit}
          </caption>
          <thead className="border-b border-ink-100 text-xs text-ink-500">
            <tr>
              {COLUMNS.map(([id, label]) => (
                <th key={id} scope="col" className={clsx(cell(id), "font-medium")}>
                  {label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-ink-50">
            {newestFirst.map((w) => (
              <tr key={w.weekStart} data-testid="athlete-plan-actual-week" data-week={w.weekStart}>
                <th scope="row" className={clsx(cell("week"), "font-medium whitespace-nowrap text-ink-900")}>
                  {shortDate(w.weekStart)}
                </th>
                <td className={clsx(cell("prescribed"), "text-ink-500 tabular-nums")}>
                  {formatNumber(w.prescribed[metric], 0)}
                </td>
                <td className={clsx(cell("toDate"), "tabular-nums")}>{formatNumber(w.prescribedToDate[metric], 0)}</td>
                <td className={clsx(cell("done"), "font-medium tabular-nums")} data-testid="athlete-plan-actual-done">
                  {formatNumber(w.done[metric], 0)}
                </td>
                <td className={cell("difference")}>
                  <DifferenceText f={w} m={metric} />
                </td>
                <td className={clsx(cell("completion"), "tabular-nums")}>
                  <CompletionText f={w} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </Card>
      <PlanActualTrend weeks={weeks} metric={metric} unit={info.unit} />
      <p className="text-xs text-ink-500">
        Logged work only, against the plan of the days already due; more than 10 % either way is marked.{" "}
        <Link href={figuresHref("plan-vs-actual")} className="font-medium text-lane-700 underline">
          How plan versus actual is worked out
        </Link>
      </p>
    </section>
  );
}
