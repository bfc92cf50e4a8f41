"use client";

import { clsx } from "clsx";
import { useEffect, useId, useRef, useState } from "react";

export type MenuItem = { label: string; onSelect: () => void; danger?: boolean; testId?: string };

/** A small "more" menu: a button that opens a list of actions; Escape or a click elsewhere closes it. */
export function CardMenu({ label, items }: { label: string; items: MenuItem[] }) {
  const [open, setOpen] = useState(false);
  const ref = useRef<HTMLDivElement>(null);
  const id = useId();
  useEffect(() => {
    if (!open) return;
    const close = (e: Event) => {
      if (e instanceof KeyboardEvent ? e.key === "Escape" : !ref.current?.contains(e.target as Node)) setOpen(false);
    };
    document.addEventListener("pointerdown", close);
    document.addEventListener("keydown", close);
    return () => {
      document.removeEventListener("pointerdown", close);
      document.removeEventListener("keydown", close);
    };
  }, [open]);
  return (
    <div ref={ref} className="relative">
      <button
        type="button"
        aria-label={label}
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={id}
        data-testid="card-menu"
        onClick={() => setOpen((o) => !o)}
        className="grid h-5 w-5 place-items-center rounded text-ink-500 hover:bg-ink-100 hover:text-ink-800"
      >
        <svg viewBox="0 0 16 16" aria-hidden className="h-3.5 w-3.5 fill-current">
          <circle cx="3" cy="8" r="1.4" />
          <circle cx="8" cy="8" r="1.4" />
          <circle cx="13" cy="8" r="1.4" />
        </svg>
      </button>
      {open ? (
        <ul
          id={id}
          role="menu"
          className="absolute top-6 right-0 z-30 w-44 rounded-lg bg-paper-raised py-1 text-sm shadow-lift ring-1 ring-ink-100"
        >
          {items.map((item) => (
            <li key={item.label} role="none">
              <button
                type="button"
                role="menuitem"
                data-testid={item.testId}
                onClick={() => {
                  setOpen(false);
                  item.onSelect();
                }}
                className={clsx(
                  "block w-full px-3 py-1.5 text-left hover:bg-ink-50",
                  item.danger ? "text-flag-spike" : "text-ink-800",
                )}
              >
                {item.label}
              </button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
