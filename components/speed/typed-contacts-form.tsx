"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, type FieldPath } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { applyServerErrors } from "@/lib/client/form-errors";
import { speedApi } from "@/lib/client/speed";
import { contactRowsCsv, typedFieldOf } from "@/lib/speed/typed-entry";
import { typedContactsSchema, type TypedContactsInput } from "@/lib/validations/speed";

const optionalNumber = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));
/** An empty box: the schema answers "must be a number" until something is typed. */
const BLANK = null as unknown as number;
const EMPTY_ROW = { contactTimeS: BLANK, flightTimeS: BLANK, stepLengthM: null };

/**
 * Contact measurements typed in (a contact mat's or optical system's read-out): the same checks and storage as
 * a contacts file, whose canonical CSV is sent and kept as the original.
 */
export function TypedContactsForm({ teamId, athleteId, today }: { teamId: number; athleteId: number; today: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const form = useForm<TypedContactsInput>({
    resolver: zodResolver(typedContactsSchema),
    defaultValues: { testDate: today, rows: [EMPTY_ROW, EMPTY_ROW] },
  });
  const { register, control, formState } = form;
  const rows = useFieldArray({ control, name: "rows" });
  const err = formState.errors;
  const rowsError = err.rows?.message ?? err.rows?.root?.message;

  const onSubmit = form.handleSubmit(async (values) => {
    setMessage(null);
    try {
      await speedApi.uploadMeasure(
        teamId,
        {
          kind: "contacts",
          fileName: `typed-in-contacts-${values.testDate}.csv`,
          content: contactRowsCsv(values.rows),
          athleteId,
          testDate: values.testDate,
          plannedSessionId: null,
          bodyMassKg: null,
        },
        () => {},
      );
      setMessage(`Saved ${values.rows.length} contact${values.rows.length === 1 ? "" : "s"} of ${values.testDate}.`);
      form.reset({ testDate: values.testDate, rows: [EMPTY_ROW, EMPTY_ROW] });
      router.refresh();
    } catch (e) {
      setMessage(e instanceof Error ? e.message : "Could not save the contacts");
      applyServerErrors(form, e, (key) => typedFieldOf("contacts", key) as FieldPath<TypedContactsInput> | null);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" data-testid="typed-contacts">
      <Field label="Date" htmlFor="typed-contacts-date" error={err.testDate?.message}>
        <Input
          id="typed-contacts-date"
          type="date"
          max={today}
          aria-invalid={!!err.testDate}
          {...register("testDate")}
        />
      </Field>
      <fieldset className="space-y-2">
        <legend className="text-sm font-medium text-ink-800">One line per contact</legend>
        {rows.fields.map((r, i) => {
          const e = err.rows?.[i];
          return (
            <div key={r.id} className="grid grid-cols-3 items-start gap-2" data-testid="typed-contact">
              <Field label={`${i + 1}: contact, s`} htmlFor={`typed-c-${i}-contact`} error={e?.contactTimeS?.message}>
                <Input
                  id={`typed-c-${i}-contact`}
                  inputMode="decimal"
                  aria-invalid={!!e?.contactTimeS}
                  {...register(`rows.${i}.contactTimeS`, { setValueAs: optionalNumber })}
                />
              </Field>
              <Field label="flight, s" htmlFor={`typed-c-${i}-flight`} error={e?.flightTimeS?.message}>
                <Input
                  id={`typed-c-${i}-flight`}
                  inputMode="decimal"
                  aria-invalid={!!e?.flightTimeS}
                  {...register(`rows.${i}.flightTimeS`, { setValueAs: optionalNumber })}
                />
              </Field>
              <Field label="step, m (optional)" htmlFor={`typed-c-${i}-step`} error={e?.stepLengthM?.message}>
                <Input
                  id={`typed-c-${i}-step`}
                  inputMode="decimal"
                  aria-invalid={!!e?.stepLengthM}
                  {...register(`rows.${i}.stepLengthM`, { setValueAs: optionalNumber })}
                />
              </Field>
            </div>
          );
        })}
        {rowsError ? (
          <p role="alert" className="text-xs font-medium text-form-error">
            {rowsError}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-2">
          <Button
            variant="secondary"
            size="sm"
            disabled={rows.fields.length >= 200}
            onClick={() => rows.append(EMPTY_ROW)}
          >
            Add a contact
          </Button>
          <Button
            variant="ghost"
            size="sm"
            disabled={rows.fields.length <= 1}
            onClick={() => rows.remove(rows.fields.length - 1)}
          >
            Remove the last
          </Button>
        </div>
      </fieldset>
      <Button type="submit" disabled={formState.isSubmitting} data-testid="typed-contacts-save">
        Save the contacts
      </Button>
      {message ? (
        <p role="status" className="text-sm text-ink-800" data-testid="typed-contacts-message">
          {message}
        </p>
      ) : null}
    </form>
  );
}
