import { clsx } from "clsx";
import Link from "next/link";
import { figuresHref } from "@/lib/load/figures-link";
import { LOAD_CAUTION } from "@/lib/load/flag-display";

/** The monitoring caution every screen with load flags carries, with the way to how the figures are made. */
export function LoadCaution({ className }: { className?: string }) {
  return (
    <p
      data-testid="load-caution"
      className={clsx("rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600", className)}
    >
      <span className="font-semibold text-ink-800">Caution · </span>
      {LOAD_CAUTION}{" "}
      <Link href={figuresHref()} className="font-medium text-lane-700 underline" data-testid="figures-link">
        How these figures are worked out
      </Link>
    </p>
  );
}
