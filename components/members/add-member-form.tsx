"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { addMemberAction } from "@/app/(workspace)/members/actions";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import { ROLES, ROLE_LABEL } from "@/lib/auth/roles";
import { applyServerErrors } from "@/lib/client/form-errors";
import { addMemberSchema, type AddMemberFormValues, type AddMemberInput } from "@/lib/validations/members";

export function AddMemberForm({ unlinkedAthletes }: { unlinkedAthletes: { id: number; name: string }[] }) {
  const [message, setMessage] = useState<{ tone: "error" | "ok"; text: string }>();
  const { register, handleSubmit, control, reset, setError, formState } = useForm<
    AddMemberFormValues,
    unknown,
    AddMemberInput
  >({
    resolver: zodResolver(addMemberSchema),
    defaultValues: { name: "", email: "", role: "coach" },
  });
  const role = useWatch({ control, name: "role" });

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    const result = await addMemberAction({ ...values, athleteId: values.athleteId || undefined });
    if (!result.ok) {
      applyServerErrors({ setError }, result, ["name", "email", "role", "athleteId"]);
      setMessage({ tone: "error", text: result.message });
      return;
    }
    reset({ name: "", email: "", role: values.role });
    setMessage({
      tone: "ok",
      text: `Invitation sent to ${result.data.email} (the link works for 7 days). They join the club when they accept it.`,
    });
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4" data-testid="add-member-form">
      <Field label="Name" htmlFor="member-name" error={errors.name?.message}>
        <Input id="member-name" aria-invalid={!!errors.name} {...register("name")} />
      </Field>
      <Field label="E-mail" htmlFor="member-email" error={errors.email?.message}>
        <Input id="member-email" type="email" aria-invalid={!!errors.email} {...register("email")} />
      </Field>
      <Field label="Role" htmlFor="member-role" error={errors.role?.message}>
        <Select id="member-role" {...register("role")}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABEL[r]}
            </option>
          ))}
        </Select>
      </Field>
      {role === "athlete" && unlinkedAthletes.length > 0 ? (
        <Field
          label="Athlete profile"
          htmlFor="member-athlete"
          error={errors.athleteId?.message}
          hint="Link an existing profile, or leave empty to create one."
        >
          <Select id="member-athlete" {...register("athleteId")}>
            <option value="">Create a new profile</option>
            {unlinkedAthletes.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {message ? (
        <div
          role={message.tone === "error" ? "alert" : "status"}
          data-testid="add-member-message"
          className={
            message.tone === "error"
              ? "rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error"
              : "rounded-lg bg-form-ok-soft px-3 py-2 text-sm text-form-ok"
          }
        >
          <p>{message.text}</p>
        </div>
      ) : null}
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
