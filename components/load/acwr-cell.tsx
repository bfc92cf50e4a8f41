import { clsx } from "clsx";
import Link from "next/link";
import { figuresHref } from "@/lib/load/figures-link";
import { FLAG_DISPLAY, flagClasses } from "@/lib/load/flag-display";
import type { Flag } from "@/lib/load/flags";
import { formatRatio } from "@/lib/load/format";

const ZONE_KINDS = new Set(["spike", "rising", "low"]);

/** The week's peak ratio with its zone: the engine's ACWR flag when there is one, else "In range". */
export function AcwrCell({
  row,
}: {
  row: { ratio: number | null; ratioProvisional: boolean; flags: readonly Flag[] };
}) {
  if (row.ratio === null)
    return (
      <span className="text-2xs text-ink-400" title="No chronic load yet, so no ratio">
        no ratio
      </span>
    );
  const zone = row.flags.find((f) => ZONE_KINDS.has(f.kind));
  const tone = zone ? flagClasses(zone.kind).badge : "bg-flag-steady-soft text-flag-steady border-transparent";
  const label = zone ? FLAG_DISPLAY[zone.kind].label : "In range";
  return (
    <span className="flex items-center justify-end gap-2" data-testid="acwr-cell" data-ratio={row.ratio.toFixed(3)}>
      <Link
        href={figuresHref("acwr")}
        className="font-medium text-ink-900 tabular-nums hover:underline"
        title="How the ratio is worked out"
      >
        {formatRatio(row.ratio)}
        {row.ratioProvisional ? (
          <sup title="Provisional: under 28 days of history" className="ml-0.5 text-ink-400">
            *
          </sup>
        ) : null}
      </Link>
      <Link
        href={figuresHref("zones")}
        className={clsx("rounded-full border px-1.5 py-0.5 text-2xs font-medium whitespace-nowrap", tone)}
        title={zone?.reason}
      >
        {label}
      </Link>
    </span>
  );
}
