import { clsx } from "clsx";
import { FLAG_DISPLAY, flagClasses, type FlagShape } from "@/lib/load/flag-display";
import type { FlagKind } from "@/lib/load/flags";

// 12 × 12 shapes drawn in the flag's colour: filled ones and stroked ones.
const SHAPES: Record<FlagShape, { d: string; stroke?: boolean }> = {
  "triangle-up": { d: "M6 1 L11.5 10.5 H0.5 Z" },
  "arrow-up": { d: "M2 10 L9.5 2.5 M4 2.5 H9.5 V8", stroke: true },
  "triangle-down": { d: "M0.5 1.5 H11.5 L6 11 Z" },
  "double-chevron": { d: "M2 6.5 L6 2.5 L10 6.5 M2 10.5 L6 6.5 L10 10.5", stroke: true },
  bars: { d: "M1 3.5 H11 M1 8.5 H11", stroke: true },
  diamond: { d: "M6 0.5 L11.5 6 L6 11.5 L0.5 6 Z" },
  hourglass: { d: "M1.5 1 H10.5 L6 6 L10.5 11 H1.5 L6 6 Z" },
};

/** The flag kind's shape, drawn in its colour; decorative (the label or its sr-only text names it). */
export function FlagShapeIcon({ kind, className }: { kind: FlagKind; className?: string }) {
  const shape = SHAPES[FLAG_DISPLAY[kind].shape];
  return (
    <svg
      aria-hidden
      viewBox="0 0 12 12"
      data-shape={FLAG_DISPLAY[kind].shape}
      className={clsx("h-2.5 w-2.5 shrink-0", flagClasses(kind).text, className)}
    >
      <path
        d={shape.d}
        fill={shape.stroke ? "none" : "currentColor"}
        stroke={shape.stroke ? "currentColor" : "none"}
        strokeWidth={shape.stroke ? 2 : 0}
        strokeLinecap="round"
        strokeLinejoin="round"
      />
    </svg>
  );
}

/**
 * A load flag as its shape plus its label (never colour alone). `label` "sr-only" keeps the word for screen readers
 * where space is short (a planner card); `detail` is read after the label (e.g. the flag's reason).
 */
export function FlagMark({
  kind,
  label = "visible",
  detail,
  className,
}: {
  kind: FlagKind;
  label?: "visible" | "sr-only";
  detail?: string;
  className?: string;
}) {
  const d = FLAG_DISPLAY[kind];
  return (
    <span
      data-testid="flag-mark"
      data-kind={kind}
      title={detail ?? d.hint}
      className={clsx("inline-flex items-center gap-1", flagClasses(kind).text, className)}
    >
      <FlagShapeIcon kind={kind} />
      <span className={label === "visible" ? "text-2xs font-medium" : "sr-only"}>
        {d.label}
        {detail ? <span className="sr-only">: {detail}</span> : null}
      </span>
    </span>
  );
}
