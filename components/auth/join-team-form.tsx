"use client";

import { useState, useTransition } from "react";
import { joinTeamAction } from "@/app/(auth)/invite/actions";
import { Button, buttonClass } from "@/components/ui/button";

export function JoinTeamForm({ token, teamName }: { token: string; teamName: string }) {
  const [error, setError] = useState<string>();
  const [joined, setJoined] = useState(false);
  const [pending, startTransition] = useTransition();

  if (joined) {
    return (
      <div role="status" data-testid="join-done" className="mt-6 rounded-lg bg-lane-50 px-3 py-2 text-sm text-lane-800">
        <p>You joined {teamName}.</p>
        <a href="/home" className={buttonClass({ variant: "secondary", size: "sm", className: "mt-3" })}>
          Go to your workspace
        </a>
      </div>
    );
  }
  return (
    <div className="mt-6 space-y-3">
      {error ? (
        <p role="alert" className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">
          {error}
        </p>
      ) : null}
      <Button
        className="w-full"
        disabled={pending}
        onClick={() =>
          startTransition(async () => {
            setError(undefined);
            const result = await joinTeamAction({ token });
            if (!result.ok) setError(result.message);
            else setJoined(true);
          })
        }
      >
        {pending ? "Joining…" : `Join ${teamName}`}
      </Button>
    </div>
  );
}
