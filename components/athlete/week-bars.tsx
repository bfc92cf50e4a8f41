import { clsx } from "clsx";

/** A small bar trend with its figures spelled out for screen readers; the last bar (this week) stands out. */
export function WeekBars({
  values,
  labels,
  describe,
  className,
}: {
  values: readonly number[];
  labels: readonly string[];
  describe: (value: number) => string;
  className?: string;
}) {
  const max = Math.max(1, ...values);
  const text = values.map((v, i) => `${labels[i]}: ${describe(v)}`).join("; ");
  return (
    <svg
      viewBox={`0 0 ${values.length * 12} 40`}
      className={clsx("h-10 w-full", className)}
      role="img"
      aria-label={text}
      preserveAspectRatio="none"
    >
      {values.map((v, i) => {
        const h = Math.max(1, (v / max) * 38);
        return (
          <rect
            key={i}
            x={i * 12 + 2}
            y={40 - h}
            width={8}
            height={h}
            rx={1.5}
            className={i === values.length - 1 ? "fill-ink-900" : "fill-ink-300"}
          />
        );
      })}
    </svg>
  );
}
