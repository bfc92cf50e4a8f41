"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { setPasswordAction } from "@/app/(auth)/invite/actions";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { setPasswordSchemaFor, type SetPasswordInput } from "@/lib/validations/auth";
import { PASSWORD_HINT } from "@/lib/validations/password";

export function SetPasswordForm({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const [error, setError] = useState<string>();
  const {
    register,
    handleSubmit,
    setError: setFieldError,
    formState,
  } = useForm<SetPasswordInput>({
    resolver: zodResolver(setPasswordSchemaFor(email)),
    defaultValues: { token, password: "", confirm: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setError(undefined);
    const result = await setPasswordAction(values);
    if (!result.ok) {
      setError(result.message);
      for (const [field, messages] of Object.entries(result.fields ?? {})) {
        if (field === "password" || field === "confirm") setFieldError(field, { message: messages[0] });
      }
      return;
    }
    router.push(`/sign-in?email=${encodeURIComponent(email)}`);
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
      {error ? (
        <p role="alert" className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">
          {error}
        </p>
      ) : null}
      <input type="hidden" {...register("token")} />
      <Field label="New password" htmlFor="password" error={errors.password?.message} hint={PASSWORD_HINT}>
        <Input
          id="password"
          type="password"
          autoComplete="new-password"
          aria-invalid={!!errors.password}
          {...register("password")}
        />
      </Field>
      <Field label="Repeat it" htmlFor="confirm" error={errors.confirm?.message}>
        <Input
          id="confirm"
          type="password"
          autoComplete="new-password"
          aria-invalid={!!errors.confirm}
          {...register("confirm")}
        />
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Set password"}
      </Button>
    </form>
  );
}
