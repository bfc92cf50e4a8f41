"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { speedApi } from "@/lib/client/speed";

/** Puts a test's result into the athlete's profile from the test's date on. */
export function AcceptResultButton({ teamId, testId, testDate }: { teamId: number; testId: number; testDate: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button
        size="sm"
        disabled={busy}
        data-testid={`accept-${testId}`}
        onClick={async () => {
          setBusy(true);
          setError(null);
          try {
            await speedApi.accept(teamId, testId);
            router.refresh();
          } catch (e) {
            setError(e instanceof Error ? e.message : "Could not accept");
          } finally {
            setBusy(false);
          }
        }}
      >
        Use from {testDate}
      </Button>
      {error ? (
        <span role="alert" className="text-xs text-form-error">
          {error}
        </span>
      ) : null}
    </div>
  );
}
