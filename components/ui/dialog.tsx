"use client";

import { clsx } from "clsx";
import { useEffect, useId, useRef, type ReactNode } from "react";

/**
 * A modal built on the native <dialog>: focus stays inside, Escape closes, the page behind is inert. As a `sheet`
 * it rises from the bottom edge on a phone (one thumb reaches it) and sits in the middle on wider screens.
 */
export function Dialog({
  open,
  onClose,
  title,
  children,
  wide = false,
  sheet = false,
  testId,
}: {
  open: boolean;
  onClose: () => void;
  title: string;
  children: ReactNode;
  wide?: boolean;
  sheet?: boolean;
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
        "max-h-[90dvh] overflow-y-auto bg-paper-raised p-0 text-ink-900 shadow-lift backdrop:bg-ink-950/30",
        sheet
          ? "m-0 mt-auto w-full max-w-none rounded-t-2xl sm:m-auto sm:w-[calc(100%-2rem)] sm:rounded-card"
          : "m-auto w-[calc(100%-2rem)] rounded-card",
        wide ? "max-w-3xl" : sheet ? "sm:max-w-lg" : "max-w-lg",
      )}
    >
      {open ? (
        <div className={sheet ? "p-4 sm:p-5" : "p-5"}>
          <div className="mb-4 flex items-start justify-between gap-4">
            <h2 id={titleId} className="text-lg font-semibold text-ink-950">
              {title}
            </h2>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className={clsx(
                "rounded p-1 text-ink-500 hover:bg-ink-100 hover:text-ink-800",
                sheet && "-m-2 min-h-11 min-w-11 p-3",
              )}
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
