"use client";

import { clsx } from "clsx";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { planApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import type { BlockInput } from "@/lib/load/types";
import { LOG_COMPLETIONS, sessionLogSchema, type SessionLogInput } from "@/lib/validations/log";
import { BlockChecklist, completedRepsOf, initialDone, type BlockDone } from "./block-checklist";

type FormValues = z.input<typeof sessionLogSchema>;
type Log = {
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

/**
 * What the athlete did in one session: completion, the blocks (and reps) done when only part of it was done,
 * session RPE (CR-10), minutes and a note. Per-block reps replace the engine's "half of every block" default.
 */
export function SessionLogForm({
  sessionId,
  plannedMinutes,
  blocks = [],
  log,
}: {
  sessionId: number;
  plannedMinutes: number;
  blocks?: readonly BlockInput[];
  log: Log | null;
}) {
  const router = useRouter();
  const [saved, setSaved] = useState<string | null>(null);
  const [done, setDone] = useState<Record<string, BlockDone>>(() => initialDone(blocks, log?.completedReps));
  const [blockErrors, setBlockErrors] = useState<Record<string, string>>({});
  const { register, handleSubmit, setError, formState, control } = useForm<FormValues, unknown, SessionLogInput>({
    resolver: zodResolver(sessionLogSchema),
    defaultValues: {
      completion: log?.completion ?? "yes",
      rpe: log?.rpe ?? null,
      minutes: log?.minutes ?? plannedMinutes,
      completedReps: null,
      notes: log?.notes ?? null,
    },
  });
  const errors = formState.errors;
  const completion = useWatch({ control, name: "completion" });
  const didNotTrain = completion === "no";
  const id = (name: string) => `log-${sessionId}-${name}`;

  const submit = handleSubmit(async (values) => {
    setSaved(null);
    setBlockErrors({});
    const partly = values.completion === "partly" ? { completedReps: completedRepsOf(done) } : { completedReps: null };
    const body: SessionLogInput = didNotTrain
      ? { ...values, rpe: values.rpe ?? 0, minutes: null }
      : { ...values, ...partly };
    try {
      await planApi.saveLog(sessionId, body);
      setSaved("Saved. Thank you!");
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError) {
        applyServerErrors({ setError }, err, ["completion", "rpe", "minutes", "notes"]);
        setBlockErrors(
          Object.fromEntries(
            Object.entries(err.fields)
              .filter(([f]) => f.startsWith("completedReps"))
              .map(([f, m]) => [f, m[0]]),
          ),
        );
        setSaved(err.message);
      } else setSaved("Could not save; check your connection and try again.");
    }
  });

  return (
    <form
      onSubmit={submit}
      className="mt-4 space-y-4 rounded-lg bg-paper-sunk p-3 sm:p-4"
      data-testid="log-form"
      noValidate
    >
      <fieldset>
        <legend className="text-sm font-medium text-ink-800">How did it go?</legend>
        <div className="mt-2 grid gap-2 sm:grid-cols-3">
          {LOG_COMPLETIONS.map((c) => (
            <label
              key={c}
              className={clsx(
                "flex cursor-pointer items-center gap-2 rounded-lg bg-paper-raised px-3 py-3 text-sm",
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
        {errors.completion ? (
          <p role="alert" className="mt-1 text-xs font-medium text-flag-spike">
            {errors.completion.message}
          </p>
        ) : null}
      </fieldset>
      {completion === "partly" ? (
        <BlockChecklist sessionId={sessionId} blocks={blocks} done={done} onChange={setDone} errors={blockErrors} />
      ) : null}
      {didNotTrain ? null : (
        <div className="grid grid-cols-2 gap-3">
          <Field
            label="Effort (RPE 0–10)"
            htmlFor={id("rpe")}
            error={errors.rpe?.message}
            hint="How hard the whole session felt, about 30 min after."
          >
            <Input
              id={id("rpe")}
              type="number"
              inputMode="decimal"
              min={0}
              max={10}
              step={0.5}
              aria-invalid={Boolean(errors.rpe)}
              {...register("rpe", { setValueAs: blankToNull })}
              data-testid="log-rpe"
            />
          </Field>
          <Field label="Minutes" htmlFor={id("minutes")} error={errors.minutes?.message}>
            <Input
              id={id("minutes")}
              type="number"
              inputMode="numeric"
              min={1}
              max={600}
              aria-invalid={Boolean(errors.minutes)}
              {...register("minutes", { setValueAs: blankToNull })}
              data-testid="log-minutes"
            />
          </Field>
        </div>
      )}
      <Field label="Anything to tell your coach? (optional)" htmlFor={id("notes")} error={errors.notes?.message}>
        <Textarea
          id={id("notes")}
          rows={2}
          {...register("notes", { setValueAs: (v: unknown) => (typeof v === "string" && v.trim() ? v : null) })}
          data-testid="log-notes"
        />
      </Field>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={formState.isSubmitting} className="w-full sm:w-auto" data-testid="log-save">
          {log ? "Update my log" : "Save my log"}
        </Button>
        <p aria-live="polite" className="text-sm text-lane-700" data-testid="log-status">
          {saved}
        </p>
      </div>
    </form>
  );
}
