"use client";

import { useState } from "react";
import useSWR from "swr";
import { Card } from "@/components/ui/card";
import { restrictionApi } from "@/lib/client/api";
import { fetchJson } from "@/lib/client/fetcher";
import { restrictionKeys } from "@/lib/client/keys";
import type { OverrideRow } from "@/lib/data/restrictions";
import { isCurrent, type Restriction } from "@/lib/restrictions/rules";
import { OverrideLog } from "./override-log";
import { RestrictionCaution } from "./restriction-caution";
import { RestrictionForm } from "./restriction-form";
import { RestrictionItem } from "./restriction-item";

export type AthleteRestrictions = { restrictions: Restriction[]; overrides: OverrideRow[] };

/**
 * The athlete page's restrictions: what applies now or soon, what ended, and the coaches' overrides.
 * The medical staff (canEdit) also set new ones and lift them; everyone else reads.
 */
export function RestrictionsCard({
  athleteId,
  today,
  canEdit,
  initial,
}: {
  athleteId: number;
  today: string;
  canEdit: boolean;
  initial: AthleteRestrictions;
}) {
  const url = restrictionKeys.athlete(athleteId);
  const { data = initial, error, mutate } = useSWR<AthleteRestrictions>(url, fetchJson, { fallbackData: initial });
  // Soonest first for what still applies; the history stays newest first, as the server sends it.
  const current = data.restrictions
    .filter((r) => isCurrent(r, today))
    .sort((a, b) => a.startsOn.localeCompare(b.startsOn) || a.id - b.id);
  const past = data.restrictions.filter((r) => !isCurrent(r, today));

  const [failure, setFailure] = useState<string | null>(null);

  async function lift(r: Restriction) {
    setFailure(null);
    try {
      await restrictionApi.act(r.id, { action: "lift" });
    } catch (err) {
      setFailure((err as Error).message);
    }
    await mutate();
  }

  return (
    <Card className="p-4 sm:p-5" data-testid="restrictions-card">
      <h2 className="font-semibold text-ink-950">Restrictions</h2>
      <p className="mt-1 text-sm text-ink-500">
        Limits the medical staff put on this athlete&apos;s training. The week plan warns before a session breaks one.
      </p>
      {error || failure ? (
        <p role="alert" className="mt-3 text-sm text-form-error">
          {failure ?? (error as Error).message}
        </p>
      ) : null}

      {current.length === 0 ? (
        <p className="mt-4 rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-700" data-testid="restrictions-none">
          No restrictions now or coming up.
        </p>
      ) : (
        <ul className="mt-2 divide-y divide-ink-100" data-testid="restrictions-current">
          {current.map((r) => (
            <RestrictionItem key={r.id} restriction={r} today={today} onLift={canEdit ? lift : undefined} />
          ))}
        </ul>
      )}

      {past.length > 0 ? (
        <details className="mt-3 rounded-lg bg-paper-sunk/60 px-3 py-2" data-testid="restrictions-past">
          <summary className="cursor-pointer text-sm font-medium text-ink-700">Ended or lifted ({past.length})</summary>
          <ul className="divide-y divide-ink-100">
            {past.map((r) => (
              <RestrictionItem key={r.id} restriction={r} today={today} />
            ))}
          </ul>
        </details>
      ) : null}

      <OverrideLog overrides={data.overrides} />

      {canEdit ? (
        <div className="mt-5 border-t border-ink-100 pt-4">
          <RestrictionForm
            athleteId={athleteId}
            today={today}
            onSaved={async () => {
              await mutate();
            }}
          />
        </div>
      ) : null}

      <RestrictionCaution className="mt-5" />
    </Card>
  );
}
