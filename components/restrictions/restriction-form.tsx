"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch, type FieldPath } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { restrictionApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { BLOCK_KIND_LABEL } from "@/lib/format/block-summary";
import { RESTRICTION_RULES, RESTRICTION_RULE_LABEL, type Restriction } from "@/lib/restrictions/rules";
import {
  RESTRICTABLE_KINDS,
  createRestrictionSchema,
  type CreateRestrictionInput,
  type RestrictionFormValues,
} from "@/lib/validations/restrictions";

const FIELDS = ["rule", "blockKinds", "maxPct", "maxContacts", "startsOn", "endsOn", "note"] as const;
/** What the physio is told about sessions planned before the restriction that break it (the coaches were sent them). */
export function conflictsLine(count: number): string {
  if (count === 0) return "";
  return ` ${count === 1 ? "1 session already planned breaks it" : `${count} sessions already planned break it`}: the coaches were told.`;
}
const emptyToNull = (v: unknown) => (v === "" || v === undefined ? null : v);

/** The physio's form: what to limit, from when to when, and a note for the coaches. Same schema as the handler. */
export function RestrictionForm({
  athleteId,
  today,
  onSaved,
}: {
  athleteId: number;
  today: string;
  onSaved: (r: Restriction) => Promise<void>;
}) {
  const [message, setMessage] = useState<string | null>(null);
  const defaults: RestrictionFormValues = { rule: "no_kind", blockKinds: [], startsOn: today, endsOn: null, note: "" };
  const { register, handleSubmit, setError, reset, control, formState } = useForm<
    RestrictionFormValues,
    unknown,
    CreateRestrictionInput
  >({
    resolver: zodResolver(createRestrictionSchema),
    defaultValues: defaults,
  });
  const rule = useWatch({ control, name: "rule" });
  const errors = formState.errors as Partial<Record<(typeof FIELDS)[number] | "root", { message?: string }>>;
  const id = (name: string) => `restriction-${athleteId}-${name}`;

  const submit = handleSubmit(async (values) => {
    setMessage(null);
    try {
      const { restriction, conflicts } = await restrictionApi.create(athleteId, values);
      reset(defaults);
      await onSaved(restriction);
      setMessage(`Saved. Coaches see it on the week plan.${conflictsLine(conflicts.length)}`);
    } catch (err) {
      if (!(err instanceof ApiError)) return setMessage("Could not save; try again");
      if (!applyServerErrors({ setError }, err, FIELDS as readonly FieldPath<RestrictionFormValues>[]))
        setMessage(err.message);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4" data-testid="restriction-form">
      <h3 className="text-sm font-semibold text-ink-900">Set a restriction</h3>
      <Field label="What to limit" htmlFor={id("rule")} error={errors.rule?.message}>
        <Select id={id("rule")} {...register("rule")}>
          {RESTRICTION_RULES.map((r) => (
            <option key={r} value={r}>
              {RESTRICTION_RULE_LABEL[r]}
            </option>
          ))}
        </Select>
      </Field>

      {rule === "no_kind" ? (
        <fieldset className="space-y-1.5" aria-describedby={errors.blockKinds ? id("blockKinds-error") : undefined}>
          <legend className="text-sm font-medium text-ink-800">Leave out</legend>
          <div className="flex flex-wrap gap-x-4 gap-y-2">
            {RESTRICTABLE_KINDS.map((k) => (
              <label key={k} className="inline-flex items-center gap-2 text-sm text-ink-800">
                <input
                  type="checkbox"
                  value={k}
                  className="h-4 w-4 rounded border-ink-300 text-lane-600"
                  data-testid={`kind-${k}`}
                  {...register("blockKinds")}
                />
                {BLOCK_KIND_LABEL[k]}
              </label>
            ))}
          </div>
          {errors.blockKinds?.message ? (
            <p id={id("blockKinds-error")} role="alert" className="text-xs font-medium text-form-error">
              {errors.blockKinds.message}
            </p>
          ) : null}
        </fieldset>
      ) : rule === "max_intensity" ? (
        <Field
          label="Running at most (% of vmax)"
          htmlFor={id("maxPct")}
          error={errors.maxPct?.message}
          hint="50 to 100"
        >
          <Input
            id={id("maxPct")}
            type="number"
            inputMode="decimal"
            min={50}
            max={100}
            step="any"
            aria-invalid={Boolean(errors.maxPct)}
            {...register("maxPct", { valueAsNumber: true })}
          />
        </Field>
      ) : (
        <Field
          label="Ground contacts per session, at most"
          htmlFor={id("maxContacts")}
          error={errors.maxContacts?.message}
          hint="0 to 500"
        >
          <Input
            id={id("maxContacts")}
            type="number"
            inputMode="numeric"
            min={0}
            max={500}
            step={1}
            aria-invalid={Boolean(errors.maxContacts)}
            {...register("maxContacts", { valueAsNumber: true })}
          />
        </Field>
      )}

      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="From" htmlFor={id("startsOn")} error={errors.startsOn?.message}>
          <Input id={id("startsOn")} type="date" aria-invalid={Boolean(errors.startsOn)} {...register("startsOn")} />
        </Field>
        <Field
          label="Until (last day)"
          htmlFor={id("endsOn")}
          error={errors.endsOn?.message}
          hint="Leave empty: until you lift it"
        >
          <Input
            id={id("endsOn")}
            type="date"
            aria-invalid={Boolean(errors.endsOn)}
            {...register("endsOn", { setValueAs: emptyToNull })}
          />
        </Field>
      </div>

      <Field
        label="Note for the coaches"
        htmlFor={id("note")}
        error={errors.note?.message}
        hint="Why, and what is still fine"
      >
        <Textarea
          id={id("note")}
          rows={3}
          aria-invalid={Boolean(errors.note)}
          placeholder="e.g. Calf tightness. Tempo and acceleration to 20 m are fine."
          {...register("note")}
        />
      </Field>

      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={formState.isSubmitting} data-testid="restriction-save">
          Save restriction
        </Button>
        <p aria-live="polite" className="text-sm text-lane-700" data-testid="restriction-form-message">
          {message}
        </p>
      </div>
    </form>
  );
}
