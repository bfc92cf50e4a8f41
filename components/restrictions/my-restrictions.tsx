import "server-only";
import { Card } from "@/components/ui/card";
import { listCurrentRestrictions } from "@/lib/data/restrictions";
import { describeRestriction } from "@/lib/restrictions/rules";
import { RestrictionCaution } from "./restriction-caution";

/** The athlete's own view: what their medical staff limit now or soon. Nothing at all when there is none. */
export async function MyRestrictions({
  teamId,
  athleteId,
  today,
}: {
  teamId: number;
  athleteId: number;
  today: string;
}) {
  const restrictions = await listCurrentRestrictions({ teamId, athleteId, today });
  if (restrictions.length === 0) return null;
  return (
    <Card className="p-4 sm:p-5" data-testid="my-restrictions">
      <h2 className="font-semibold text-ink-950">Limits from your medical staff</h2>
      <ul className="mt-2 divide-y divide-ink-100">
        {restrictions.map((r) => (
          <li key={r.id} className="py-2" data-testid="my-restriction-item">
            <p className="font-medium text-ink-900">{describeRestriction(r)}</p>
            <p className="mt-0.5 text-sm whitespace-pre-line text-ink-700">{r.note}</p>
            <p className="mt-0.5 text-xs text-ink-500">Set by {r.setByName}</p>
          </li>
        ))}
      </ul>
      <RestrictionCaution forAthlete className="mt-3" />
    </Card>
  );
}
