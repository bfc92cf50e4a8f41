"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { seasonApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { MEET_PRIORITIES, type MeetPriority } from "@/lib/domain/season";

type Values = { name: string; date: string; priority: MeetPriority };

const PRIORITY_WORD: Record<MeetPriority, string> = {
  A: "A: the meet to peak for",
  B: "B: raced from training, some freshness",
  C: "C: a training race",
};

/** A meet on the season calendar for the whole team. */
export function MeetForm({ teamId, onSaved }: { teamId: number; onSaved: () => void }) {
  const form = useForm<Values>({ defaultValues: { name: "", date: "", priority: "B" } });
  const [message, setMessage] = useState<string | null>(null);
  const errors = form.formState.errors;
  const onSubmit = form.handleSubmit(async (v) => {
    setMessage(null);
    try {
      await seasonApi.createMeet(teamId, { ...v, groupId: null, athleteId: null });
      form.reset({ name: "", date: "", priority: v.priority });
      setMessage("Meet added");
      onSaved();
    } catch (e) {
      if (!(e instanceof ApiError) || !applyServerErrors(form, e))
        setMessage(e instanceof Error ? e.message : "Not saved");
    }
  });
  return (
    <form onSubmit={onSubmit} className="space-y-3" aria-labelledby="meet-form-title" data-testid="meet-form">
      <h3 id="meet-form-title" className="text-sm font-semibold text-ink-900">
        Add a meet
      </h3>
      <Field label="Meet" htmlFor="meet-name" error={errors.name?.message}>
        <Input id="meet-name" {...form.register("name")} aria-invalid={!!errors.name} />
      </Field>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Date" htmlFor="meet-date" error={errors.date?.message}>
          <Input id="meet-date" type="date" {...form.register("date")} aria-invalid={!!errors.date} />
        </Field>
        <Field label="Priority" htmlFor="meet-priority" error={errors.priority?.message}>
          <Select id="meet-priority" {...form.register("priority")}>
            {MEET_PRIORITIES.map((p) => (
              <option key={p} value={p}>
                {PRIORITY_WORD[p]}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={form.formState.isSubmitting}>
          Add meet
        </Button>
        {message ? (
          <p role="status" className="text-xs text-ink-700">
            {message}
          </p>
        ) : null}
      </div>
    </form>
  );
}
