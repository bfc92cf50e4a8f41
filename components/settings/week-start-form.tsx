"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { mutate } from "swr";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { Field, Select } from "@/components/ui/field";
import { loadApi } from "@/lib/client/api";
import { applyServerErrors } from "@/lib/client/form-errors";
import { WEEK_START_CHOICES, teamWeekSchema, type TeamWeekInput } from "@/lib/validations/team-week";

export function WeekStartForm({ teamId, initial }: { teamId: number; initial: TeamWeekInput }) {
  const router = useRouter();
  const [message, setMessage] = useState<SaveMessage>();
  const { register, handleSubmit, setError, reset, formState } = useForm<TeamWeekInput>({
    resolver: zodResolver(teamWeekSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting, isDirty } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    try {
      const saved = await loadApi.saveWeekStart(teamId, values);
      reset(saved);
      // Week grids, week totals, weekly change and flags are all cut at the week start.
      await mutate(() => true, undefined, { revalidate: true });
      router.refresh();
      setMessage({ tone: "ok", text: "Saved. Weeks now start on this day everywhere." });
    } catch (err) {
      applyServerErrors({ setError }, err, ["weekStartDay"]);
      setMessage({ tone: "error", text: err instanceof Error ? err.message : "Could not save" });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid="week-start-form">
      <Field
        label="Weeks start on"
        htmlFor="weekStartDay"
        error={errors.weekStartDay?.message}
        hint="The planner's week, the squad table's week totals, week-to-week change and the alerts all use it."
      >
        <Select
          id="weekStartDay"
          aria-invalid={!!errors.weekStartDay}
          data-testid="week-start-day"
          {...register("weekStartDay", { setValueAs: (v: string | number) => Number(v) })}
        >
          {WEEK_START_CHOICES.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </Select>
      </Field>
      <FormSaveRow
        label="Save week start"
        saving={isSubmitting}
        dirty={isDirty}
        message={message}
        testId="save-week-start"
      />
    </form>
  );
}
