"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { Field, Input } from "@/components/ui/field";
import { speedApi } from "@/lib/client/speed";
import { applyServerErrors } from "@/lib/client/form-errors";
import { speedLabSettingsSchema, type SpeedLabSettingsInput } from "@/lib/validations/speed";

/** The team's re-test interval: weeks without a timing test before an athlete is listed as due one. */
export function RetestWeeksForm({ teamId, initial }: { teamId: number; initial: SpeedLabSettingsInput }) {
  const router = useRouter();
  const [message, setMessage] = useState<SaveMessage>();
  const { register, handleSubmit, setError, reset, formState } = useForm<SpeedLabSettingsInput>({
    resolver: zodResolver(speedLabSettingsSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting, isDirty } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    try {
      const saved = await speedApi.saveSettings(teamId, values);
      reset(saved);
      router.refresh();
      setMessage({ tone: "ok", text: `Saved: due after ${saved.retestWeeks} weeks.` });
    } catch (err) {
      applyServerErrors({ setError }, err, ["retestWeeks"]);
      setMessage({ tone: "error", text: err instanceof Error ? err.message : "Could not save" });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="mt-3 space-y-3" data-testid="retest-weeks-form">
      <Field
        label="Due a re-test after (weeks)"
        htmlFor="retestWeeks"
        error={errors.retestWeeks?.message}
        hint="1 to 52 weeks without a timing test. The coach's Today uses it too."
      >
        <Input
          id="retestWeeks"
          type="number"
          inputMode="numeric"
          min={1}
          max={52}
          step={1}
          className="max-w-28"
          aria-invalid={!!errors.retestWeeks}
          {...register("retestWeeks", { valueAsNumber: true })}
        />
      </Field>
      <FormSaveRow
        label="Save interval"
        saving={isSubmitting}
        dirty={isDirty}
        message={message}
        testId="save-retest-weeks"
      />
    </form>
  );
}
