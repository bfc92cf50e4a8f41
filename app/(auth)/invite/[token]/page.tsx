import type { Metadata } from "next";
import Link from "next/link";
import { JoinTeamForm } from "@/components/auth/join-team-form";
import { SetPasswordForm } from "@/components/auth/set-password-form";
import { sessionUserId } from "@/lib/auth/access";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { findOpenInvitation } from "@/lib/data/members";

export const metadata: Metadata = { title: "Your invitation" };
export const dynamic = "force-dynamic";

function withArticle(word: string): string {
  return `${/^[aeiou]/i.test(word) ? "an" : "a"} ${word}`;
}

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = token.length >= 20 && token.length <= 200 ? await findOpenInvitation({ token }) : null;
  if (!invitation) {
    return (
      <>
        <h1 className="text-xl font-semibold text-ink-950">This link no longer works</h1>
        <p className="mt-2 text-sm text-ink-600">
          It has expired or was already used. Ask your head coach for a new one.
        </p>
        <Link href="/sign-in" className="mt-6 inline-block text-sm font-medium text-lane-700 underline">
          Go to sign-in
        </Link>
      </>
    );
  }
  if (invitation.purpose === "reset") {
    return (
      <>
        <h1 className="text-xl font-semibold text-ink-950">Choose a new password</h1>
        <p className="mt-1 text-sm text-ink-500">For {invitation.email}. The link works once.</p>
        <SetPasswordForm token={token} email={invitation.email} />
      </>
    );
  }
  const role = invitation.role ? withArticle(ROLE_LABEL[invitation.role].toLowerCase()) : "a member";
  if (!invitation.hasPassword) {
    return (
      <>
        <h1 className="text-xl font-semibold text-ink-950">
          {invitation.name ? `Welcome, ${invitation.name}` : "Welcome"}
        </h1>
        <p className="mt-1 text-sm text-ink-500">
          Choose a password for {invitation.email} to join {invitation.teamName} as {role}.
        </p>
        <SetPasswordForm token={token} email={invitation.email} />
      </>
    );
  }
  // An account that exists already joins only by its owner's own hand: signed in as the invited address.
  const viewerId = await sessionUserId();
  const self = `/invite/${token}`;
  return (
    <>
      <h1 className="text-xl font-semibold text-ink-950">Join {invitation.teamName}</h1>
      <p className="mt-1 text-sm text-ink-500" data-testid="invite-lead">
        {invitation.teamName} invited {invitation.email} to join as {role}. The team sees nothing of your account until
        you accept.
      </p>
      {viewerId === invitation.userId ? (
        <JoinTeamForm token={token} teamName={invitation.teamName} />
      ) : viewerId ? (
        <p
          role="alert"
          className="mt-6 rounded-lg bg-flag-climb-soft px-3 py-2 text-sm text-ink-800"
          data-testid="invite-wrong-account"
        >
          You are signed in with another account. Sign out, then sign in as {invitation.email} and open this link again.
        </p>
      ) : (
        <Link
          href={`/sign-in?email=${encodeURIComponent(invitation.email)}&callbackUrl=${encodeURIComponent(self)}`}
          className="mt-6 inline-block text-sm font-medium text-lane-700 underline"
          data-testid="invite-sign-in"
        >
          Sign in as {invitation.email} to accept
        </Link>
      )}
    </>
  );
}
