"use client";

import { clsx } from "clsx";
import { FLAG_DISPLAY, flagClasses } from "@/lib/load/flag-display";
import { formatNumber } from "@/lib/format/number";
import type { RowPreview } from "@/lib/plan/preview";
import type { PlanWeek } from "@/lib/plan/types";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { useHover, type HoverStore } from "./hover-store";

/**
 * While something is dragged over a day: what the drop would do and which flags it would raise, with the
 * reasons. It floats at the bottom of the screen so the grid never shifts under the pointer.
 */
export function DropPreviewPanel({ store, week, copying }: { store: HoverStore; week: PlanWeek; copying: boolean }) {
  const hover = useHover(store);
  if (!hover || (!hover.refusal && !hover.text)) return null;
  return (
    <PreviewCard
      week={week}
      text={hover.text}
      refusal={hover.refusal}
      rows={[...hover.rows.values()]}
      hits={hover.hits}
      copying={copying}
    />
  );
}

function PreviewCard({
  week,
  text,
  refusal,
  rows,
  hits,
  copying,
}: {
  week: PlanWeek;
  text: string;
  refusal: string | null;
  rows: RowPreview[];
  hits: readonly RestrictionHit[];
  copying: boolean;
}) {
  const name = (id: number) => week.athletes.find((a) => a.id === id)?.name ?? "";
  const warned = rows.filter((r) => r.warnings.length > 0);
  const flagged = warned.length > 0 || hits.length > 0;
  return (
    <div className="pointer-events-none fixed inset-x-0 bottom-4 z-40 flex justify-center px-4">
      <div
        data-testid="drop-preview"
        className={clsx(
          "w-full max-w-2xl rounded-lg bg-paper-raised px-4 py-3 text-sm shadow-lift ring-1",
          flagged ? "ring-flag-spike/30" : "ring-ink-100",
        )}
      >
        {refusal ? (
          <p className="font-medium text-ink-900">{refusal}</p>
        ) : (
          <>
            <p className="text-ink-800">
              {copying ? <strong className="mr-1 text-lane-700">Copy:</strong> : null}
              Drop to make {text}.
            </p>
            {hits.length > 0 ? (
              <ul data-testid="drop-restrictions" className="mt-2 space-y-1">
                {hits.map((h) => (
                  <li
                    key={`${h.restrictionId}:${h.date}`}
                    data-testid="drop-restriction"
                    className="rounded-md border border-dashed border-limit bg-limit-soft px-2 py-1 text-xs text-ink-800"
                  >
                    <span className="font-semibold">{name(h.athleteId)} · Physio restriction:</span> {h.rule}.{" "}
                    {h.detail}.
                  </li>
                ))}
                <li className="text-2xs text-ink-500">
                  Dropping asks you for a reason, which goes to the medical staff.
                </li>
              </ul>
            ) : null}
            {rows.length === 1 && warned.length === 0 ? (
              <p className="mt-0.5 text-xs text-ink-500">
                sRPE {formatNumber(rows[0].before.week.totals.srpe, 0)} →{" "}
                {formatNumber(rows[0].after.week.totals.srpe, 0)} AU · no new flags.
              </p>
            ) : null}
            {rows.length > 1 && warned.length === 0 ? (
              <p className="mt-0.5 text-xs text-ink-500">No new flags for the {rows.length} athletes.</p>
            ) : null}
            {warned.map((r) => (
              <ul
                key={r.athleteId}
                data-testid="drop-warnings"
                data-athlete-id={r.athleteId}
                className="mt-2 space-y-1"
              >
                {r.warnings.map((f) => (
                  <li
                    key={`${f.kind}${f.date}${f.metric ?? ""}`}
                    data-testid="drop-warning"
                    data-kind={f.kind}
                    className={clsx("rounded-md border px-2 py-1 text-xs", flagClasses(f.kind).badge)}
                  >
                    <span className="font-semibold">
                      {name(r.athleteId)} · {FLAG_DISPLAY[f.kind].label}:
                    </span>{" "}
                    {f.reason}
                  </li>
                ))}
              </ul>
            ))}
            {warned.length > 0 ? (
              <p className="mt-2 text-2xs text-ink-500">
                The drop is allowed. Flags are monitoring aids; check with the athlete&apos;s medical staff if in doubt.
              </p>
            ) : null}
          </>
        )}
      </div>
    </div>
  );
}
