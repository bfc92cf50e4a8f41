"use client";

import { clsx } from "clsx";
import { Select } from "@/components/ui/field";
import { BODY_REGION_LABEL, BODY_REGIONS, PAIN_MAX, type BodyRegion } from "@/lib/domain/wellbeing";
import type { PainReportInput } from "@/lib/validations/athlete-reports";

const LEVELS = Array.from({ length: PAIN_MAX + 1 }, (_, i) => i);

/** Pain or discomfort in the log sheet: where, how bad (0–10) and whether it stopped the session. */
export function PainFields({
  idPrefix,
  value,
  onChange,
  errors,
}: {
  idPrefix: string;
  value: PainReportInput | null;
  onChange: (next: PainReportInput | null) => void;
  errors: Record<string, string>;
}) {
  const on = value !== null;
  const set = (patch: Partial<PainReportInput>) => value && onChange({ ...value, ...patch });
  return (
    <fieldset
      className="space-y-3 rounded-lg bg-paper-raised p-3 ring-1 ring-ink-200 ring-inset"
      data-testid="log-pain"
    >
      <legend className="sr-only">Pain or discomfort</legend>
      <label className="flex min-h-11 cursor-pointer items-center gap-2 text-sm font-medium text-ink-800">
        <input
          type="checkbox"
          checked={on}
          onChange={(e) => onChange(e.target.checked ? { region: "calf", severity: 2, stoppedSession: false } : null)}
          className="h-5 w-5 accent-lane-600"
          data-testid="log-pain-toggle"
        />
        I had pain or discomfort
      </label>
      {value ? (
        <>
          <div className="space-y-1.5">
            <label htmlFor={`${idPrefix}-region`} className="block text-sm font-medium text-ink-800">
              Where?
            </label>
            <Select
              id={`${idPrefix}-region`}
              value={value.region}
              onChange={(e) => set({ region: e.target.value as BodyRegion })}
              data-testid="log-pain-region"
            >
              {BODY_REGIONS.map((r) => (
                <option key={r} value={r}>
                  {BODY_REGION_LABEL[r]}
                </option>
              ))}
            </Select>
          </div>
          <fieldset>
            <legend className="text-sm font-medium text-ink-800">How bad? 0 none, 10 the worst you can imagine</legend>
            <div className="mt-2 grid grid-cols-6 gap-1">
              {LEVELS.map((level) => (
                <label
                  key={level}
                  className={clsx(
                    "flex min-h-11 cursor-pointer items-center justify-center rounded-lg bg-paper text-sm font-semibold",
                    "ring-1 ring-ink-200 ring-inset has-[:checked]:bg-ink-900 has-[:checked]:text-paper",
                    "has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-lane-500",
                  )}
                >
                  <input
                    type="radio"
                    name={`${idPrefix}-severity`}
                    value={level}
                    checked={value.severity === level}
                    onChange={() => set({ severity: level })}
                    className="sr-only"
                    data-testid={`log-pain-severity-${level}`}
                  />
                  {level}
                </label>
              ))}
            </div>
            {errors["pain.severity"] ? (
              <p role="alert" className="mt-1 text-xs font-medium text-form-error">
                {errors["pain.severity"]}
              </p>
            ) : null}
          </fieldset>
          <label className="flex min-h-11 cursor-pointer items-center gap-2 text-sm text-ink-800">
            <input
              type="checkbox"
              checked={value.stoppedSession}
              onChange={(e) => set({ stoppedSession: e.target.checked })}
              className="h-5 w-5 accent-lane-600"
              data-testid="log-pain-stopped"
            />
            It stopped my session
          </label>
        </>
      ) : null}
    </fieldset>
  );
}
