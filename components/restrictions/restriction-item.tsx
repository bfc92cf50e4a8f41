"use client";

import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { formatDayShort } from "@/lib/format/dates";
import { describeRestriction, isActiveOn, lastDay, type Restriction } from "@/lib/restrictions/rules";

function status(r: Restriction, today: string): { label: string; tone: "spike" | "note" | "neutral" } {
  if (isActiveOn(r, today)) return { label: "In force", tone: "spike" };
  const last = lastDay(r);
  if (last === null || (today < r.startsOn && r.startsOn <= last))
    return { label: `From ${formatDayShort(r.startsOn)}`, tone: "note" };
  return { label: r.liftedOn ? "Lifted" : "Ended", tone: "neutral" };
}

/** One restriction: what it limits and when, the medical staff's note, who set it; a physio can lift it. */
export function RestrictionItem({
  restriction: r,
  today,
  onLift,
}: {
  restriction: Restriction;
  today: string;
  onLift?: (r: Restriction) => Promise<void>;
}) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const s = status(r, today);
  async function lift() {
    setBusy(true);
    try {
      await onLift?.(r);
    } finally {
      setBusy(false);
      setAsking(false);
    }
  }
  return (
    <li className="py-3" data-testid="restriction-item" data-restriction-id={r.id}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <p className="font-medium text-ink-900" data-testid="restriction-text">
          {describeRestriction(r)}
        </p>
        <Badge tone={s.tone}>{s.label}</Badge>
      </div>
      <p className="mt-1 text-sm whitespace-pre-line text-ink-700">{r.note}</p>
      <p className="mt-1 text-xs text-ink-500">Set by {r.setByName}</p>
      {onLift ? (
        <div className="mt-2 flex flex-wrap items-center gap-2">
          {asking ? (
            <>
              <span className="text-sm text-ink-700">Lift it from today? Coaches can plan this work again.</span>
              <Button
                size="sm"
                variant="danger"
                disabled={busy}
                onClick={() => void lift()}
                data-testid="lift-restriction-confirm"
              >
                Lift restriction
              </Button>
              <Button size="sm" variant="ghost" onClick={() => setAsking(false)}>
                Keep it
              </Button>
            </>
          ) : (
            <Button size="sm" variant="secondary" onClick={() => setAsking(true)} data-testid="lift-restriction">
              Lift
            </Button>
          )}
        </div>
      ) : null}
    </li>
  );
}
