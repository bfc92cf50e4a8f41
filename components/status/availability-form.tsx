"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldPath } from "react-hook-form";
import { conflictsLine } from "@/components/restrictions/restriction-form";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { AVAILABILITY_LABEL, AVAILABILITY_LEVELS, MODIFIED_MAX_PCT } from "@/lib/availability/levels";
import { medicalApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import {
  availabilitySchema,
  type AvailabilityFormValues,
  type AvailabilityInput,
} from "@/lib/validations/availability";

const FIELDS = ["level", "startsOn", "returnOn", "note"] as const;
const emptyToNull = (v: unknown) => (v === "" || v === undefined ? null : v);

/** The physio sets the athlete's availability; the planner checks it like a restriction from its first day. */
export function AvailabilityForm({
  athleteId,
  today,
  current,
}: {
  athleteId: number;
  today: string;
  current: AvailabilityFormValues["level"];
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const defaults: AvailabilityFormValues = { level: current, startsOn: today, returnOn: null, note: "" };
  const { register, handleSubmit, setError, reset, formState } = useForm<
    AvailabilityFormValues,
    unknown,
    AvailabilityInput
  >({ resolver: zodResolver(availabilitySchema), defaultValues: defaults });
  const errors = formState.errors;
  const id = (name: string) => `availability-${athleteId}-${name}`;
  const submit = handleSubmit(async (values) => {
    setMessage(null);
    try {
      const { availability, conflicts } = await medicalApi.setAvailability(athleteId, values);
      reset({ ...defaults, level: availability.level });
      setMessage(`Saved: ${AVAILABILITY_LABEL[availability.level]}.${conflictsLine(conflicts.length)}`);
      router.refresh();
    } catch (err) {
      if (!(err instanceof ApiError)) return setMessage("Could not save; try again");
      if (!applyServerErrors({ setError }, err, FIELDS as readonly FieldPath<AvailabilityFormValues>[]))
        setMessage(err.message);
    }
  });
  const described = (name: (typeof FIELDS)[number]) =>
    errors[name] ? { "aria-invalid": true, "aria-describedby": `${id(name)}-error` } : {};
  return (
    <form onSubmit={submit} noValidate className="space-y-4" data-testid="availability-form">
      <h3 className="text-sm font-semibold text-ink-900">Set availability</h3>
      <Field
        label="Availability"
        htmlFor={id("level")}
        error={errors.level?.message}
        hint={
          `Modified: running at most ${MODIFIED_MAX_PCT}% of vmax. Unavailable: no sessions. ` +
          "Coaches are asked for a reason to plan past it."
        }
      >
        <Select id={id("level")} {...register("level")} {...described("level")} data-testid="availability-level-input">
          {AVAILABILITY_LEVELS.map((l) => (
            <option key={l} value={l}>
              {AVAILABILITY_LABEL[l]}
            </option>
          ))}
        </Select>
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="From" htmlFor={id("startsOn")} error={errors.startsOn?.message}>
          <Input id={id("startsOn")} type="date" {...register("startsOn")} {...described("startsOn")} />
        </Field>
        <Field label="Expected back (optional)" htmlFor={id("returnOn")} error={errors.returnOn?.message}>
          <Input
            id={id("returnOn")}
            type="date"
            {...register("returnOn", { setValueAs: emptyToNull })}
            {...described("returnOn")}
          />
        </Field>
      </div>
      <Field label="Note for the coaches" htmlFor={id("note")} error={errors.note?.message}>
        <Textarea
          id={id("note")}
          rows={2}
          {...register("note")}
          {...described("note")}
          data-testid="availability-note"
        />
      </Field>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={formState.isSubmitting} data-testid="availability-save">
          Save availability
        </Button>
        {message ? (
          <p role="status" className="text-sm text-ink-700" data-testid="availability-message">
            {message}
          </p>
        ) : null}
      </div>
    </form>
  );
}
