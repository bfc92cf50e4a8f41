import { clsx } from "clsx";
import { Select } from "./field";

/** A table toolbar's choice: its label above a select of [value, words] options (the empty value: no filter). */
export function ToolbarSelect({
  label,
  value,
  onChange,
  options,
  testId,
  className,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly (readonly [string, string])[];
  testId?: string;
  className?: string;
}) {
  return (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
      {label}
      <Select
        className={clsx("w-44", className)}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        data-testid={testId}
      >
        {options.map(([v, words]) => (
          <option key={v} value={v}>
            {words}
          </option>
        ))}
      </Select>
    </label>
  );
}
