"use client";

import { Button } from "@/components/ui/button";

export default function WorkspaceError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div
      role="alert"
      className="mx-auto max-w-lg rounded-card bg-paper-raised p-8 text-center shadow-card ring-1 ring-ink-100"
    >
      <h1 className="text-xl font-semibold text-ink-950">This screen could not load</h1>
      <p className="mt-2 text-sm text-ink-600">
        Nothing you saved is lost. Try again; if it keeps happening, tell us the code below.
      </p>
      {error.digest ? <p className="mt-3 font-mono text-xs text-ink-400">{error.digest}</p> : null}
      <Button className="mt-6" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
