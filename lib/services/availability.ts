import "server-only";
import {
  availabilityLastDay,
  availabilityRule,
  AVAILABILITY_LABEL,
  type Availability,
} from "@/lib/availability/levels";
import { getAthlete } from "@/lib/data/athletes";
import { currentAvailability, insertAvailability } from "@/lib/data/availability";
import { getRestriction, insertRestriction, setRestrictionLifted } from "@/lib/data/restrictions";
import { inTransaction } from "@/lib/data/transaction";
import { AppError } from "@/lib/errors";
import type { SessionConflict } from "@/lib/restrictions/conflicts";
import type { AvailabilityInput } from "@/lib/validations/availability";
import { reportNewRestriction } from "./restriction-conflicts";

/**
 * The medical staff set an athlete's availability. Each level below full training is checked by the planner's
 * one guard as a restriction of its own (lib/availability/levels.ts), so a drop against it asks the coach for a
 * reason and alerts the physio like any restriction; the previous level's restriction is lifted from the new
 * first day. Sessions already planned that break the new level come back as `conflicts` and reach the coaches.
 */
export async function setAvailability({
  teamId,
  athleteId,
  actorUserId,
  input,
  today,
}: {
  teamId: number;
  athleteId: number;
  actorUserId: number;
  input: AvailabilityInput;
  today: string;
}): Promise<{ availability: Availability; conflicts: SessionConflict[] }> {
  if (!(await getAthlete({ teamId, athleteId }))) throw new AppError("not_found", "No such athlete");
  return inTransaction(async (transaction) => {
    const previous = (await currentAvailability({ teamId, athleteIds: [athleteId], transaction })).get(athleteId);
    if (previous?.restrictionId) {
      const old = await getRestriction({ teamId, restrictionId: previous.restrictionId, transaction });
      if (old.liftedOn === null && (old.endsOn === null || old.endsOn >= input.startsOn)) {
        const liftedOn = input.startsOn < old.startsOn ? old.startsOn : input.startsOn;
        await setRestrictionLifted({ restrictionId: old.id, liftedOn, liftedBy: actorUserId, transaction });
      }
    }
    const rule = availabilityRule(input.level);
    const returnOn = input.returnOn ?? null;
    const note = input.note || AVAILABILITY_LABEL[input.level];
    const restriction = rule
      ? await insertRestriction({
          teamId,
          athleteId,
          actorUserId,
          input: {
            ...rule,
            startsOn: input.startsOn,
            endsOn: availabilityLastDay({ returnOn }),
            note: `${AVAILABILITY_LABEL[input.level]}: ${note}`,
          },
          transaction,
        })
      : null;
    const availability = await insertAvailability({
      transaction,
      teamId,
      athleteId,
      level: input.level,
      startsOn: input.startsOn,
      returnOn,
      note,
      restrictionId: restriction?.id ?? null,
      createdBy: actorUserId,
    });
    const conflicts = restriction ? await reportNewRestriction({ transaction, teamId, restriction, today }) : [];
    return { availability, conflicts };
  });
}
