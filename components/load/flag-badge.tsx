import { clsx } from "clsx";
import Link from "next/link";
import { FlagShapeIcon } from "@/components/ui/flag-mark";
import { FLAG_TOPIC, figuresHref } from "@/lib/load/figures-link";
import { FLAG_DISPLAY, flagClasses } from "@/lib/load/flag-display";
import type { Flag, FlagKind } from "@/lib/load/flags";

/** One flag kind as a small pill with its shape and label; the title carries the one-line hint. */
export function FlagBadge({
  kind,
  count,
  provisional,
  className,
}: {
  kind: FlagKind;
  count?: number;
  provisional?: boolean;
  className?: string;
}) {
  const d = FLAG_DISPLAY[kind];
  return (
    <span
      data-testid="flag-badge"
      data-kind={kind}
      title={d.hint}
      className={clsx(
        "inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-2xs font-medium whitespace-nowrap",
        flagClasses(kind).badge,
        className,
      )}
    >
      <FlagShapeIcon kind={kind} />
      {d.label}
      {count && count > 1 ? <span className="font-normal">×{count}</span> : null}
      {provisional ? <span className="font-normal">(early)</span> : null}
    </span>
  );
}

/** The distinct kinds of a flag list with their counts, most serious first (the engine's order within a day). */
function flagKinds(flags: readonly Flag[]): { kind: FlagKind; count: number; provisional: boolean }[] {
  const order: FlagKind[] = ["spike", "rising", "weekly_jump", "plyo_volume", "recovery", "low"];
  const out = new Map<FlagKind, { kind: FlagKind; count: number; provisional: boolean }>();
  for (const f of flags) {
    const e = out.get(f.kind) ?? { kind: f.kind, count: 0, provisional: false };
    e.count++;
    e.provisional ||= Boolean(f.provisional);
    out.set(f.kind, e);
  }
  return [...out.values()].sort((a, b) => order.indexOf(a.kind) - order.indexOf(b.kind));
}

export function FlagBadges({ flags, empty = "Steady" }: { flags: readonly Flag[]; empty?: string }) {
  if (flags.length === 0) return <span className="text-2xs text-ink-400">{empty}</span>;
  return (
    <span className="flex flex-wrap gap-1">
      {flagKinds(flags).map((k) => (
        // Each badge opens its section of "How figures are worked out".
        <Link key={k.kind} href={figuresHref(k.provisional ? "provisional" : FLAG_TOPIC[k.kind])}>
          <FlagBadge kind={k.kind} count={k.count} provisional={k.provisional} />
        </Link>
      ))}
    </span>
  );
}
