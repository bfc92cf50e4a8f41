"use client";

import { clsx } from "clsx";
import { useEffect, useId, useRef, type ReactNode } from "react";

/** A modal built on the native <dialog>: focus stays inside, Escape closes, the page behind is inert. */
export function Dialog({
  open,
  onClose,
  title,
  children,
  wide = false,
  testId,
}: {
  open: boolean;
  onClose: () => void;
  title: string;
  children: ReactNode;
  wide?: boolean;
  testId?: string;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    if (open && !el.open) el.showModal();
    if (!open && el.open) el.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      data-testid={testId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className={clsx(
        "m-auto max-h-[90dvh] w-[calc(100%-2rem)] overflow-y-auto rounded-card bg-paper-raised p-0",
        "text-ink-900 shadow-lift backdrop:bg-ink-950/30",
        wide ? "max-w-3xl" : "max-w-lg",
      )}
    >
      {open ? (
        <div className="p-5">
          <div className="mb-4 flex items-start justify-between gap-4">
            <h2 id={titleId} className="text-lg font-semibold text-ink-950">
              {title}
            </h2>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="rounded p-1 text-ink-500 hover:bg-ink-100 hover:text-ink-800"
            >
              <svg viewBox="0 0 16 16" aria-hidden className="h-4 w-4 stroke-current" strokeWidth="1.8">
                <path d="M4 4l8 8M12 4l-8 8" />
              </svg>
            </button>
          </div>
          {children}
        </div>
      ) : null}
    </dialog>
  );
}
