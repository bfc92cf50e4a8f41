"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { safeCallbackPath } from "@/lib/auth/safe-redirect";
import { WRONG_CREDENTIALS, signInErrorMessage } from "@/lib/auth/sign-in-messages";
import { signInSchema, type SignInInput } from "@/lib/validations/auth";

export function SignInForm({
  next,
  initialError,
  initialEmail,
}: {
  next: string;
  initialError?: string;
  initialEmail?: string;
}) {
  const router = useRouter();
  const [error, setError] = useState(initialError);
  const { register, handleSubmit, formState } = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: initialEmail ?? "", password: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setError(undefined);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      setError(signInErrorMessage(res?.error) ?? WRONG_CREDENTIALS);
      return;
    }
    router.replace(safeCallbackPath(next, { origin: window.location.origin }));
    router.refresh();
  });

  const { errors, isSubmitting } = formState;
  return (
    <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4" data-testid="sign-in-form">
      {error ? (
        <p
          role="alert"
          data-testid="sign-in-error"
          className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error"
        >
          {error}
        </p>
      ) : null}
      <Field label="E-mail" htmlFor="email" error={errors.email?.message}>
        <Input id="email" type="email" autoComplete="email" aria-invalid={!!errors.email} {...register("email")} />
      </Field>
      <Field label="Password" htmlFor="password" error={errors.password?.message}>
        <Input
          id="password"
          type="password"
          autoComplete="current-password"
          aria-invalid={!!errors.password}
          {...register("password")}
        />
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
