"use client";

import { clsx } from "clsx";

/**
 * A small segmented control: one pressed button out of a few. `testId` names the group and each button
 * (`${testId}-${value}`) for browser tests.
 */
export function Segmented<T extends string>({
  value,
  options,
  onChange,
  label,
  testId,
}: {
  value: T;
  options: [T, string][];
  onChange: (v: T) => void;
  label: string;
  testId?: string;
}) {
  return (
    <div
      className="inline-flex rounded-lg bg-ink-100 p-0.5 text-sm"
      role="group"
      aria-label={label}
      data-testid={testId}
    >
      {options.map(([v, text]) => (
        <button
          key={v}
          type="button"
          aria-pressed={value === v}
          onClick={() => onChange(v)}
          data-testid={testId && `${testId}-${v}`}
          className={clsx(
            "rounded-md px-3 py-1.5 font-medium",
            value === v ? "bg-paper-raised text-ink-900 shadow-card" : "text-ink-500 hover:text-ink-800",
          )}
        >
          {text}
        </button>
      ))}
    </div>
  );
}
