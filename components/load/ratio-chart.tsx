"use client";

import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceArea,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import type { AthleteLoadDayDto } from "@/lib/data/load-views";
import { formatRatio } from "@/lib/load/format";
import type { TeamLoadSettings } from "@/lib/load/types";
import { CHART, shortDate } from "./chart-theme";

/** The acute:chronic ratio with the team's zones shaded (Gabbett 2016 bands, thresholds from team settings). */
export function RatioChart({
  days,
  settings,
  today,
}: {
  days: AthleteLoadDayDto[];
  settings: TeamLoadSettings;
  today: string;
}) {
  const highest = days.reduce((m, d) => (d.ratio !== null && d.ratio > m ? d.ratio : m), 0);
  const top = Math.max(2, Math.ceil((highest + 0.1) * 4) / 4);
  // Ratios on under 28 days of history are drawn dashed; the two series share the joining day so the line is unbroken.
  const data = days.map((d, i) => {
    const next = days[i + 1];
    const settled = d.provisional ? null : d.ratio;
    const early = d.provisional || (next?.provisional ?? false) ? d.ratio : null;
    return { date: d.date, settled, early };
  });
  return (
    <div className="h-52 w-full" data-testid="ratio-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <ReferenceArea y1={0} y2={settings.lowRatio} fill={CHART.zones.low} fillOpacity={0.9} ifOverflow="hidden" />
          <ReferenceArea
            y1={settings.lowRatio}
            y2={settings.risingRatio}
            fill={CHART.zones.steady}
            fillOpacity={0.9}
            ifOverflow="hidden"
          />
          <ReferenceArea
            y1={settings.risingRatio}
            y2={settings.spikeRatio}
            fill={CHART.zones.rising}
            fillOpacity={0.9}
            ifOverflow="hidden"
          />
          <ReferenceArea
            y1={settings.spikeRatio}
            y2={top}
            fill={CHART.zones.spike}
            fillOpacity={0.9}
            ifOverflow="hidden"
          />
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis
            dataKey="date"
            tickFormatter={shortDate}
            tick={{ fontSize: 11, fill: CHART.axis }}
            minTickGap={24}
            tickLine={false}
            axisLine={{ stroke: CHART.grid }}
          />
          <YAxis
            domain={[0, top]}
            tick={{ fontSize: 11, fill: CHART.axis }}
            width={44}
            tickLine={false}
            axisLine={false}
            tickFormatter={(v: number) => v.toFixed(1)}
          />
          <Tooltip
            formatter={(v) => (typeof v === "number" ? formatRatio(v) : "no ratio")}
            labelFormatter={(l) => shortDate(String(l))}
            contentStyle={{ borderRadius: 8, fontSize: 12 }}
          />
          <Line
            dataKey="settled"
            name="ACWR"
            stroke={CHART.ratio}
            strokeWidth={2}
            dot={false}
            connectNulls={false}
            isAnimationActive={false}
          />
          <Line
            dataKey="early"
            name="ACWR (provisional)"
            stroke={CHART.ratio}
            strokeOpacity={0.5}
            strokeDasharray="4 3"
            strokeWidth={2}
            dot={false}
            connectNulls={false}
            isAnimationActive={false}
          />
          <ReferenceLine x={today} stroke={CHART.today} strokeDasharray="2 2" />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
