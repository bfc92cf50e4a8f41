"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Field, Input } from "@/components/ui/field";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { athleteReportApi } from "@/lib/client/api";
import { applyServerErrors } from "@/lib/client/form-errors";
import type { AthleteReportSettings } from "@/lib/data/athlete-report-settings";
import { PAIN_MAX } from "@/lib/domain/wellbeing";
import { athleteReportSettingsSchema, type AthleteReportSettingsInput } from "@/lib/validations/athlete-reports";

/** The head coach's line for pain alerts to the physio and the switch for the athletes' daily check-in. */
export function AthleteReportsForm({ teamId, initial }: { teamId: number; initial: AthleteReportSettings }) {
  const router = useRouter();
  const [message, setMessage] = useState<SaveMessage>();
  const { register, handleSubmit, setError, reset, formState } = useForm<AthleteReportSettingsInput>({
    resolver: zodResolver(athleteReportSettingsSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting, isDirty } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    try {
      const { settings } = await athleteReportApi.saveSettings(teamId, values);
      reset(settings);
      router.refresh();
      setMessage({ tone: "ok", text: "Saved. New pain reports and today's check-ins follow these settings." });
    } catch (err) {
      applyServerErrors({ setError }, err, ["painAlertAbove", "checkInsEnabled"]);
      setMessage({ tone: "error", text: err instanceof Error ? err.message : "Could not save" });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid="athlete-reports-form">
      <Field
        label="Alert the physio when pain is above"
        htmlFor="painAlertAbove"
        error={errors.painAlertAbove?.message}
        hint={`On the 0–${PAIN_MAX} scale athletes use with a log: a report above this line alerts the physio.`}
      >
        <Input
          id="painAlertAbove"
          type="number"
          inputMode="numeric"
          min={0}
          max={PAIN_MAX - 1}
          step={1}
          className="max-w-24"
          aria-invalid={!!errors.painAlertAbove}
          aria-describedby={errors.painAlertAbove ? "painAlertAbove-error" : undefined}
          data-testid="pain-alert-above"
          {...register("painAlertAbove", { valueAsNumber: true })}
        />
      </Field>
      <div className="space-y-1.5">
        <label className="flex min-h-11 items-center gap-2 text-sm font-medium text-ink-800">
          <input
            type="checkbox"
            className="size-5 accent-lane-600"
            data-testid="check-ins-enabled"
            {...register("checkInsEnabled")}
          />
          Ask athletes for a daily check-in
        </label>
        <p className="text-xs text-ink-500">
          Sleep, fatigue, soreness, stress and mood on a 1–5 scale, in under 15 seconds on the athlete&apos;s phone.
        </p>
      </div>
      <FormSaveRow
        label="Save athlete reports"
        saving={isSubmitting}
        dirty={isDirty}
        message={message}
        testId="save-athlete-reports"
      />
    </form>
  );
}
