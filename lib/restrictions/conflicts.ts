// Sessions already planned that a restriction (or an availability level) set later breaks. Pure and isomorphic.
import type { SessionStatus } from "@/lib/domain/sessions";
import { restrictionHits, type RestrictedSession, type Restriction, type RestrictionHit } from "./rules";

/** What the athlete's own screens show on a session the medical staff's change now conflicts with. */
export const MEDICAL_CHANGE_NOTICE = "Changed by your medical staff: check with your coach";

export type CheckedSession = RestrictedSession & { id: number; title: string; status: SessionStatus };

export type SessionConflict = RestrictionHit & { sessionId: number; title: string; status: SessionStatus };

/** The key of a session the coach already planned past a restriction with a reason (restriction_overrides). */
export const overrideKey = (restrictionId: number, sessionId: number) => `${restrictionId}:${sessionId}`;

/**
 * Every planned or published session that breaks a restriction, except where the coach already gave a reason
 * for exactly that restriction and session. Cancelled sessions break nothing. Ordered by day, then session.
 */
export function sessionConflicts(
  restrictions: readonly Restriction[],
  sessions: readonly CheckedSession[],
  overridden: ReadonlySet<string> = new Set(),
): SessionConflict[] {
  const out: SessionConflict[] = [];
  for (const s of sessions) {
    for (const hit of restrictionHits(restrictions, s)) {
      if (overridden.has(overrideKey(hit.restrictionId, s.id))) continue;
      out.push({ ...hit, sessionId: s.id, title: s.title, status: s.status });
    }
  }
  return out.sort((a, b) => a.date.localeCompare(b.date) || a.sessionId - b.sessionId);
}
