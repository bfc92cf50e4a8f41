import type { Metadata } from "next";
import Link from "next/link";
import { SignInForm } from "@/components/auth/sign-in-form";
import { safeCallbackPath } from "@/lib/auth/safe-redirect";
import { signInErrorMessage } from "@/lib/auth/sign-in-messages";
import { appUrl } from "@/lib/env";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ callbackUrl?: string; error?: string; email?: string }>;
}) {
  const { callbackUrl, error, email } = await searchParams;
  // Only same-site paths: a crafted callbackUrl could send a freshly signed-in user elsewhere.
  const next = safeCallbackPath(callbackUrl, { origin: appUrl() });
  return (
    <>
      <h1 className="text-xl font-semibold text-ink-950">Sign in</h1>
      <p className="mt-1 text-sm text-ink-500">Use the e-mail your club registered you with.</p>
      <SignInForm
        next={next}
        initialError={signInErrorMessage(typeof error === "string" ? error : undefined)}
        initialEmail={typeof email === "string" ? email : undefined}
      />
      <Link href="/forgot-password" className="mt-4 inline-block text-sm text-ink-500 underline hover:text-ink-800">
        Forgot your password?
      </Link>
    </>
  );
}
