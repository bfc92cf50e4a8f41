"use client";

import Link from "next/link";
import { useId, useState } from "react";
import { Segmented } from "@/components/ui/segmented";
import type { PlanActualDto } from "@/lib/data/plan-vs-actual";
import { figuresHref } from "@/lib/load/figures-link";
import { PLAN_ACTUAL_METRICS } from "@/lib/load/plan-vs-actual";
import { METRIC_INFO, type Metric } from "@/lib/load/types";
import { PlanActualTrend } from "./plan-actual-chart";
import { PlanActualTable } from "./plan-actual-table";

const METRIC_OPTIONS = PLAN_ACTUAL_METRICS.map((m): [Metric, string] => [m, METRIC_INFO[m].short]);

/** The week's table and the last weeks' chart, for one metric at a time (so the table fits a phone). */
export function PlanActualView({ data }: { data: PlanActualDto }) {
  const [metric, setMetric] = useState<Metric>("hsrM");
  const [who, setWho] = useState("squad");
  const selectId = useId();
  const info = METRIC_INFO[metric];
  const athlete = data.athletes.find((a) => String(a.id) === who);
  const weeks = athlete ? athlete.weeks : data.squad;
  return (
    <div className="space-y-5">
      <Segmented label="Metric compared" value={metric} onChange={setMetric} options={METRIC_OPTIONS} />
      <section aria-labelledby="pva-week" className="space-y-2">
        <h2 id="pva-week" className="text-base font-semibold text-ink-900">
          {info.label} this week, per athlete ({info.unit})
        </h2>
        <PlanActualTable data={data} metric={metric} unit={info.unit} />
        <p className="text-xs text-ink-500">
          &ldquo;Due so far&rdquo; is the plan of the days already past (and today once logged); the difference is done
          minus due so far. More than 10 % either way is marked. Logged work only: a session without a log counts
          nothing here. Metres are estimates from each athlete&apos;s tested max velocity.{" "}
          <Link href={figuresHref("plan-vs-actual")} className="font-medium text-lane-700 underline">
            How plan versus actual is worked out
          </Link>
        </p>
      </section>
      <section aria-labelledby="pva-trend" className="space-y-2">
        <div className="flex flex-wrap items-end justify-between gap-2">
          <h2 id="pva-trend" className="text-base font-semibold text-ink-900">
            Last {data.weeks.length} weeks
          </h2>
          <label htmlFor={selectId} className="flex items-center gap-2 text-sm text-ink-600">
            Show
            <select
              id={selectId}
              value={who}
              onChange={(e) => setWho(e.target.value)}
              className="rounded-lg border border-ink-200 bg-paper-raised px-2 py-1.5 text-sm text-ink-900"
              data-testid="plan-actual-who"
            >
              <option value="squad">Whole squad</option>
              {data.athletes.map((a) => (
                <option key={a.id} value={a.id}>
                  {a.name}
                </option>
              ))}
            </select>
          </label>
        </div>
        <PlanActualTrend weeks={weeks} metric={metric} unit={info.unit} />
      </section>
    </div>
  );
}
