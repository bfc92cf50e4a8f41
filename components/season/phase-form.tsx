"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import { FormSaveRow, type SaveMessage } from "@/components/ui/form-save-row";
import { applyServerErrors } from "@/lib/client/form-errors";
import { seasonApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { SEASON_PHASE_KINDS, SEASON_PHASE_LABELS, TARGET_METRICS, type TargetMetric } from "@/lib/domain/season";
import { AudienceSelect, audienceIds, type Audience, type AudienceChoices } from "./audience-select";

type Range = { min: string; max: string };
type Values = {
  kind: (typeof SEASON_PHASE_KINDS)[number];
  name: string;
  startsOn: string;
  endsOn: string;
  goal: string;
  audience: Audience;
  targets: Record<TargetMetric, Range>;
};

const TARGET_NAME: Record<TargetMetric, string> = {
  hsrM: "HSR metres",
  nearMaxM: "Near-max metres",
  contacts: "Plyometric contacts",
  srpe: "sRPE (AU)",
};

const blankTargets = () =>
  Object.fromEntries(TARGET_METRICS.map((m) => [m, { min: "", max: "" }])) as Record<TargetMetric, Range>;
const num = (v: string) => (v.trim() === "" ? null : Number(v));

/**
 * A new phase of the season with its weekly target ranges (either end may stay empty), for the whole team or one
 * training group (a group's phase wins over the team's in the weeks both cover).
 */
export function PhaseForm({
  teamId,
  defaultStart,
  groups,
  onSaved,
}: {
  teamId: number;
  defaultStart: string;
  groups: AudienceChoices["groups"];
  onSaved: () => void;
}) {
  const form = useForm<Values>({
    defaultValues: {
      kind: "general_preparation",
      name: "",
      startsOn: defaultStart,
      endsOn: "",
      goal: "",
      audience: "team",
      targets: blankTargets(),
    },
  });
  const [message, setMessage] = useState<SaveMessage>();
  const errors = form.formState.errors;
  const onSubmit = form.handleSubmit(async (v) => {
    setMessage(undefined);
    const targets = Object.fromEntries(
      TARGET_METRICS.filter((m) => v.targets[m].min !== "" || v.targets[m].max !== "").map((m) => [
        m,
        { min: num(v.targets[m].min), max: num(v.targets[m].max) },
      ]),
    );
    try {
      const { audience, ...fields } = v;
      await seasonApi.createPhase(teamId, { ...fields, groupId: audienceIds(audience).groupId, targets });
      form.reset({ ...v, name: "", goal: "", targets: blankTargets() });
      setMessage({ tone: "ok", text: "Phase added" });
      onSaved();
    } catch (e) {
      if (e instanceof ApiError && e.fields?.groupId) form.setError("audience", { message: e.fields.groupId[0] });
      else if (!(e instanceof ApiError) || !applyServerErrors(form, e))
        setMessage({ tone: "error", text: e instanceof Error ? e.message : "Not saved" });
    }
  });
  return (
    <form onSubmit={onSubmit} className="space-y-3" aria-labelledby="phase-form-title" data-testid="phase-form">
      <h3 id="phase-form-title" className="text-sm font-semibold text-ink-900">
        Add a phase
      </h3>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" htmlFor="phase-name" error={errors.name?.message}>
          <Input id="phase-name" {...form.register("name")} aria-invalid={!!errors.name} />
        </Field>
        <Field label="Kind" htmlFor="phase-kind" error={errors.kind?.message}>
          <Select id="phase-kind" {...form.register("kind")}>
            {SEASON_PHASE_KINDS.map((k) => (
              <option key={k} value={k}>
                {SEASON_PHASE_LABELS[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="First day" htmlFor="phase-start" error={errors.startsOn?.message}>
          <Input id="phase-start" type="date" {...form.register("startsOn")} aria-invalid={!!errors.startsOn} />
        </Field>
        <Field label="Last day" htmlFor="phase-end" error={errors.endsOn?.message}>
          <Input id="phase-end" type="date" {...form.register("endsOn")} aria-invalid={!!errors.endsOn} />
        </Field>
        <AudienceSelect
          id="phase-audience"
          choices={{ groups }}
          registration={form.register("audience")}
          error={errors.audience?.message}
        />
      </div>
      <Field label="Goal" htmlFor="phase-goal" error={errors.goal?.message}>
        <Textarea id="phase-goal" rows={2} {...form.register("goal")} />
      </Field>
      <fieldset className="space-y-2">
        <legend className="text-sm font-medium text-ink-800">Weekly targets (optional)</legend>
        {TARGET_METRICS.map((m) => (
          <div key={m} className="grid grid-cols-[1fr_5.5rem_5.5rem] items-end gap-2">
            <span className="pb-2 text-xs text-ink-700">{TARGET_NAME[m]}</span>
            <Field label="From" htmlFor={`target-${m}-min`} error={errors.targets?.[m]?.min?.message}>
              <Input id={`target-${m}-min`} inputMode="decimal" {...form.register(`targets.${m}.min`)} />
            </Field>
            <Field label="To" htmlFor={`target-${m}-max`} error={errors.targets?.[m]?.max?.message}>
              <Input id={`target-${m}-max`} inputMode="decimal" {...form.register(`targets.${m}.max`)} />
            </Field>
          </div>
        ))}
      </fieldset>
      <FormSaveRow label="Add phase" saving={form.formState.isSubmitting} dirty message={message} testId="phase-save" />
    </form>
  );
}
