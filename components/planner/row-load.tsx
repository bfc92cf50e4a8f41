"use client";

import Link from "next/link";
import { figuresHref } from "@/lib/load/figures-link";
import { clsx } from "clsx";
import { memo } from "react";
import { FLAG_DISPLAY, flagClasses } from "@/lib/load/flag-display";
import type { Flag } from "@/lib/load/flags";
import { formatNumber } from "@/lib/format/number";
import type { RowLoad } from "@/lib/plan/types";

type Figure = { key: string; label: string; unit: string; value: (l: RowLoad) => number };

const FIGURES: Figure[] = [
  { key: "srpe", label: "sRPE", unit: "AU", value: (l) => l.week.totals.srpe },
  { key: "hsr", label: "HSR", unit: "m", value: (l) => l.week.totals.hsrM },
  { key: "contacts", label: "Contacts", unit: "", value: (l) => l.week.totals.contacts },
];

function ratioText(l: RowLoad): string {
  return l.week.peakRatio === null ? "–" : l.week.peakRatio.toFixed(2);
}

/** The ACWR zone flag (spike, climbing, underloaded) of a row, if any. */
function zoneFlag(flags: readonly Flag[]): Flag | null {
  return flags.find((f) => f.kind === "spike" || f.kind === "rising" || f.kind === "low") ?? null;
}

/** Week totals and the ACWR badge of a row; while a drop is previewed, "now → would be". */
export const RowLoadSummary = memo(function RowLoadSummary({
  load,
  preview,
  raised = [],
}: {
  load: RowLoad;
  preview: RowLoad | null;
  raised?: readonly Flag[];
}) {
  const isNew = (kind: Flag["kind"]) => raised.some((f) => f.kind === kind);
  const shown = preview ?? load;
  const zone = zoneFlag(shown.flags);
  // One badge per kind; its tooltip carries every reason of that kind.
  const others = new Map<Flag["kind"], Flag[]>();
  for (const f of shown.flags)
    if (f !== zone && f.kind !== "low") others.set(f.kind, [...(others.get(f.kind) ?? []), f]);
  return (
    <div data-testid="row-load" data-previewing={preview ? "true" : undefined} className="mt-1 space-y-1">
      <dl className="flex flex-wrap gap-x-2.5 gap-y-0.5 text-2xs text-ink-500">
        {FIGURES.map((f) => {
          const now = f.value(load);
          const next = preview ? f.value(preview) : now;
          const changed = preview !== null && Math.round(next) !== Math.round(now);
          return (
            <div key={f.key} className="flex gap-1" data-testid={`total-${f.key}`} data-value={Math.round(next)}>
              <dt>{f.label}</dt>
              <dd className={clsx("font-medium tabular-nums", changed ? "text-lane-700" : "text-ink-800")}>
                {changed ? (
                  <>
                    <span className="text-ink-500 line-through decoration-ink-300">{formatNumber(now, 0)}</span>{" "}
                    {formatNumber(next, 0)}
                  </>
                ) : (
                  formatNumber(next, 0)
                )}
                {f.unit ? <span className="font-normal text-ink-500"> {f.unit}</span> : null}
              </dd>
            </div>
          );
        })}
      </dl>
      <div className="flex flex-wrap items-center gap-1">
        <span
          data-testid="acwr-badge"
          data-kind={zone?.kind ?? "steady"}
          title={zone?.reason ?? "ACWR within the comfortable range this week."}
          className={clsx(
            "inline-flex items-center gap-1 rounded-full border px-1.5 py-px text-2xs font-medium",
            zone ? flagClasses(zone.kind).badge : "border-flag-steady/40 bg-flag-steady-soft text-ink-900",
            zone && isNew(zone.kind) && "ring-2 ring-flag-spike/50 ring-offset-1",
          )}
        >
          ACWR {ratioText(shown)}
          {zone ? <span>· {FLAG_DISPLAY[zone.kind].label}</span> : null}
          {shown.week.ratioProvisional && shown.week.peakRatio !== null ? (
            <span className="font-normal">· provisional</span>
          ) : null}
        </span>
        <Link
          href={figuresHref(zone ? "zones" : "acwr")}
          className="text-2xs text-ink-500 underline hover:text-lane-700"
          data-testid="row-figures-link"
          aria-label="How these figures are worked out"
        >
          how?
        </Link>
        {[...others].map(([kind, list]) => (
          <span
            key={kind}
            title={list.map((f) => f.reason).join("\n")}
            data-testid="row-flag"
            data-kind={kind}
            className={clsx(
              "rounded-full border px-1.5 py-px text-2xs",
              flagClasses(kind).badge,
              isNew(kind) && "ring-2 ring-flag-spike/50 ring-offset-1",
            )}
          >
            {FLAG_DISPLAY[kind].label}
            {list.length > 1 ? ` ×${list.length}` : ""}
            <span className="sr-only">: {list.map((f) => f.reason).join(" ")}</span>
          </span>
        ))}
      </div>
    </div>
  );
});
