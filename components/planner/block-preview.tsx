"use client";

import { useWatch } from "react-hook-form";
import { sessionMetrics } from "@/lib/load/session-metrics";
import type { AthleteProfile, TeamLoadSettings } from "@/lib/load/types";
import { formatNumber } from "@/lib/format/number";
import { toBlockInput } from "@/lib/plan/blocks";
import { templateSchema } from "@/lib/validations/template";

type Props = { profile: AthleteProfile & { tested: boolean }; settings: TeamLoadSettings };

/** What the template adds for the squad's typical athlete, recomputed on every keystroke with lib/load. */
export function BlockLoadPreview({ profile, settings }: Props) {
  const values: unknown = useWatch();
  const parsed = templateSchema.safeParse(values);
  if (!parsed.success) {
    return (
      <p className="text-xs text-ink-500" data-testid="template-preview-pending">
        Complete the fields to see what this block adds.
      </p>
    );
  }
  const t = parsed.data;
  const m = sessionMetrics(
    {
      id: "preview",
      date: "2000-01-03",
      startTime: "16:00",
      durationMin: t.durationMin,
      plannedRpe: t.plannedRpe,
      status: "draft",
      blocks: [toBlockInput(t)],
    },
    profile,
    settings,
  );
  const rows: [string, string, string][] = [
    ["HSR", `${formatNumber(m.metrics.hsrM, 0)} m`, `at or above ${formatNumber(settings.hsrSpeedMs)} m/s`],
    [
      "Near-max",
      `${formatNumber(m.metrics.nearMaxM, 0)} m`,
      `at or above ${formatNumber(settings.nearMaxPct)}% of vmax`,
    ],
    ["Sprint steps", formatNumber(m.metrics.sprintSteps, 0), "estimate from step length"],
    [
      "Contacts",
      `${formatNumber(m.contactsByIntensity.total, 0)}`,
      `low ${m.contactsByIntensity.low} · moderate ${m.contactsByIntensity.moderate} · high ${m.contactsByIntensity.high}`,
    ],
    [
      "sRPE",
      `${formatNumber(m.metrics.srpe, 0)} AU`,
      `RPE ${formatNumber(t.plannedRpe)} × ${t.durationMin} min (Foster 2001)`,
    ],
  ];
  return (
    <div data-testid="template-preview" className="rounded-lg bg-paper-sunk/70 p-3">
      <p className="mb-2 text-xs text-ink-600">
        For a typical athlete of the squad: vmax {formatNumber(profile.vmax ?? 0, 2)} m/s, τ{" "}
        {formatNumber(profile.tau ?? 0, 2)} s, step {formatNumber(profile.stepLengthM ?? 0, 2)} m
        {profile.tested ? " (squad medians)" : " (defaults: nobody tested yet)"}.
      </p>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1.5 sm:grid-cols-5">
        {rows.map(([label, value, note]) => (
          <div key={label} data-testid={`preview-${label.toLowerCase().replace(/[^a-z]+/g, "-")}`}>
            <dt className="text-2xs tracking-wider text-ink-500 uppercase">{label}</dt>
            <dd className="text-sm font-semibold text-ink-900 tabular-nums">{value}</dd>
            <dd className="text-2xs leading-4 text-ink-500">{note}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
