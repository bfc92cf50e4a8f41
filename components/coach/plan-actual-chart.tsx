"use client";

import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART, shortDate } from "@/components/load/chart-theme";
import { Card } from "@/components/ui/card";
import { formatNumber } from "@/lib/format/number";
import type { PlanActualWeek } from "@/lib/load/plan-vs-actual";
import type { Metric } from "@/lib/load/types";

/** Prescribed (to date) against done, one pair of bars per week. */
function PlanActualChart({ weeks, metric, unit }: { weeks: PlanActualWeek[]; metric: Metric; unit: string }) {
  const data = weeks.map((w) => ({
    week: w.weekStart,
    prescribed: w.prescribedToDate[metric],
    done: w.done[metric],
  }));
  const fmt = (v: unknown) => (typeof v === "number" ? `${formatNumber(v, 0)} ${unit}` : String(v));
  return (
    <div className="h-64 w-full" data-testid="plan-actual-chart">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={data} margin={{ top: 8, right: 4, bottom: 0, left: 0 }} barCategoryGap="18%">
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis
            dataKey="week"
            tickFormatter={shortDate}
            tick={{ fontSize: 11, fill: CHART.axis }}
            tickLine={false}
            axisLine={{ stroke: CHART.grid }}
            interval="preserveStartEnd"
          />
          <YAxis
            tick={{ fontSize: 11, fill: CHART.axis }}
            width={48}
            tickLine={false}
            axisLine={false}
            tickFormatter={(v: number) => formatNumber(v, 0)}
          />
          <Tooltip
            formatter={fmt}
            labelFormatter={(l) => `Week of ${shortDate(String(l))}`}
            contentStyle={{ borderRadius: 8, fontSize: 12 }}
          />
          {/* Legend words in the axis ink: the plan's bar colour is too light to read as text. */}
          <Legend wrapperStyle={{ fontSize: 12 }} formatter={(v) => <span style={{ color: CHART.axis }}>{v}</span>} />
          <Bar dataKey="prescribed" name="Prescribed (due)" fill={CHART.planned} isAnimationActive={false} />
          <Bar dataKey="done" name="Done" fill={CHART.actual} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}

/** The chart in its card, with the same figures as a list for screen readers. */
export function PlanActualTrend({ weeks, metric, unit }: { weeks: PlanActualWeek[]; metric: Metric; unit: string }) {
  return (
    <Card className="p-3 sm:p-4">
      <PlanActualChart weeks={weeks} metric={metric} unit={unit} />
      <ul className="sr-only">
        {weeks.map((w) => (
          <li key={w.weekStart}>
            Week of {shortDate(w.weekStart)}: {formatNumber(w.done[metric], 0)} {unit} done of{" "}
            {formatNumber(w.prescribedToDate[metric], 0)} due
          </li>
        ))}
      </ul>
    </Card>
  );
}
