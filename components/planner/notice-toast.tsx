"use client";

import { clsx } from "clsx";
import { useEffect, useState } from "react";
import type { Notice } from "./use-plan-actions";

/** Saves and refusals, announced politely; a saved note fades after a few seconds, a refusal stays until closed. */
export function NoticeToast({ notice }: { notice: Notice | null }) {
  const [hidden, setHidden] = useState<number | null>(null);
  useEffect(() => {
    if (!notice || notice.tone === "refused") return;
    const t = setTimeout(() => setHidden(notice.at), 6000);
    return () => clearTimeout(t);
  }, [notice]);
  const visible = notice && hidden !== notice.at;
  return (
    <div aria-live="polite" className="pointer-events-none fixed inset-x-0 bottom-4 z-40 flex justify-center px-4">
      {visible ? (
        <p
          key={notice.at}
          data-testid="plan-notice"
          data-tone={notice.tone}
          className={clsx(
            "pointer-events-auto flex max-w-2xl items-start gap-3 rounded-lg px-4 py-2.5 text-sm shadow-lift ring-1",
            notice.tone === "refused"
              ? "bg-flag-climb-soft text-ink-900 ring-flag-climb/40"
              : notice.tone === "saved"
                ? "bg-paper-raised text-ink-800 ring-ink-100"
                : "bg-lane-50 text-lane-800 ring-lane-200",
          )}
        >
          {notice.tone === "saved" ? (
            <span aria-hidden className="mt-1.5 h-2 w-2 shrink-0 rounded-full bg-flag-steady" />
          ) : null}
          <span>{notice.text}</span>
          <button
            type="button"
            onClick={() => setHidden(notice.at)}
            aria-label="Dismiss"
            className="-mr-1 shrink-0 rounded px-1 text-current opacity-60 hover:opacity-100"
          >
            ×
          </button>
        </p>
      ) : null}
    </div>
  );
}
