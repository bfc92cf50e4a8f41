import { Op } from "sequelize";
import { AVAILABILITY_LABEL, MODIFIED_MAX_PCT } from "@/lib/availability/levels";
import { refreshLedger } from "@/lib/data/ledger";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import { DEFAULT_PAIN_ALERT_ABOVE } from "@/lib/domain/wellbeing";
import { evaluateLoadAlerts } from "@/lib/notices/load-alerts";
import type { Db } from "@/models";
import { DEMO_STAFF, DEMO_TEAM } from "./demo-club";
import type { SeededClub } from "./seed-club";
import { SPIKE_ATHLETE } from "./seed-load";

/** The athlete on modified training, from today for ten days. */
export const MODIFIED_ATHLETE = "Priya Castellane";
/** The athlete whose latest log carries a mild calf pain report (at the team's line, so no alert). */
export const PAIN_ATHLETE = "Kofi Brannagh";
const MODIFIED_NOTE = "Calf strain settling. Running up to 85% of vmax and full strength work; no sprints yet.";

/**
 * Something for the physio to do when the demo opens: MODIFIED_ATHLETE on modified training (her running from
 * today capped at the level's intensity, so the plan breaks nothing), PAIN_ATHLETE's mild calf pain report on his
 * latest log (at the team's line, so it raises no alert), and the open spike alert that
 * SPIKE_ATHLETE's planned next week raises, filed as the planner would have filed it (no mail is sent for it).
 */
export async function seedMedical(d: Db, club: SeededClub, options: { today?: string } = {}): Promise<void> {
  const today = options.today ?? teamToday({ timeZone: DEMO_TEAM.timeZone, now: new Date() });
  const physio = club.userIds[DEMO_STAFF.find((s) => s.role === "physio")!.email];
  const priya = club.athleteIds[MODIFIED_ATHLETE];
  const returnOn = addDays(today, 10);
  await d.sequelize.transaction(async (transaction) => {
    const sessions = await d.PlannedSession.findAll({
      where: { teamId: club.teamId, athleteId: priya, date: { [Op.between]: [today, addDays(returnOn, -1)] } },
      attributes: ["id"],
      transaction,
    });
    const blocks = await d.SessionBlock.findAll({
      where: { sessionId: { [Op.in]: sessions.map((s) => s.id) } },
      transaction,
    });
    for (const b of blocks) {
      if (b.running && b.running.intensityPct > MODIFIED_MAX_PCT)
        await b.update({ running: { ...b.running, intensityPct: MODIFIED_MAX_PCT } }, { transaction });
    }
    const restriction = await d.Restriction.create(
      {
        teamId: club.teamId,
        athleteId: priya,
        rule: "max_intensity",
        blockKinds: null,
        limitValue: MODIFIED_MAX_PCT,
        startsOn: today,
        endsOn: addDays(returnOn, -1),
        liftedOn: null,
        note: `${AVAILABILITY_LABEL.modified}: ${MODIFIED_NOTE}`,
        createdBy: physio,
        liftedBy: null,
      },
      { transaction },
    );
    await d.AthleteAvailability.create(
      {
        teamId: club.teamId,
        athleteId: priya,
        level: "modified",
        startsOn: today,
        returnOn,
        note: MODIFIED_NOTE,
        restrictionId: restriction.id,
        createdBy: physio,
      },
      { transaction },
    );
    const logged = await d.SessionLog.findOne({
      where: { athleteId: club.athleteIds[PAIN_ATHLETE], completion: { [Op.ne]: "no" } },
      include: [{ model: d.PlannedSession, as: "session", where: { date: { [Op.lt]: today } }, required: true }],
      order: [[{ model: d.PlannedSession, as: "session" }, "date", "DESC"]],
      transaction,
    });
    if (logged?.session) {
      await d.PainReport.create(
        {
          teamId: club.teamId,
          athleteId: logged.athleteId,
          sessionId: logged.sessionId,
          date: logged.session.date,
          region: "calf",
          severity: DEFAULT_PAIN_ALERT_ABOVE,
          stoppedSession: false,
          alertId: null,
        },
        { transaction },
      );
      await logged.update({ notes: "Left calf a bit tight on the last run." }, { transaction });
    }
    await refreshLedger({ transaction });
    const nextWeek = addDays(startOfWeek(today, DEMO_TEAM.weekStartDay), 7);
    const ids = await evaluateLoadAlerts({
      transaction,
      teamId: club.teamId,
      athletes: [{ athleteId: club.athleteIds[SPIKE_ATHLETE], dates: [nextWeek] }],
      basis: "planned",
      today,
    });
    // Filed before anyone was watching: the demo's mailboxes start empty.
    for (const id of ids)
      await d.OutboxMessage.destroy({ where: { dedupeKey: { [Op.like]: `alert:${id}:user:%` } }, transaction });
    // Like every seeder, leave the ledger to its first reader: the team's athletes marked from their first day.
    await d.sequelize.query(
      "INSERT INTO load_ledger_dirty (athlete_id, from_date) SELECT id, '0000-01-01' FROM athletes WHERE team_id = ? " +
        "ON CONFLICT (athlete_id) DO UPDATE SET from_date = excluded.from_date",
      { replacements: [club.teamId], transaction },
    );
  });
}
