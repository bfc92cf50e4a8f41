"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: "/" })}
      className="rounded-md px-2 py-1 text-sm text-ink-500 hover:bg-ink-100 hover:text-ink-900"
      data-testid="sign-out"
    >
      Sign out
    </button>
  );
}
