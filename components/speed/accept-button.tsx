"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/client/fetcher";
import { speedApi } from "@/lib/client/speed";

/**
 * Puts a test's result into the athlete's profile from the test's date on. When another result is already in use
 * from that date the server says so, and the coach may use this one instead (the other stays in the history).
 */
export function AcceptResultButton({ teamId, testId, testDate }: { teamId: number; testId: number; testDate: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [sameDay, setSameDay] = useState(false);

  async function accept(replace: boolean) {
    setBusy(true);
    setError(null);
    try {
      await speedApi.accept(teamId, testId, replace ? { replace: true } : undefined);
      setSameDay(false);
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : "Could not accept");
      setSameDay(e instanceof ApiError && e.status === 409 && Boolean(e.details.sameDay));
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button size="sm" disabled={busy} data-testid={`accept-${testId}`} onClick={() => void accept(false)}>
        Use from {testDate}
      </Button>
      {error ? (
        <span role="alert" className="text-xs text-form-error" data-testid={`accept-error-${testId}`}>
          {error}
        </span>
      ) : null}
      {sameDay ? (
        <Button
          size="sm"
          variant="secondary"
          disabled={busy}
          data-testid={`replace-${testId}`}
          onClick={() => void accept(true)}
        >
          Use this one instead
        </Button>
      ) : null}
    </div>
  );
}
