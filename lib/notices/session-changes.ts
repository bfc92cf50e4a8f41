import type { SessionChange } from "@/lib/plan/changes";

/**
 * A session moved to another athlete is, for notices, two changes: it left the first athlete (their load drops,
 * their calendar gets a cancellation) and arrived with the second (their load rises, they get an invitation).
 */
export function splitAthleteMoves(changes: readonly SessionChange[]): SessionChange[] {
  return changes.flatMap((c) => {
    if (!c.before || !c.after || c.before.athleteId === c.after.athleteId) return [c];
    return [
      { kind: "deleted", athleteId: c.before.athleteId, sessionId: c.sessionId, before: c.before, after: null },
      { kind: "created", athleteId: c.after.athleteId, sessionId: c.sessionId, before: null, after: c.after },
    ];
  });
}
