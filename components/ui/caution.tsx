import { clsx } from "clsx";
import { LOAD_CAUTION } from "@/lib/load/flag-display";

/** The monitoring caution every screen with load flags carries. */
export function LoadCaution({ className }: { className?: string }) {
  return (
    <p data-testid="load-caution" className={clsx("rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600", className)}>
      <span className="font-semibold text-ink-800">Caution · </span>
      {LOAD_CAUTION}
    </p>
  );
}
