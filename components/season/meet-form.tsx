"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { Field, Input, Select } from "@/components/ui/field";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { seasonApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { MEET_PRIORITIES, type MeetPriority } from "@/lib/domain/season";
import { AudienceSelect, audienceIds, type Audience, type AudienceChoices } from "./audience-select";

type Values = { name: string; date: string; priority: MeetPriority; audience: Audience };

const PRIORITY_WORD: Record<MeetPriority, string> = {
  A: "A: the meet to peak for",
  B: "B: raced from training, some freshness",
  C: "C: a training race",
};

/** A meet on the season calendar for the whole team, one training group or one athlete. */
export function MeetForm({
  teamId,
  choices,
  onSaved,
}: {
  teamId: number;
  choices: AudienceChoices;
  onSaved: () => void;
}) {
  const form = useForm<Values>({ defaultValues: { name: "", date: "", priority: "B", audience: "team" } });
  const [message, setMessage] = useState<SaveMessage>();
  const errors = form.formState.errors;
  const onSubmit = form.handleSubmit(async (v) => {
    setMessage(undefined);
    try {
      const { audience, ...fields } = v;
      await seasonApi.createMeet(teamId, { ...fields, ...audienceIds(audience) });
      form.reset({ name: "", date: "", priority: v.priority, audience: v.audience });
      setMessage({ tone: "ok", text: "Meet added" });
      onSaved();
    } catch (e) {
      const scope = e instanceof ApiError ? (e.fields?.athleteId ?? e.fields?.groupId) : undefined;
      if (scope) form.setError("audience", { message: scope[0] });
      else if (!(e instanceof ApiError) || !applyServerErrors(form, e))
        setMessage({ tone: "error", text: e instanceof Error ? e.message : "Not saved" });
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
      <AudienceSelect
        id="meet-audience"
        choices={choices}
        registration={form.register("audience")}
        error={errors.audience?.message}
      />
      <FormSaveRow label="Add meet" saving={form.formState.isSubmitting} dirty message={message} testId="meet-save" />
    </form>
  );
}
