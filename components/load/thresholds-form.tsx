"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState, type ReactNode } from "react";
import { useForm, useWatch, type FieldPath } from "react-hook-form";
import { mutate } from "swr";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { Field, Input, Select } from "@/components/ui/field";
import { loadApi } from "@/lib/client/api";
import { applyServerErrors } from "@/lib/client/form-errors";
import { loadKeys } from "@/lib/client/keys";
import { METRIC_INFO, METRICS, RECOVERY_WORK, type RecoveryWork, type TeamLoadSettings } from "@/lib/load/types";
import {
  teamSettingsSchema,
  type TeamSettingsFormValues,
  type TeamSettingsInput,
} from "@/lib/validations/team-settings";

const METHODS: [TeamLoadSettings["acwrMethod"], string, string][] = [
  ["ewma", "EWMA (default)", "Exponentially weighted, 7 and 28 days (Williams et al. 2017)."],
  ["rolling_coupled", "Rolling, coupled", "7-day mean ÷ 28-day mean including this week (Hulin et al. 2016)."],
  ["rolling_uncoupled", "Rolling, uncoupled", "7-day mean ÷ mean of the three weeks before (Lolli et al. 2019)."],
];

type NumberField = Exclude<
  keyof TeamSettingsInput,
  "acwrMethod" | "acwrMetric" | "speedZones" | "recoveryWork" | "missingLogs"
>;

const RECOVERY_LABELS: Record<RecoveryWork, string> = {
  max_velocity: "Max-velocity blocks",
  max_acceleration: "Accelerations at or above the maximal line",
  speed_endurance: "Speed-endurance blocks",
  high_plyo: "High-intensity plyometrics",
};
const NUMBER_FIELDS: {
  name: NumberField;
  section: "speed" | "ratio" | "week";
  label: string;
  unit: string;
  step: string;
  hint: string;
}[] = [
  {
    name: "hsrSpeedMs",
    section: "speed",
    label: "High-speed running from",
    unit: "m/s",
    step: "0.1",
    hint: "5.5 m/s = 19.8 km/h, the usual HSR line (Bradley et al. 2009).",
  },
  {
    name: "sprintSpeedMs",
    section: "speed",
    label: "Sprinting from",
    unit: "m/s",
    step: "0.1",
    hint: "7.0 m/s = 25.2 km/h (Bradley et al. 2009); shown next to the relative bands.",
  },
  {
    name: "hsrPct",
    section: "speed",
    label: "Relative high-speed running from",
    unit: "% of vmax",
    step: "1",
    hint: "Used for HSR when the zones are relative to each athlete.",
  },
  {
    name: "nearMaxPct",
    section: "speed",
    label: "Near-max from",
    unit: "% of vmax",
    step: "1",
    hint: "Share of each athlete's own tested max velocity.",
  },
  {
    name: "maximalPct",
    section: "speed",
    label: "Maximal from",
    unit: "% of vmax",
    step: "1",
    hint: "Malone et al. 2017 counted exposures above 95% of max velocity.",
  },
  {
    name: "spikeRatio",
    section: "ratio",
    label: "Spike at or above",
    unit: "ratio",
    step: "0.05",
    hint: "Gabbett 2016 calls ≥ 1.5 the danger zone.",
  },
  {
    name: "risingRatio",
    section: "ratio",
    label: "Climbing at or above",
    unit: "ratio",
    step: "0.05",
    hint: "Top of the 0.8–1.3 comfortable range.",
  },
  {
    name: "lowRatio",
    section: "ratio",
    label: "Underloaded below",
    unit: "ratio",
    step: "0.05",
    hint: "Bottom of the comfortable range.",
  },
  {
    name: "weeklyChangeLimitPct",
    section: "week",
    label: "Weekly increase limit",
    unit: "%",
    step: "1",
    hint: "More than this on last week is flagged (Harrison & Johnston 2017).",
  },
  {
    name: "recoveryHours",
    section: "week",
    label: "Hours between hard sessions",
    unit: "h",
    step: "1",
    hint: "Sessions with the work ticked below; NSCA suggests 48–72 h between plyometric sessions.",
  },
  {
    name: "monotonyLimit",
    section: "week",
    label: "Monotony above",
    unit: "mean ÷ SD",
    step: "0.1",
    hint: "Foster's weekly sRPE monotony; above 2.0 is the usual warning.",
  },
];

function Section({ title, lead, children }: { title: string; lead: string; children: ReactNode }) {
  return (
    <fieldset className="border-t border-ink-100 pt-4 first:border-t-0 first:pt-0">
      <legend className="sr-only">{title}</legend>
      <h2 className="text-sm font-semibold text-ink-900" aria-hidden>
        {title}
      </h2>
      <p className="mb-3 text-xs text-ink-500">{lead}</p>
      <div className="grid gap-4 sm:grid-cols-2">{children}</div>
    </fieldset>
  );
}

