"use client";

import { clsx } from "clsx";
import { CR10_ANCHORS, CR10_SOURCE, CR10_STEPS } from "@/lib/domain/rpe";

/** Session RPE as eleven big choices with the scale's own words beside them (Foster et al. 2001, Table 1). */
export function RpeScale({
  name,
  value,
  onChange,
  error,
  testId = "log-rpe",
}: {
  name: string;
  value: number | null;
  onChange: (rpe: number) => void;
  error?: string;
  testId?: string;
}) {
  return (
    <fieldset data-testid={testId}>
      <legend className="text-sm font-medium text-ink-800">How hard was the whole session?</legend>
      <p className="text-xs text-ink-500">Think about it about 30 minutes after. {CR10_SOURCE}.</p>
      <div className="mt-2 grid grid-cols-1 gap-1">
        {CR10_STEPS.map((step) => (
          <label
            key={step}
            className={clsx(
              "flex min-h-10 cursor-pointer items-center gap-3 rounded-lg bg-paper-raised px-3 text-sm",
              "ring-1 ring-ink-200 ring-inset has-[:checked]:ring-2 has-[:checked]:ring-lane-500",
            )}
          >
            <input
              type="radio"
              name={name}
              value={step}
              checked={value === step}
              onChange={() => onChange(step)}
              className="accent-lane-600"
              data-testid={`log-rpe-${step}`}
            />
            <span className="w-5 text-right font-semibold tabular-nums">{step}</span>
            <span className="text-ink-700">{CR10_ANCHORS[step] ?? ""}</span>
          </label>
        ))}
      </div>
      {error ? (
        <p role="alert" className="mt-1 text-xs font-medium text-form-error">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
