"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { forgotPasswordAction } from "@/app/(auth)/forgot-password/actions";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { forgotPasswordSchema, type ForgotPasswordInput } from "@/lib/validations/auth";

export function ForgotPasswordForm() {
  const [done, setDone] = useState(false);
  const [error, setError] = useState<string>();
  const { register, handleSubmit, formState } = useForm<ForgotPasswordInput>({
    resolver: zodResolver(forgotPasswordSchema),
    defaultValues: { email: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setError(undefined);
    const result = await forgotPasswordAction(values);
    if (!result.ok) setError(result.message);
    else setDone(true);
  });

  if (done) {
    return (
      <p role="status" data-testid="reset-sent" className="mt-6 rounded-lg bg-lane-50 px-3 py-2 text-sm text-lane-800">
        If that address belongs to a Sprintwright account, a reset link is on its way. Check your inbox.
      </p>
    );
  }
  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      {error ? (
        <p role="alert" className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">
          {error}
        </p>
      ) : null}
      <Field label="E-mail" htmlFor="reset-email" error={errors.email?.message}>
        <Input
          id="reset-email"
          type="email"
          autoComplete="email"
          aria-invalid={!!errors.email}
          {...register("email")}
        />
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Sending…" : "Send reset link"}
      </Button>
    </form>
  );
}
