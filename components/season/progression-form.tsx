"use client";

import { useEffect, useMemo, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import useSWR from "swr";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { hitsOf, seasonApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { applyServerErrors } from "@/lib/client/form-errors";
import { fetchJson } from "@/lib/client/fetcher";
import { seasonKeys } from "@/lib/client/keys";
import type { SeasonViewDto } from "@/lib/data/season-view";
import { addDays, shiftWeek } from "@/lib/dates/plain-date";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { previewProgression, withPreview, type ProgressionBase } from "@/lib/season/forecast-preview";
import { progressionSchema } from "@/lib/validations/season";

type Values = {
  sourceWeek: string;
  firstWeek: string;
  weeks: string;
  kind: "build" | "taper";
  weeklyIncreasePct: string;
  buildWeeks: string;
  unloadPct: string;
  reductionPct: string;
  shape: "linear" | "exponential" | "step";
  reason: string;
};

function ruleOf(v: Values) {
  return v.kind === "build"
    ? {
        kind: "build" as const,
        weeklyIncreasePct: Number(v.weeklyIncreasePct),
        buildWeeks: Number(v.buildWeeks),
        unloadPct: Number(v.unloadPct),
      }
    : { kind: "taper" as const, reductionPct: Number(v.reductionPct), shape: v.shape };
}

/** The server names rule fields under `rule.` and the reason under `override.`; the form has them flat. */
const formFields = (fields: Record<string, string[]>) =>
  Object.fromEntries(Object.entries(fields).map(([k, v]) => [k.replace(/^(rule|override)\./, ""), v]));

/**
 * The season view as the form's weeks would leave it, worked out in the page from one read of what the weeks
 * start from (lib/season/forecast-preview.ts), so each change to the rule shows at once; null while off or
 * while the form does not hold a progression the server would take.
 */
function usePreview(teamId: number, view: SeasonViewDto, on: boolean, v: Values) {
  const request = progressionSchema.safeParse({
    sourceWeek: v.sourceWeek,
    firstWeek: v.firstWeek,
    weeks: Number(v.weeks),
    rule: ruleOf(v),
  });
  const to = addDays(shiftWeek(view.from, view.weeks.length - 1), 6);
  const key =
    on && request.success
      ? seasonKeys.progressionBase(teamId, { sourceWeek: v.sourceWeek, firstWeek: v.firstWeek, to })
      : null;
  const { data: base } = useSWR<ProgressionBase>(key, fetchJson, { revalidateOnFocus: false });
  const weeks = request.success ? request.data.weeks : 0;
  const rule = request.success ? JSON.stringify(request.data.rule) : "";
  return useMemo(() => {
    if (!key || !base || !rule) return null;
    return withPreview(view, previewProgression(base, { weeks, rule: JSON.parse(rule) }));
  }, [key, base, view, weeks, rule]);
}

/**
 * Draft weeks from one week by a rule (lib/season/README.md): the drafts replace earlier drafts in those weeks and
 * are ordinary sessions afterwards. A physio restriction they would break is shown, with a reason to go ahead.
 * With the preview on, the season grid shows the forecast of the weeks as they stand in the form before anything
 * is written.
 */
export function ProgressionForm({
  teamId,
  sourceWeek,
  firstWeek,
  view,
  onPreview,
  onSaved,
}: {
  teamId: number;
  sourceWeek: string;
  firstWeek: string;
  /** The season view as stored (the preview is worked out on it). */
  view: SeasonViewDto;
  onPreview: (preview: SeasonViewDto | null) => void;
  onSaved: () => void;
}) {
  const form = useForm<Values>({
    defaultValues: {
      sourceWeek,
      firstWeek,
      weeks: "4",
      kind: "build",
      weeklyIncreasePct: "8",
      buildWeeks: "3",
      unloadPct: "40",
      reductionPct: "50",
      shape: "exponential",
      reason: "",
    },
  });
  const [hits, setHits] = useState<RestrictionHit[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [previewOn, setPreviewOn] = useState(false);
  const values = useWatch({ control: form.control }) as Values;
  const kind = values.kind;
  const preview = usePreview(teamId, view, previewOn, values);
  useEffect(() => {
    onPreview(preview);
  }, [preview, onPreview]);
  useEffect(() => () => onPreview(null), [onPreview]);
  const errors = form.formState.errors;
  const onSubmit = form.handleSubmit(async (v) => {
    setMessage(null);
    try {
      const res = await seasonApi.generate(teamId, {
        sourceWeek: v.sourceWeek,
        firstWeek: v.firstWeek,
        weeks: Number(v.weeks),
        rule: ruleOf(v),
        ...(hits.length > 0 ? { override: { reason: v.reason } } : {}),
      });
      setHits([]);
      setMessage(`${res.sessions.length} draft sessions written over ${res.weeks.length} weeks`);
      setPreviewOn(false);
      onSaved();
    } catch (e) {
      if (e instanceof ApiError && e.code === "restricted") {
        setHits(hitsOf(e));
        setMessage("These weeks break a physio restriction. Say why they should go ahead, or change the weeks.");
      } else if (!(e instanceof ApiError) || !applyServerErrors(form, { fields: formFields(e.fields) })) {
        setMessage(e instanceof Error ? e.message : "Nothing was written");
      }
    }
  });
  return (
    <form onSubmit={onSubmit} className="space-y-3" aria-labelledby="progression-title" data-testid="progression-form">
      <h3 id="progression-title" className="text-sm font-semibold text-ink-900">
        Build weeks from a week
      </h3>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Copy the week of" htmlFor="prog-source" error={errors.sourceWeek?.message}>
          <Input id="prog-source" type="date" {...form.register("sourceWeek")} />
        </Field>
        <Field label="Start in the week of" htmlFor="prog-first" error={errors.firstWeek?.message}>
          <Input id="prog-first" type="date" {...form.register("firstWeek")} />
        </Field>
        <Field label="Weeks" htmlFor="prog-weeks" error={errors.weeks?.message}>
          <Input id="prog-weeks" inputMode="numeric" {...form.register("weeks")} />
        </Field>
      </div>
      <Field label="Rule" htmlFor="prog-kind">
        <Select id="prog-kind" {...form.register("kind")}>
          <option value="build">Build, then unload</option>
          <option value="taper">Taper to a meet</option>
        </Select>
      </Field>
      {kind === "build" ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <Field label="Rise each week (%)" htmlFor="prog-rise" error={errors.weeklyIncreasePct?.message}>
            <Input id="prog-rise" inputMode="decimal" {...form.register("weeklyIncreasePct")} />
          </Field>
          <Field label="Build weeks" htmlFor="prog-build" error={errors.buildWeeks?.message}>
            <Input id="prog-build" inputMode="numeric" {...form.register("buildWeeks")} />
          </Field>
          <Field label="Unload cut (%)" htmlFor="prog-unload" error={errors.unloadPct?.message}>
            <Input id="prog-unload" inputMode="decimal" {...form.register("unloadPct")} />
          </Field>
        </div>
      ) : (
        <div className="grid gap-3 sm:grid-cols-2">
          <Field label="Volume cut by the last week (%)" htmlFor="prog-cut" error={errors.reductionPct?.message}>
            <Input id="prog-cut" inputMode="decimal" {...form.register("reductionPct")} />
          </Field>
          <Field label="Shape" htmlFor="prog-shape">
            <Select id="prog-shape" {...form.register("shape")}>
              <option value="exponential">Fast, then level</option>
              <option value="linear">Even steps</option>
              <option value="step">All at once</option>
            </Select>
          </Field>
        </div>
      )}
      <label className="flex items-center gap-2 text-sm text-ink-800">
        <input
          type="checkbox"
          checked={previewOn}
          onChange={(e) => setPreviewOn(e.target.checked)}
          data-testid="progression-preview-toggle"
        />
        Show these weeks in the season grid before writing them
      </label>
      {previewOn && preview ? (
        <p className="text-xs text-ink-700" data-testid="progression-preview-note">
          The grid shows the forecast with these weeks (cells marked &ldquo;not written yet&rdquo;). Nothing is saved
          until you write them.
        </p>
      ) : null}
      {hits.length > 0 ? (
        <div className="space-y-2 rounded-lg bg-flag-spike-soft p-3" data-testid="progression-hits">
          <ul className="space-y-1 text-xs text-ink-900">
            {hits.map((h, i) => (
              <li key={i}>
                <span className="font-semibold">{h.date}</span> · {h.rule} · {h.detail}{" "}
                <span className="text-ink-700">
                  ({h.setByName}: {h.note})
                </span>
              </li>
            ))}
          </ul>
          <Field label="Reason to go ahead" htmlFor="prog-reason" error={errors.reason?.message}>
            <Input id="prog-reason" {...form.register("reason")} />
          </Field>
        </div>
      ) : null}
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={form.formState.isSubmitting}>
          {hits.length > 0 ? "Write the weeks anyway" : "Write draft weeks"}
        </Button>
        {message ? (
          <p role="status" className="text-xs text-ink-700" data-testid="progression-message">
            {message}
          </p>
        ) : null}
      </div>
    </form>
  );
}
