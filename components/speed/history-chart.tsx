"use client";

import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART, shortDate } from "@/components/load/chart-theme";

/** One profile value over the athlete's accepted tests. */
export function HistoryChart({
  points,
  unit,
  label,
}: {
  points: { date: string; value: number }[];
  unit: string;
  label: string;
}) {
  return (
    <figure className="h-36 w-full" aria-label={`${label} at each accepted test`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 6, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis dataKey="date" tickFormatter={shortDate} tick={{ fontSize: 11, fill: CHART.axis }} />
          <YAxis tick={{ fontSize: 11, fill: CHART.axis }} width={44} domain={["auto", "auto"]} />
          <Tooltip
            labelFormatter={(l) => shortDate(String(l))}
            formatter={(v: unknown) => (typeof v === "number" ? `${v.toFixed(2)} ${unit}` : String(v))}
          />
          <Line dataKey="value" name={label} stroke={CHART.actual} strokeWidth={2} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
