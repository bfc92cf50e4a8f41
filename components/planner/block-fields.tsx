"use client";

import { useEffect } from "react";
import { get, useFieldArray, useFormContext, useWatch, type FieldErrors } from "react-hook-form";
import { BLOCK_KIND_LABEL } from "@/lib/format/block-summary";
import { RUNNING_KINDS } from "@/lib/load/block-kinds";
import { BLOCK_KINDS, type BlockKind, type PlyoDrill, type RunningPrescription } from "@/lib/load/types";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";

const RUNNING_DEFAULT: Partial<Record<BlockKind, RunningPrescription>> = {
  acceleration: { sets: 1, reps: 6, distanceM: 20, intensityPct: 95, start: "crouch", runInM: 0, restSec: 180 },
  max_velocity: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  speed_endurance: { sets: 1, reps: 3, distanceM: 150, intensityPct: 90, start: "standing", runInM: 0, restSec: 480 },
  tempo: { sets: 1, reps: 8, distanceM: 100, intensityPct: 70, start: "standing", runInM: 0, restSec: 60 },
};
const DRILL_DEFAULT: PlyoDrill = { name: "", sets: 2, reps: 10, contactsPerRep: 1, intensity: "low" };

/** The message of the error at a dotted path ("running.sets", "drills.0.name"), if any. */
function errorAt(errors: FieldErrors, path: string): string | undefined {
  const e = get(errors, path) as { message?: unknown } | undefined;
  return typeof e?.message === "string" ? e.message : undefined;
}

const START_LABEL = { standing: "Standing", crouch: "Crouch", blocks: "Blocks", flying: "Flying" } as const;

/** Fills the prescription a kind needs when the coach switches kind, so the form never shows an empty block. */
function useKindDefaults(prefix: string) {
  const { setValue, getValues } = useFormContext();
  const kind = useWatch({ name: `${prefix}kind` }) as BlockKind;
  const start = useWatch({ name: `${prefix}running.start` }) as RunningPrescription["start"] | undefined;
  useEffect(() => {
    if (RUNNING_KINDS.includes(kind) && !getValues(`${prefix}running`))
      setValue(`${prefix}running`, RUNNING_DEFAULT[kind]);
    if (kind === "plyometric" && !(getValues(`${prefix}drills`)?.length > 0))
      setValue(`${prefix}drills`, [{ ...DRILL_DEFAULT }]);
  }, [kind, prefix, getValues, setValue]);
  useEffect(() => {
    if (!start) return;
    const runIn = Number(getValues(`${prefix}running.runInM`));
    if (start !== "flying" && runIn !== 0) setValue(`${prefix}running.runInM`, 0);
    if (start === "flying" && !(runIn >= 5)) setValue(`${prefix}running.runInM`, 20);
  }, [start, prefix, getValues, setValue]);
  return kind;
}

function NumberField({
  name,
  label,
  step = 1,
  hint,
  className,
}: {
  name: string;
  label: string;
  step?: number;
  hint?: string;
  className?: string;
}) {
  const { register, formState } = useFormContext();
  const error = errorAt(formState.errors, name);
  const id = name.replace(/\./g, "-");
  return (
    <Field label={label} htmlFor={id} error={error} hint={hint} className={className}>
      <Input
        id={id}
        type="number"
        inputMode="decimal"
        step={step}
        aria-invalid={Boolean(error)}
        {...register(name, { valueAsNumber: true })}
      />
    </Field>
  );
}

