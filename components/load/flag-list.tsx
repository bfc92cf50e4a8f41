import Link from "next/link";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { FLAG_TOPIC, figuresHref } from "@/lib/load/figures-link";
import type { Flag } from "@/lib/load/flags";
import { FlagBadge } from "./flag-badge";

/** Each flag with the engine's reason, in words a coach can read. */
export function FlagList({ flags, empty = "No flags this week." }: { flags: readonly Flag[]; empty?: string }) {
  if (flags.length === 0) return <p className="text-sm text-ink-500">{empty}</p>;
  return (
    <ul className="space-y-2" data-testid="flag-list">
      {flags.map((f, i) => (
        <li
          key={`${f.kind}-${f.date}-${f.metric ?? ""}-${i}`}
          className="flex flex-col gap-1 sm:flex-row sm:items-start sm:gap-3"
        >
          <span className="flex shrink-0 items-center gap-2 sm:w-44">
            <FlagBadge kind={f.kind} provisional={f.provisional} />
            <span className="text-2xs text-ink-400">{formatDayLabel(f.date)}</span>
          </span>
          <span className="text-sm text-ink-700">
            {f.reason}{" "}
            <Link
              href={figuresHref(f.provisional ? "provisional" : FLAG_TOPIC[f.kind])}
              className="text-xs text-lane-700 underline"
              data-testid="flag-explain"
            >
              How this is worked out
            </Link>
          </span>
        </li>
      ))}
    </ul>
  );
}
