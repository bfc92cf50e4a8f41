import { clsx } from "clsx";

/** Says who sets restrictions and what they are (and are not): shown wherever restrictions are listed. */
export function RestrictionCaution({ className, forAthlete = false }: { className?: string; forAthlete?: boolean }) {
  return (
    <p
      data-testid="restriction-caution"
      className={clsx("rounded-lg bg-paper-sunk px-3 py-2 text-xs text-ink-600", className)}
    >
      <span className="font-semibold text-ink-800">
        Set by {forAthlete ? "your" : "the athlete's"} medical staff ·{" "}
      </span>
      Load flags and restrictions are monitoring aids: they do not replace the medical team&apos;s judgement. Ask{" "}
      {forAthlete ? "them" : "the physio"} when in doubt.
    </p>
  );
}
