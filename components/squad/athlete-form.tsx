"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { saveAthleteAction } from "@/app/(workspace)/squad/actions";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { applyServerErrors } from "@/lib/client/form-errors";
import { athleteSchema, type AthleteFormValues, type AthleteInput } from "@/lib/validations/athlete";

type Props = { athleteId: number | null; initial: AthleteFormValues; groups: { id: number; name: string }[] };

const FIELDS = [
  "name",
  "groupId",
  "sex",
  "birthDate",
  "bodyMassKg",
  "vmaxMs",
  "vmaxTestedOn",
  "tauS",
  "stepLengthM",
  "plyoLevel",
] as const;

export function AthleteForm({ athleteId, initial, groups }: Props) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "ok" | "error"; text: string }>();
  const { register, handleSubmit, setError, formState } = useForm<AthleteFormValues, unknown, AthleteInput>({
    resolver: zodResolver(athleteSchema),
    defaultValues: initial,
  });
  const { errors, isSubmitting } = formState;
  const err = (k: (typeof FIELDS)[number]) => errors[k]?.message as string | undefined;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    const result = await saveAthleteAction(athleteId, values);
    if (!result.ok) {
      applyServerErrors({ setError }, result, FIELDS);
      setMessage({ tone: "error", text: result.message });
      return;
    }
    setMessage({ tone: "ok", text: "Saved. New test values apply to every load figure from now on." });
    if (athleteId === null) router.push(`/squad/${result.data.id}`);
    else router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2" data-testid="athlete-form">
      <Field label="Name" htmlFor="a-name" error={err("name")}>
        <Input id="a-name" aria-invalid={!!errors.name} {...register("name")} />
      </Field>
      <Field label="Training group" htmlFor="a-group" error={err("groupId")}>
        <Select id="a-group" {...register("groupId")}>
          <option value="">No group</option>
          {groups.map((g) => (
            <option key={g.id} value={g.id}>
              {g.name}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label="Max velocity (m/s)"
        htmlFor="a-vmax"
        error={err("vmaxMs")}
        hint="Best flying 10–30 m split, in metres per second."
      >
        <Input id="a-vmax" inputMode="decimal" aria-invalid={!!errors.vmaxMs} {...register("vmaxMs")} />
      </Field>
      <Field label="Tested on" htmlFor="a-vmax-date" error={err("vmaxTestedOn")}>
        <Input id="a-vmax-date" type="date" {...register("vmaxTestedOn")} />
      </Field>
      <Field
        label="Acceleration constant τ (s)"
        htmlFor="a-tau"
        error={err("tauS")}
        hint="From timing-gate splits; about 1.0–1.4 s in trained sprinters."
      >
        <Input id="a-tau" inputMode="decimal" aria-invalid={!!errors.tauS} {...register("tauS")} />
      </Field>
      <Field label="Step length at top speed (m)" htmlFor="a-step" error={err("stepLengthM")}>
        <Input id="a-step" inputMode="decimal" aria-invalid={!!errors.stepLengthM} {...register("stepLengthM")} />
      </Field>
      <Field label="Body mass (kg)" htmlFor="a-mass" error={err("bodyMassKg")}>
        <Input id="a-mass" inputMode="decimal" aria-invalid={!!errors.bodyMassKg} {...register("bodyMassKg")} />
      </Field>
      <Field label="Plyometric experience" htmlFor="a-plyo" error={err("plyoLevel")}>
        <Select id="a-plyo" {...register("plyoLevel")}>
          <option value="beginner">Beginner</option>
          <option value="intermediate">Intermediate</option>
          <option value="advanced">Advanced</option>
        </Select>
      </Field>
      <Field label="Sex" htmlFor="a-sex" error={err("sex")}>
        <Select id="a-sex" {...register("sex")}>
          <option value="">Not recorded</option>
          <option value="female">Female</option>
          <option value="male">Male</option>
        </Select>
      </Field>
      <Field label="Born" htmlFor="a-birth" error={err("birthDate")}>
        <Input id="a-birth" type="date" {...register("birthDate")} />
      </Field>
      <div className="flex flex-col gap-3 sm:col-span-2 sm:flex-row sm:items-center">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : athleteId === null ? "Add athlete" : "Save profile"}
        </Button>
        {message ? (
          <p
            role={message.tone === "error" ? "alert" : "status"}
            data-testid="athlete-form-message"
            className={message.tone === "error" ? "text-sm text-form-error" : "text-sm text-form-ok"}
          >
            {message.text}
          </p>
        ) : null}
      </div>
    </form>
  );
}
