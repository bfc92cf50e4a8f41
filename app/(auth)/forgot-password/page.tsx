import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";

export const metadata: Metadata = { title: "Reset your password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-xl font-semibold text-ink-950">Reset your password</h1>
      <p className="mt-1 text-sm text-ink-500">
        We will e-mail you a link that lets you choose a new one. It works once, for an hour.
      </p>
      <ForgotPasswordForm />
      <Link href="/sign-in" className="mt-6 inline-block text-sm font-medium text-lane-700 underline">
        Back to sign-in
      </Link>
    </>
  );
}
