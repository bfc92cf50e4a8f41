"use client";

import { clsx } from "clsx";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { athleteReportApi } from "@/lib/client/api";
import { ApiError } from "@/lib/client/fetcher";
import { CHECK_IN_ITEMS, CHECK_IN_SCALE, type CheckInItem } from "@/lib/domain/wellbeing";

type Scores = Partial<Record<CheckInItem, number>>;

/**
 * Today's check-in: five rows of five taps (McLean et al. 2010's items, 5 the best) and one save, so it takes a
 * few seconds. Shown with today's answers once given, so a second tap replaces them.
 */
export function CheckInCard({ athleteId, today }: { athleteId: number; today: Scores | null }) {
  const router = useRouter();
  const [scores, setScores] = useState<Scores>(today ?? {});
  const [message, setMessage] = useState<string | null>(today ? "Checked in today." : null);
  const [saving, setSaving] = useState(false);
  const complete = CHECK_IN_ITEMS.every((k) => scores[k] !== undefined);
  const save = async () => {
    if (!complete) return;
    setSaving(true);
    try {
      await athleteReportApi.saveCheckIn(athleteId, scores as Record<CheckInItem, number>);
      setMessage("Checked in today. Thank you!");
      router.refresh();
    } catch (e) {
      setMessage(e instanceof ApiError ? e.message : "Could not save; check your connection and try again.");
    } finally {
      setSaving(false);
    }
  };
  return (
    <Card className="p-4" data-testid="check-in">
      <h2 className="font-semibold text-ink-950">How are you today?</h2>
      <p className="text-xs text-ink-500">1 is the worst, 5 the best. Wellness items after McLean et al. 2010.</p>
      <div className="mt-3 space-y-2">
        {CHECK_IN_ITEMS.map((item) => (
          <fieldset key={item} className="grid grid-cols-[4.5rem_1fr] items-center gap-2">
            <legend className="sr-only">{CHECK_IN_SCALE[item].label}</legend>
            <span aria-hidden className="text-sm font-medium text-ink-800">
              {CHECK_IN_SCALE[item].label}
            </span>
            <div className="grid grid-cols-5 gap-1">
              {CHECK_IN_SCALE[item].anchors.map((anchor, i) => (
                <label
                  key={anchor}
                  title={anchor}
                  className={clsx(
                    "flex min-h-11 cursor-pointer items-center justify-center rounded-lg bg-paper-raised text-sm",
                    "font-semibold ring-1 ring-ink-200 ring-inset has-[:checked]:bg-ink-900 has-[:checked]:text-paper",
                    "has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-lane-500",
                  )}
                >
                  <input
                    type="radio"
                    name={`check-in-${item}`}
                    value={i + 1}
                    checked={scores[item] === i + 1}
                    onChange={() => setScores({ ...scores, [item]: i + 1 })}
                    className="sr-only"
                    aria-label={`${i + 1}: ${anchor}`}
                    data-testid={`check-in-${item}-${i + 1}`}
                  />
                  {i + 1}
                </label>
              ))}
            </div>
          </fieldset>
        ))}
      </div>
      <div className="mt-3 flex items-center gap-3">
        <Button onClick={save} disabled={!complete || saving} data-testid="check-in-save">
          Save
        </Button>
        <p aria-live="polite" className="text-sm text-ink-700" data-testid="check-in-status">
          {message}
        </p>
      </div>
    </Card>
  );
}
