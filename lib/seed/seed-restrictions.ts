import { Op, type Transaction } from "sequelize";
import { teamToday } from "@/lib/dates/zoned";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import type { Db } from "@/models";
import { DEMO_STAFF, DEMO_TEAM } from "./demo-club";
import { DEMO_TEMPLATES } from "./load-templates";
import type { SeededClub } from "./seed-club";

/** The athlete with a current restriction: no max-velocity running until the end of this week. */
export const RESTRICTED_ATHLETE = "Dario Mbeki-Hart";
/** The athlete whose restriction ended weeks ago (history only). */
export const PAST_RESTRICTED_ATHLETE = "Ines Rowbotham";

const NOTE =
  "Left hamstring tightness after Saturday's session. Acceleration work to 20 m and tempo are fine; no flying sprints until reviewed.";

/**
 * The demo's restrictions, set by the demo physio: one current (RESTRICTED_ATHLETE, from four days ago to the
 * end of the team's week) and one that ended weeks ago. The plan already respects the current one: inside its
 * days, RESTRICTED_ATHLETE's max-velocity blocks become short block starts, so the demo opens without a breach.
 */
export async function seedRestrictions(d: Db, club: SeededClub, options: { today?: string } = {}): Promise<void> {
  const today = options.today ?? teamToday({ timeZone: DEMO_TEAM.timeZone, now: new Date() });
  const weekStart = startOfWeek(today, DEMO_TEAM.weekStartDay);
  const physio = club.userIds[DEMO_STAFF.find((s) => s.role === "physio")!.email];
  const dario = club.athleteIds[RESTRICTED_ATHLETE];
  const startsOn = addDays(today, -4);
  const endsOn = addDays(weekStart, 6);
  await d.sequelize.transaction(async (transaction) => {
    await swapMaxVelocity(d, { teamId: club.teamId, athleteId: dario, from: startsOn, to: endsOn, transaction });
    await d.Restriction.bulkCreate(
      [
        {
          teamId: club.teamId,
          athleteId: dario,
          rule: "no_kind",
          blockKinds: JSON.stringify(["max_velocity"]),
          limitValue: null,
          startsOn,
          endsOn,
          liftedOn: null,
          note: NOTE,
          createdBy: physio,
          liftedBy: null,
        },
        {
          teamId: club.teamId,
          athleteId: club.athleteIds[PAST_RESTRICTED_ATHLETE],
          rule: "contact_cap",
          blockKinds: null,
          // Above what her plan held in those weeks (90 contacts at most): a cap the coach planned within.
          limitValue: 100,
          startsOn: addDays(weekStart, -42),
          endsOn: addDays(weekStart, -29),
          liftedOn: null,
          note: "Right Achilles irritation. Keep plyometric volume moderate and skip extra bounding until reassessed.",
          createdBy: physio,
          liftedBy: null,
        },
      ],
      { transaction },
    );
  });
}

/** Replaces the athlete's max-velocity blocks between two days (inclusive) by block starts of the same scale. */
async function swapMaxVelocity(
  d: Db,
  {
    teamId,
    athleteId,
    from,
    to,
    transaction,
  }: { teamId: number; athleteId: number; from: string; to: string; transaction: Transaction },
) {
  const flying = DEMO_TEMPLATES.find((t) => t.key === "flying30")!;
  const starts = DEMO_TEMPLATES.find((t) => t.key === "blockStarts")!;
  const template = await d.BlockTemplate.findOne({
    where: { teamId, title: starts.title },
    attributes: ["id"],
    transaction,
  });
  const sessions = await d.PlannedSession.findAll({
    where: { teamId, athleteId, date: { [Op.between]: [from, to] } },
    attributes: ["id", "title"],
    transaction,
  });
  for (const session of sessions) {
    const blocks = await d.SessionBlock.findAll({
      where: { sessionId: session.id, kind: "max_velocity" },
      transaction,
    });
    if (blocks.length === 0) continue;
    for (const block of blocks) {
      // Keep the session's volume wave: the same share of the template's reps.
      const scale = (block.running?.reps ?? flying.running!.reps) / flying.running!.reps;
      const running = { ...starts.running!, reps: Math.max(1, Math.round(starts.running!.reps * scale)) };
      await block.update(
        { kind: starts.kind, title: starts.title, templateId: template?.id ?? null, running, notes: starts.notes },
        { transaction },
      );
    }
    await session.update({ title: "Acceleration (no flying sprints)" }, { transaction });
  }
}
