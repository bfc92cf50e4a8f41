"use client";

import { clsx } from "clsx";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { planApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import type { BlockInput } from "@/lib/load/types";
import type { PainReportInput } from "@/lib/validations/athlete-reports";
import { LOG_COMPLETIONS, sessionLogSchema, type SessionLogInput } from "@/lib/validations/log";
import { BlockChecklist, completedRepsOf, countableBlocks, initialDone, type BlockDone } from "./block-checklist";
import { PainFields } from "./pain-fields";
import { RpeScale } from "./rpe-scale";

type FormValues = z.input<typeof sessionLogSchema>;
export type LoggedSession = {
  completion: SessionLogInput["completion"];
  rpe: number | null;
  minutes: number | null;
  completedReps?: Record<string, number> | null;
  notes: string | null;
};

const COMPLETION_LABEL: Record<(typeof LOG_COMPLETIONS)[number], string> = {
  yes: "Did it all",
  partly: "Did part of it",
  no: "Did not train",
};
const blankToNull = (v: unknown) => (v === "" || v === null || v === undefined ? null : Number(v));

/** Whether every block was ticked with at least its prescribed reps. */
function allDone(blocks: readonly BlockInput[], done: Record<string, BlockDone>): boolean {
  return countableBlocks(blocks).every((b) => done[b.id]?.ticked && done[b.id].reps >= b.prescribed);
}

/**
 * The log sheet's form: what was done block by block (pre-filled from the plan; the load engine counts exactly
 * these reps), session RPE on CR-10, minutes, a note and any pain. Saving replaces the session's log.
 */
export function LogForm({
  sessionId,
  plannedMinutes,
  blocks,
  log,
  pain,
  onSaved,
}: {
  sessionId: number;
  plannedMinutes: number;
  blocks: readonly BlockInput[];
  log: LoggedSession | null;
  pain: PainReportInput | null;
  onSaved: () => void;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [done, setDone] = useState<Record<string, BlockDone>>(() => initialDone(blocks, log?.completedReps));
  const [painReport, setPainReport] = useState<PainReportInput | null>(pain);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const { register, handleSubmit, setError, setValue, formState, control } = useForm<
    FormValues,
    unknown,
    SessionLogInput
  >({
    resolver: zodResolver(sessionLogSchema),
    defaultValues: {
      completion: log?.completion ?? "yes",
      rpe: log?.rpe ?? null,
      minutes: log?.minutes ?? plannedMinutes,
      completedReps: null,
      notes: log?.notes ?? null,
      pain: null,
    },
  });
  const errors = formState.errors;
  const completion = useWatch({ control, name: "completion" });
  const didNotTrain = completion === "no";
  const id = (name: string) => `log-${sessionId}-${name}`;

  const changeBlocks = (next: Record<string, BlockDone>) => {
    setDone(next);
    setValue("completion", allDone(blocks, next) ? "yes" : "partly");
  };

  const submit = handleSubmit(async (values) => {
    setMessage(null);
    setFieldErrors({});
    const reps = countableBlocks(blocks).length > 0 ? completedRepsOf(done) : null;
    const body: SessionLogInput = didNotTrain
      ? { ...values, rpe: null, minutes: null, completedReps: null, pain: painReport }
      : { ...values, completedReps: reps, pain: painReport };
    try {
      await planApi.saveLog(sessionId, body);
      router.refresh();
      onSaved();
    } catch (err) {
      if (err instanceof ApiError) {
        applyServerErrors({ setError }, err, ["completion", "rpe", "minutes", "notes"]);
        setFieldErrors(Object.fromEntries(Object.entries(err.fields).map(([f, m]) => [f, m[0]])));
        setMessage(err.message);
      } else setMessage("Could not save; check your connection and try again.");
    }
  });

  return (
    <form onSubmit={submit} className="space-y-4" data-testid="log-form" noValidate>
      <fieldset>
        <legend className="text-sm font-medium text-ink-800">How did it go?</legend>
        <div className="mt-2 grid gap-2 sm:grid-cols-3">
          {LOG_COMPLETIONS.map((c) => (
            <label
              key={c}
              className={clsx(
                "flex min-h-11 cursor-pointer items-center gap-2 rounded-lg bg-paper-raised px-3 text-sm",
                "ring-1 ring-ink-200 ring-inset has-[:checked]:ring-2 has-[:checked]:ring-lane-500",
              )}
            >
              <input
                type="radio"
                value={c}
                {...register("completion")}
                className="accent-lane-600"
                data-testid={`log-completion-${c}`}
              />
              {COMPLETION_LABEL[c]}
            </label>
          ))}
        </div>
      </fieldset>
      {didNotTrain ? null : (
        <>
          <BlockChecklist
            sessionId={sessionId}
            blocks={blocks}
            done={done}
            onChange={changeBlocks}
            errors={fieldErrors}
          />
          <Controller
            control={control}
            name="rpe"
            render={({ field }) => (
              <RpeScale
                name={id("rpe")}
                value={typeof field.value === "number" ? field.value : null}
                onChange={field.onChange}
                error={errors.rpe?.message}
              />
            )}
          />
          <Field label="Minutes" htmlFor={id("minutes")} error={errors.minutes?.message}>
            <Input
              id={id("minutes")}
              type="number"
              inputMode="numeric"
              min={1}
              max={600}
              aria-invalid={Boolean(errors.minutes)}
              {...register("minutes", { setValueAs: blankToNull })}
              className="w-28"
              data-testid="log-minutes"
            />
          </Field>
        </>
      )}
      <PainFields idPrefix={id("pain")} value={painReport} onChange={setPainReport} errors={fieldErrors} />
      <Field label="Anything to tell your coach? (optional)" htmlFor={id("notes")} error={errors.notes?.message}>
        <Textarea
          id={id("notes")}
          rows={2}
          {...register("notes", { setValueAs: (v: unknown) => (typeof v === "string" && v.trim() ? v : null) })}
          data-testid="log-notes"
        />
      </Field>
      <div className="space-y-2">
        <Button type="submit" size="lg" disabled={formState.isSubmitting} className="w-full" data-testid="log-save">
          {log ? "Update my log" : "Save my log"}
        </Button>
        <p aria-live="polite" className="text-sm font-medium text-form-error" data-testid="log-status">
          {message}
        </p>
      </div>
    </form>
  );
}
