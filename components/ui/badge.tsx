import { clsx } from "clsx";
import type { ReactNode } from "react";

const TONES = {
  neutral: "bg-ink-100 text-ink-700",
  brand: "bg-clay-100 text-clay-700",
  lane: "bg-lane-100 text-lane-700",
  spike: "bg-flag-spike-soft text-flag-spike",
  climb: "bg-flag-climb-soft text-flag-climb",
  under: "bg-flag-under-soft text-flag-under",
  steady: "bg-flag-steady-soft text-flag-steady",
  note: "bg-flag-note-soft text-flag-note",
} as const;

export type BadgeTone = keyof typeof TONES;

export function Badge({
  tone = "neutral",
  children,
  className,
}: {
  tone?: BadgeTone;
  children: ReactNode;
  className?: string;
}) {
  return (
    <span
      className={clsx(
        "inline-flex items-center gap-1 rounded-full px-2 py-0.5 text-xs font-medium",
        TONES[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