function Drills({ prefix }: { prefix: string }) {
  const { register, formState } = useFormContext();
  const { fields, append, remove } = useFieldArray({ name: `${prefix}drills` });
  const listError = errorAt(formState.errors, `${prefix}drills`);
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium text-ink-800">Drills</legend>
      {listError ? (
        <p className="text-xs font-medium text-form-error" role="alert">
          {listError}
        </p>
      ) : null}
      {fields.map((f, i) => {
        const p = `${prefix}drills.${i}.`;
        const nameError = errorAt(formState.errors, `${p}name`);
        return (
          <div
            key={f.id}
            data-testid="drill-row"
            className="grid grid-cols-2 gap-2 rounded-lg bg-paper-sunk/60 p-2 sm:grid-cols-[1fr_4rem_4rem_5rem_7rem_auto]"
          >
            <Field label="Drill" htmlFor={`${p}name`} error={nameError} className="col-span-2 sm:col-span-1">
              <Input
                id={`${p}name`}
                placeholder="e.g. Ankle hops"
                aria-invalid={Boolean(nameError)}
                {...register(`${p}name`)}
              />
            </Field>
            <NumberField name={`${p}sets`} label="Sets" />
            <NumberField name={`${p}reps`} label="Reps" />
            <NumberField name={`${p}contactsPerRep`} label="Contacts/rep" />
            <Field label="Intensity" htmlFor={`${p}intensity`}>
              <Select id={`${p}intensity`} {...register(`${p}intensity`)}>
                <option value="low">Low</option>
                <option value="moderate">Moderate</option>
                <option value="high">High</option>
              </Select>
            </Field>
            <div className="flex items-end">
              <Button
                variant="ghost"
                size="sm"
                onClick={() => remove(i)}
                aria-label={`Remove drill ${i + 1}`}
                disabled={fields.length === 1}
              >
                Remove
              </Button>
            </div>
          </div>
        );
      })}
      <Button variant="secondary" size="sm" onClick={() => append({ ...DRILL_DEFAULT })} disabled={fields.length >= 12}>
        Add drill
      </Button>
      <p className="text-2xs text-ink-500">One contact per landing of one foot or both feet together (NSCA).</p>
    </fieldset>
  );
}

/** The fields of one block, under `prefix` ("" for a template, "blocks.2." inside the session editor). */
export function BlockFields({ prefix = "" }: { prefix?: string }) {
  const { register, formState } = useFormContext();
  const kind = useKindDefaults(prefix);
  const start = useWatch({ name: `${prefix}running.start` });
  const err = (n: string) => errorAt(formState.errors, `${prefix}${n}`);
  const id = (n: string) => `${prefix}${n}`.replace(/\./g, "-");
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-[12rem_1fr]">
        <Field label="Kind" htmlFor={id("kind")} error={err("kind")}>
          <Select id={id("kind")} {...register(`${prefix}kind`)}>
            {BLOCK_KINDS.map((k) => (
              <option key={k} value={k}>
                {BLOCK_KIND_LABEL[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Title" htmlFor={id("title")} error={err("title")}>
          <Input
            id={id("title")}
            placeholder="e.g. Flying 30s"
            aria-invalid={Boolean(err("title"))}
            {...register(`${prefix}title`)}
          />
        </Field>
      </div>
      {RUNNING_KINDS.includes(kind) ? (
        <fieldset className="grid grid-cols-2 gap-2 sm:grid-cols-4">
          <legend className="col-span-full mb-1 text-sm font-medium text-ink-800">Runs</legend>
          {err("running") ? (
            <p className="col-span-full text-xs font-medium text-form-error" role="alert">
              {err("running")}
            </p>
          ) : null}
          <NumberField name={`${prefix}running.sets`} label="Sets" />
          <NumberField name={`${prefix}running.reps`} label="Reps per set" />
          <NumberField name={`${prefix}running.distanceM`} label="Distance (m)" />
          <NumberField
            name={`${prefix}running.intensityPct`}
            label="% of vmax"
            hint="of the athlete's tested top speed"
          />
          <Field label="Start" htmlFor={id("running.start")}>
            <Select id={id("running.start")} {...register(`${prefix}running.start`)}>
              {Object.entries(START_LABEL).map(([v, l]) => (
                <option key={v} value={v}>
                  {l}
                </option>
              ))}
            </Select>
          </Field>
          {start === "flying" ? <NumberField name={`${prefix}running.runInM`} label="Run-in (m)" /> : null}
          <NumberField name={`${prefix}running.restSec`} label="Rest (s)" />
        </fieldset>
      ) : null}
      {kind === "plyometric" ? <Drills prefix={prefix} /> : null}
      <Field label="Notes" htmlFor={id("notes")} error={err("notes")}>
        <Textarea id={id("notes")} rows={2} placeholder="Cues, equipment, surface" {...register(`${prefix}notes`)} />
      </Field>
    </div>
  );
}
