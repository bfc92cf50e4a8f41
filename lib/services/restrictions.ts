import "server-only";
import { getRestriction, insertRestriction, setRestrictionLifted } from "@/lib/data/restrictions";
import { inTeamTransaction } from "@/lib/data/transaction";
import type { Restriction } from "@/lib/restrictions/rules";
import type { CreateRestrictionInput } from "@/lib/validations/restrictions";

// The medical staff's restriction writes. The check every plan write passes against them is the guard
// (./restriction-guard.ts).

/** A physio sets a restriction on an athlete of their team (404 for an athlete elsewhere). */
export async function createRestriction(args: {
  teamId: number;
  athleteId: number;
  actorUserId: number;
  input: CreateRestrictionInput;
}): Promise<Restriction> {
  return inTeamTransaction(args.teamId, (transaction) => insertRestriction({ ...args, transaction }));
}

/**
 * Lifts a restriction from `today`: days from today on are free again. One that has not begun is lifted on its
 * first day, so it never applies. Lifting again, or lifting one that already ended, changes nothing.
 */
export async function liftRestriction({
  teamId,
  restrictionId,
  actorUserId,
  today,
}: {
  teamId: number;
  restrictionId: number;
  actorUserId: number;
  today: string;
}): Promise<Restriction> {
  return inTeamTransaction(teamId, async (transaction) => {
    const restriction = await getRestriction({ teamId, restrictionId, transaction });
    const ended = restriction.endsOn !== null && restriction.endsOn < today;
    if (restriction.liftedOn !== null || ended) return restriction;
    const liftedOn = today < restriction.startsOn ? restriction.startsOn : today;
    await setRestrictionLifted({ restrictionId, liftedOn, liftedBy: actorUserId, transaction });
    return { ...restriction, liftedOn };
  });
}
