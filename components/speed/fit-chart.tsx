"use client";

import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { CHART } from "@/components/load/chart-theme";
import { velocityAt } from "@/lib/load/sprint-model";

type Interval = { fromM: number; toM: number; seconds: number; speed: { ms: number } };

/** The fitted v(t) = vmax(1 − e^(−t/τ)) against the measured speed of each interval (at its middle time). */
export function FitChart({
  vmax,
  tau,
  intervals,
  gates,
}: {
  vmax: number;
  tau: number;
  intervals: Interval[];
  gates: { distanceM: number; timeS: number }[];
}) {
  const end = Math.max(...gates.map((g) => g.timeS), 1) * 1.05;
  const curve = Array.from({ length: 41 }, (_, i) => {
    const t = (end * i) / 40;
    return { t: Number(t.toFixed(3)), model: velocityAt(t, vmax, tau) };
  });
  // Each interval's middle time: the gate it starts from plus half its duration.
  const measured = intervals.map((iv, i) => {
    const from = i === 0 ? 0 : gates.filter((g) => g.distanceM > 0)[i - 1].timeS;
    return { t: Number((from + iv.seconds / 2).toFixed(3)), measured: iv.speed.ms };
  });
  return (
    <figure
      className="h-64 w-full"
      data-testid="fit-chart"
      aria-label={`Fitted speed curve: vmax ${vmax.toFixed(2)} m/s, τ ${tau.toFixed(2)} s`}
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid stroke={CHART.grid} vertical={false} />
          <XAxis
            dataKey="t"
            type="number"
            domain={[0, Number(end.toFixed(2))]}
            tick={{ fontSize: 11, fill: CHART.axis }}
            tickFormatter={(v: number) => `${v.toFixed(1)} s`}
            allowDuplicatedCategory={false}
          />
          <YAxis tick={{ fontSize: 11, fill: CHART.axis }} width={40} domain={[0, Math.ceil(vmax + 1)]} unit=" m/s" />
          <Tooltip formatter={(v: unknown) => (typeof v === "number" ? `${v.toFixed(2)} m/s` : String(v))} />
          <Legend wrapperStyle={{ fontSize: 12 }} />
          <Line
            data={curve}
            dataKey="model"
            name="Fitted v(t)"
            stroke={CHART.chronic}
            dot={false}
            isAnimationActive={false}
          />
          <Scatter
            data={measured}
            dataKey="measured"
            name="Measured interval"
            fill={CHART.acute}
            isAnimationActive={false}
          />
        </ComposedChart>
      </ResponsiveContainer>
    </figure>
  );
}
