"use client";

import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { CHART } from "@/components/load/chart-theme";

/** A speed trace as recorded (thinned for drawing), with the team's HSR line and the athlete's near-max line. */
export function TraceChart({
  points,
  hsrLineMs,
  nearMaxLineMs,
}: {
  points: { t: number; v: number }[];
  hsrLineMs: number;
  nearMaxLineMs: number;
}) {
  const peak = Math.max(...points.map((p) => p.v), nearMaxLineMs);
  return (
    <figure
      className="h-56 w-full"
      data-testid="trace-chart"
      aria-label="Speed over time, with the HSR and near-max lines"
    >
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis
            dataKey="t"
            type="number"
            domain={["dataMin", "dataMax"]}
            tick={{ fontSize: 11, fill: CHART.axis }}
            tickFormatter={(v: number) => `${v.toFixed(0)} s`}
          />
          <YAxis tick={{ fontSize: 11, fill: CHART.axis }} width={44} domain={[0, Math.ceil(peak + 0.5)]} unit=" m/s" />
          <Tooltip formatter={(v: unknown) => (typeof v === "number" ? `${v.toFixed(2)} m/s` : String(v))} />
          <ReferenceLine y={hsrLineMs} stroke={CHART.chronic} strokeDasharray="4 3" />
          <ReferenceLine y={nearMaxLineMs} stroke={CHART.acute} strokeDasharray="2 2" />
          <Line
            dataKey="v"
            name="Speed"
            stroke={CHART.actual}
            dot={false}
            strokeWidth={1.5}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
