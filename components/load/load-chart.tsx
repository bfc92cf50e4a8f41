"use client";

import {
  Bar,
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import type { AthleteLoadDayDto } from "@/lib/data/load-views";
import { formatNumber } from "@/lib/format/number";
import { CHART, shortDate } from "./chart-theme";

/** Daily bars of one metric (with the plan as ghost bars when asked), acute and chronic lines on top. */
export function LoadChart({
  days,
  unit,
  today,
  showPlan,
}: {
  days: AthleteLoadDayDto[];
  unit: string;
  today: string;
  showPlan: boolean;
}) {
  const fmt = (v: unknown) => (typeof v === "number" ? `${formatNumber(v, 0)} ${unit}` : String(v));
  return (
    <div className="h-72 w-full" data-testid="load-chart">
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={days} margin={{ top: 8, right: 8, bottom: 0, left: 0 }} barCategoryGap="20%">
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis
            dataKey="date"
            tickFormatter={shortDate}
            tick={{ fontSize: 11, fill: CHART.axis }}
            minTickGap={24}
            tickLine={false}
            axisLine={{ stroke: CHART.grid }}
          />
          {/* A second, hidden x axis puts the planned bar behind the day's bar instead of beside it. */}
          <XAxis xAxisId="plan" dataKey="date" hide />
          <YAxis
            tick={{ fontSize: 11, fill: CHART.axis }}
            width={44}
            tickLine={false}
            axisLine={false}
            tickFormatter={(v: number) => formatNumber(v, 0)}
          />
          <Tooltip
            formatter={fmt}
            labelFormatter={(l) => shortDate(String(l))}
            contentStyle={{ borderRadius: 8, fontSize: 12 }}
          />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          {showPlan ? (
            <Bar
              xAxisId="plan"
              dataKey="planned"
              name="Planned"
              fill={CHART.planned}
              isAnimationActive={false}
              radius={[3, 3, 0, 0]}
            />
          ) : null}
          <Bar dataKey="value" name="Day" fill={CHART.actual} isAnimationActive={false} radius={[3, 3, 0, 0]} />
          <Line
            dataKey="acute"
            name="Acute (7 d)"
            stroke={CHART.acute}
            strokeWidth={2}
            dot={false}
            type="monotone"
            isAnimationActive={false}
          />
          <Line
            dataKey="chronic"
            name="Chronic (28 d)"
            stroke={CHART.chronic}
            strokeWidth={2}
            strokeDasharray="5 3"
            dot={false}
            type="monotone"
            isAnimationActive={false}
          />
          <ReferenceLine
            x={today}
            stroke={CHART.today}
            strokeDasharray="2 2"
            label={{ value: "today", position: "insideTopRight", fontSize: 10, fill: CHART.axis }}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
