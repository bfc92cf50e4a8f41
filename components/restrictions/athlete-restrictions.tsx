import "server-only";
import { scopeOf } from "@/lib/auth/permissions";
import type { Viewer } from "@/lib/auth/access";
import { teamToday } from "@/lib/dates/zoned";
import { listAthleteRestrictions, listOverrides } from "@/lib/data/restrictions";
import { RestrictionsCard } from "./restrictions-card";

/** The athlete page's restrictions card, first drawn on the server with what the GET handler would answer. */
export async function AthleteRestrictions({ viewer, athleteId }: { viewer: Viewer; athleteId: number }) {
  const [restrictions, overrides] = await Promise.all([
    listAthleteRestrictions({ teamId: viewer.teamId, athleteId }),
    listOverrides({ teamId: viewer.teamId, athleteId }),
  ]);
  return (
    <RestrictionsCard
      athleteId={athleteId}
      today={teamToday({ timeZone: viewer.timeZone, now: new Date() })}
      canEdit={scopeOf(viewer.role, "restrictions:edit") === "team"}
      initial={{ restrictions, overrides }}
    />
  );
}
