import type { Metadata } from "next";
import Link from "next/link";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { findOpenInvitation } from "@/lib/data/members";

export const metadata: Metadata = { title: "Set your password" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length >= 20 && token.length <= 200 ? await findOpenInvitation({ token }) : null;
  if (!invitation) {
    return (
      <>
        <h1 className="text-xl font-semibold text-ink-950">This link no longer works</h1>
        <p className="mt-2 text-sm text-ink-600">It has expired or was already used. Ask your head coach for a new one.</p>
        <Link href="/sign-in" className="mt-6 inline-block text-sm font-medium text-lane-700 underline">
          Go to sign-in
        </Link>
      </>
    );
  }
  return (
    <>
      <h1 className="text-xl font-semibold text-ink-950">{invitation.purpose === "reset" ? "Choose a new password" : `Welcome, ${invitation.name}`}</h1>
      <p className="mt-1 text-sm text-ink-500">
        {invitation.purpose === "reset"
          ? `For ${invitation.email}. The link works once.`
          : `Choose a password for ${invitation.email} to join ${invitation.teamName}.`}
      </p>
      <SetPasswordForm token={token} email={invitation.email} />
    </>
  );
}
