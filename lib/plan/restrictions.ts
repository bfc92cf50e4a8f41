import { newHits, restrictionHits, type Restriction, type RestrictionHit } from "@/lib/restrictions/rules";
import { affectedAthletes, sessionsAfter, tempIdCounter } from "./apply";
import { toBlockInput } from "./blocks";
import { findSession, type PlanChange } from "./drop";
import type { PlanSession, PlanWeek } from "./types";

/** The physio restrictions a session in the grid breaks (same check as the server's). */
export function sessionHits(week: { restrictions: readonly Restriction[] }, s: PlanSession): RestrictionHit[] {
  if (week.restrictions.length === 0) return [];
  return restrictionHits(week.restrictions, {
    athleteId: s.athleteId,
    date: s.date,
    status: s.status,
    blocks: s.blocks.map(toBlockInput),
  });
}

/**
 * What a drop would add against restrictions, computed in the browser before it is saved: the grid warns
 * while hovering and asks for a reason on drop. The server runs the same rules on the saved result.
 */
export function changeHits(week: PlanWeek, change: PlanChange): RestrictionHit[] {
  if (week.restrictions.length === 0) return [];
  const limited = new Set(week.restrictions.map((r) => r.athleteId));
  if (!affectedAthletes(week, change).some((id) => limited.has(id))) return [];
  const seen = new Set<string>();
  const out: RestrictionHit[] = [];
  // Far from the optimistic sessions' temporary ids, so a new session never matches one already shown.
  for (const list of sessionsAfter(week, change, tempIdCounter(-2_000_000_000)).values()) {
    for (const s of list) {
      const prev = findSession(week, s.id);
      for (const h of newHits(prev ? sessionHits(week, prev) : [], sessionHits(week, s))) {
        const key = `${h.restrictionId}:${h.athleteId}:${h.date}`;
        if (seen.has(key)) continue;
        seen.add(key);
        out.push(h);
      }
    }
  }
  return out;
}