export function ThresholdsForm({ teamId, initial }: { teamId: number; initial: TeamLoadSettings }) {
  const [message, setMessage] = useState<SaveMessage>();
  const { register, handleSubmit, setError, reset, formState, control } = useForm<
    TeamSettingsFormValues,
    unknown,
    TeamSettingsInput
  >({
    resolver: zodResolver(teamSettingsSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting, isDirty } = formState;
  const method = useWatch({ control, name: "acwrMethod" });
  const field = (f: (typeof NUMBER_FIELDS)[number]) => (
    <Field key={f.name} label={`${f.label} (${f.unit})`} htmlFor={f.name} error={errors[f.name]?.message} hint={f.hint}>
      <Input
        id={f.name}
        type="number"
        inputMode="decimal"
        step={f.step}
        aria-invalid={!!errors[f.name]}
        {...register(f.name)}
      />
    </Field>
  );

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    try {
      const { settings } = await loadApi.saveSettings(teamId, values);
      reset(settings);
      // Every load answer depends on these thresholds.
      await mutate(loadKeys.isLoad, undefined, { revalidate: true });
      setMessage({ tone: "ok", text: "Saved. Flags and ratios now use these thresholds." });
    } catch (err) {
      applyServerErrors({ setError }, err, Object.keys(initial) as FieldPath<TeamSettingsFormValues>[]);
      setMessage({ tone: "error", text: err instanceof Error ? err.message : "Could not save" });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6" data-testid="thresholds-form">
      <Section
        title="Speed lines"
        lead={
          "Running at or above these speeds counts towards HSR and near-max metres. " +
          "Both kinds of band are shown in the squad table; the choice below decides which HSR line feeds the flags."
        }
      >
        <Field
          label="HSR zones"
          htmlFor="speedZones"
          error={errors.speedZones?.message}
          hint="Relative zones follow each athlete's own tested vmax; absolute ones compare everyone with one speed."
        >
          <Select id="speedZones" {...register("speedZones")} data-testid="speed-zones">
            <option value="absolute">Absolute (m/s, team-sport convention)</option>
            <option value="relative">Relative (% of each athlete&apos;s vmax)</option>
          </Select>
        </Field>
        {NUMBER_FIELDS.filter((f) => f.section === "speed").map(field)}
      </Section>
      <Section title="Acute:chronic ratio" lead="How the ratio is worked out, and the zones that raise a flag.">
        <Field
          label="Method"
          htmlFor="acwrMethod"
          error={errors.acwrMethod?.message}
          hint={METHODS.find((m) => m[0] === method)?.[2]}
        >
          <Select id="acwrMethod" {...register("acwrMethod")}>
            {METHODS.map(([v, label]) => (
              <option key={v} value={v}>
                {label}
              </option>
            ))}
          </Select>
        </Field>
        <Field
          label="Judged on"
          htmlFor="acwrMetric"
          error={errors.acwrMetric?.message}
          hint="The metric whose ratio raises spike, climbing and underloaded flags."
        >
          <Select id="acwrMetric" {...register("acwrMetric")}>
            {METRICS.map((m) => (
              <option key={m} value={m}>
                {METRIC_INFO[m].label}
              </option>
            ))}
          </Select>
        </Field>
        {NUMBER_FIELDS.filter((f) => f.section === "ratio").map(field)}
      </Section>
      <Section title="Week to week" lead="Jumps in weekly load and hard sessions too close together.">
        {NUMBER_FIELDS.filter((f) => f.section === "week").map(field)}
        <fieldset className="sm:col-span-2">
          <legend className="text-sm font-medium text-ink-800">Work that needs the recovery window</legend>
          <div className="mt-2 grid gap-2 sm:grid-cols-2">
            {RECOVERY_WORK.map((w) => (
              <label key={w} className="flex items-center gap-2 text-sm text-ink-700">
                <input
                  type="checkbox"
                  value={w}
                  {...register("recoveryWork")}
                  className="accent-lane-600"
                  data-testid={`recovery-${w}`}
                />
                {RECOVERY_LABELS[w]}
              </label>
            ))}
          </div>
          {errors.recoveryWork ? (
            <p role="alert" className="mt-1 text-xs font-medium text-form-error">
              {errors.recoveryWork.message}
            </p>
          ) : null}
        </fieldset>
        <Field
          label="Sessions nobody logged"
          htmlFor="missingLogs"
          error={errors.missingLogs?.message}
          hint="A published past session without a log is never a rest day; it is marked wherever it shows."
        >
          <Select id="missingLogs" {...register("missingLogs")}>
            <option value="estimate">Count the plan as an estimate (default)</option>
            <option value="exclude">Leave the day out</option>
          </Select>
        </Field>
      </Section>
      <FormSaveRow
        label="Save thresholds"
        saving={isSubmitting}
        dirty={isDirty}
        message={message}
        testId="save-thresholds"
      />
    </form>
  );
}
