"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { athleteReportApi } from "@/lib/client/api";

/**
 * A coach reopens an athlete's locked log for another 48 hours; then the page (or `onReopened`, where the lock is
 * read in the browser) shows the new closing time.
 */
export function ReopenLogButton({
  sessionId,
  title,
  onReopened,
}: {
  sessionId: number;
  title: string;
  onReopened?: () => unknown;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();
  async function reopen() {
    setBusy(true);
    setError(undefined);
    try {
      await athleteReportApi.unlockLog(sessionId);
      if (onReopened) await onReopened();
      else router.refresh();
    } catch (err) {
      setError(err instanceof Error ? err.message : "Could not reopen the log");
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="space-y-1">
      <Button
        variant="secondary"
        size="sm"
        onClick={reopen}
        disabled={busy}
        aria-label={`Reopen the log of ${title}`}
        data-testid="reopen-log"
      >
        {busy ? "Reopening…" : "Reopen log"}
      </Button>
      {error ? (
        <p role="alert" className="text-xs font-medium text-form-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
