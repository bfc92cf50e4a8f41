import { clsx } from "clsx";

/** The monitoring caution every screen with load flags carries. */
export const LOAD_CAUTION_TEXT =
  "Load flags are monitoring aids, not diagnoses. Decide with the athlete's medical staff and follow your local rules.";

export function LoadCaution({ className }: { className?: string }) {
  return (
    <p data-testid="load-caution" className={clsx("rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600", className)}>
      <span className="font-semibold text-ink-800">Caution · </span>
      {LOAD_CAUTION_TEXT}
    </p>
  );
}
