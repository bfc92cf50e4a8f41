"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch, type FieldPath, type Resolver } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { applyServerErrors } from "@/lib/client/form-errors";
import { speedApi } from "@/lib/client/speed";
import { SPEED_START_TYPES } from "@/lib/domain/speed";
import { normaliseTypedTrial, timingTrialCsv, typedFieldOf } from "@/lib/speed/typed-entry";
import { timingTrialSchema, type TimingTrialInput } from "@/lib/validations/speed";

const schemaResolver = zodResolver(timingTrialSchema);
/** A flying trial is checked as its zone only, any other start as its gates only. */
const resolver: Resolver<TimingTrialInput> = (values, context, options) =>
  schemaResolver(normaliseTypedTrial(values), context, options);

const optionalNumber = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));
/** An empty box: the schema answers "must be a number" until something is typed. */
const BLANK = null as unknown as number;
const GATES = [10, 20, 30, 40].map((distanceM) => ({ distanceM, timeS: BLANK }));

/**
 * One timing trial typed in: the same checks and storage as a file (the canonical CSV of what was typed is sent
 * and kept as the original), with each problem on its field.
 */
export function TypedTimingForm({
  teamId,
  athletes,
  today,
}: {
  teamId: number;
  athletes: { id: number; name: string }[];
  today: string;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState<{ athleteId: number; testId: number } | null>(null);
  const form = useForm<TimingTrialInput>({
    resolver,
    defaultValues: {
      athleteId: BLANK,
      testDate: today,
      startType: "standing",
      bodyMassKg: null,
      gates: GATES,
      flying: { lengthM: 20, timeS: BLANK },
    },
  });
  const { register, control, formState } = form;
  const gates = useFieldArray({ control, name: "gates" });
  const start = useWatch({ control, name: "startType" });
  const flying = start === "flying";
  const err = formState.errors;
  const gatesError = err.gates?.message ?? err.gates?.root?.message;

  const onSubmit = form.handleSubmit(async (values) => {
    setMessage(null);
    setSaved(null);
    const trial = normaliseTypedTrial(values);
    const athleteName = athletes.find((a) => a.id === trial.athleteId)?.name ?? "";
    const content = timingTrialCsv({ ...trial, athleteName });
    try {
      const result = await speedApi.uploadTiming(
        teamId,
        { fileName: `typed-in-${trial.testDate}.csv`, content },
        () => {},
      );
      setSaved({ athleteId: trial.athleteId, testId: result.testIds[0] });
      setMessage(`Saved the trial of ${athleteName} on ${trial.testDate}. Accept its result to use it.`);
      form.reset({ ...values, gates: values.gates.map((g) => ({ ...g, timeS: BLANK })) });
      router.refresh();
    } catch (e) {
      setMessage(e instanceof Error ? e.message : "Could not save the trial");
      applyServerErrors(form, e, (key) => typedFieldOf("timing", key, flying) as FieldPath<TimingTrialInput> | null);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" data-testid="typed-timing">
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Athlete" htmlFor="typed-athlete" error={err.athleteId?.message}>
          <Select
            id="typed-athlete"
            aria-invalid={!!err.athleteId}
            {...register("athleteId", { setValueAs: optionalNumber })}
          >
            <option value="">Choose…</option>
            {athletes.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Date" htmlFor="typed-date" error={err.testDate?.message}>
          <Input id="typed-date" type="date" max={today} aria-invalid={!!err.testDate} {...register("testDate")} />
        </Field>
        <Field label="Start" htmlFor="typed-start" error={err.startType?.message}>
          <Select id="typed-start" {...register("startType")}>
            {SPEED_START_TYPES.map((s) => (
              <option key={s} value={s}>
                {s === "flying" ? "flying (one timed zone)" : s}
              </option>
            ))}
          </Select>
        </Field>
        <Field
          label="Body mass, kg (optional)"
          htmlFor="typed-mass"
          error={err.bodyMassKg?.message}
          hint="Else the athlete's; needed for F0 and Pmax."
        >
          <Input
            id="typed-mass"
            inputMode="decimal"
            aria-invalid={!!err.bodyMassKg}
            {...register("bodyMassKg", { setValueAs: optionalNumber })}
          />
        </Field>
      </div>
      {flying ? (
        <div className="grid grid-cols-2 gap-3">
          <Field label="Zone length, m" htmlFor="typed-fly-length" error={err.flying?.lengthM?.message}>
            <Input
              id="typed-fly-length"
              inputMode="decimal"
              aria-invalid={!!err.flying?.lengthM}
              {...register("flying.lengthM", { setValueAs: optionalNumber })}
            />
          </Field>
          <Field label="Zone time, s" htmlFor="typed-fly-time" error={err.flying?.timeS?.message}>
            <Input
              id="typed-fly-time"
              inputMode="decimal"
              aria-invalid={!!err.flying?.timeS}
              {...register("flying.timeS", { setValueAs: optionalNumber })}
            />
          </Field>
        </div>
      ) : (
        <fieldset className="space-y-2">
          <legend className="text-sm font-medium text-ink-800">
            Gates: distance from the start and time from the start
          </legend>
          {gates.fields.map((g, i) => (
            <div key={g.id} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2" data-testid="typed-gate">
              <Field
                label={`Gate ${i + 1}, m`}
                htmlFor={`typed-gate-${i}-m`}
                error={err.gates?.[i]?.distanceM?.message}
              >
                <Input
                  id={`typed-gate-${i}-m`}
                  inputMode="decimal"
                  aria-invalid={!!err.gates?.[i]?.distanceM}
                  {...register(`gates.${i}.distanceM`, { setValueAs: optionalNumber })}
                />
              </Field>
              <Field label={`Gate ${i + 1}, s`} htmlFor={`typed-gate-${i}-s`} error={err.gates?.[i]?.timeS?.message}>
                <Input
                  id={`typed-gate-${i}-s`}
                  inputMode="decimal"
                  aria-invalid={!!err.gates?.[i]?.timeS}
                  {...register(`gates.${i}.timeS`, { setValueAs: optionalNumber })}
                />
              </Field>
              <Button
                variant="ghost"
                size="sm"
                className="mt-7"
                aria-label={`Remove gate ${i + 1}`}
                onClick={() => gates.remove(i)}
              >
                Remove
              </Button>
            </div>
          ))}
          {gatesError ? (
            <p role="alert" className="text-xs font-medium text-form-error">
              {gatesError}
            </p>
          ) : null}
          <Button
            variant="secondary"
            size="sm"
            disabled={gates.fields.length >= 30}
            onClick={() => gates.append({ distanceM: BLANK, timeS: BLANK })}
          >
            Add a gate
          </Button>
        </fieldset>
      )}
      <Button type="submit" disabled={formState.isSubmitting} data-testid="typed-timing-save">
        Save the trial
      </Button>
      {message ? (
        <p role="status" className="text-sm text-ink-800" data-testid="typed-timing-message">
          {message}{" "}
          {saved ? (
            <Link
              href={`/speed/${saved.athleteId}#test-${saved.testId}`}
              className="font-medium text-lane-700 underline"
            >
              See the fit
            </Link>
          ) : null}
        </p>
      ) : null}
    </form>
  );
}
