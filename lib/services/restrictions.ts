import "server-only";
import { getRestriction, insertRestriction, setRestrictionLifted } from "@/lib/data/restrictions";
import { inTeamTransaction } from "@/lib/data/transaction";
import type { SessionConflict } from "@/lib/restrictions/conflicts";
import type { Restriction } from "@/lib/restrictions/rules";
import type { CreateRestrictionInput } from "@/lib/validations/restrictions";
import { reportNewRestriction } from "./restriction-conflicts";

// The medical staff's restriction writes. The check every plan write passes against them is the guard
// (./restriction-guard.ts).

/**
 * A physio sets a restriction on an athlete of their team (404 for an athlete elsewhere). The sessions already
 * planned that break it come back as `conflicts` and reach the coaches (./restriction-conflicts.ts).
 */
export async function createRestriction({
  today,
  ...args
}: {
  teamId: number;
  athleteId: number;
  actorUserId: number;
  input: CreateRestrictionInput;
  today: string;
}): Promise<{ restriction: Restriction; conflicts: SessionConflict[] }> {
  return inTeamTransaction(args.teamId, async (transaction) => {
    const restriction = await insertRestriction({ ...args, transaction });
    const conflicts = await reportNewRestriction({ transaction, teamId: args.teamId, restriction, today });
    return { restriction, conflicts };
  });
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
