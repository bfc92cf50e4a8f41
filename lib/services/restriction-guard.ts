import "server-only";
import type { Transaction } from "sequelize";
import { restrictionOverrideEmail } from "@/emails/restriction-override";
import { addOverrideAlert } from "@/lib/data/alerts";
import { athleteNames } from "@/lib/data/athletes";
import { getNoticeTeam, getPerson, listAlertRecipients } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { insertOverride, listRestrictions } from "@/lib/data/restrictions";
import { AppError } from "@/lib/errors";
import { appUrl } from "@/lib/env";
import { startOfWeek } from "@/lib/dates/plain-date";
import { kickOutbox } from "@/lib/notices/outbox-worker";
import type { Override, SessionChange } from "@/lib/plan/changes";
import { newHits, restrictionHits, type RestrictionHit } from "@/lib/restrictions/rules";

export type Hit = RestrictionHit & { sessionId: number };

/** What the changes add against the athletes' restrictions (sessions already let through are not asked again). */
async function hitsOf(teamId: number, changes: readonly SessionChange[], transaction: Transaction): Promise<Hit[]> {
  const athleteIds = [...new Set(changes.flatMap((c) => (c.after ? [c.after.athleteId] : [])))];
  if (athleteIds.length === 0) return [];
  const restrictions = await listRestrictions({ teamId, athleteIds, transaction });
  if (restrictions.length === 0) return [];
  return changes.flatMap((c) => {
    if (!c.after) return [];
    const before = c.before ? restrictionHits(restrictions, c.before) : [];
    return newHits(before, restrictionHits(restrictions, c.after)).map((h) => ({ ...h, sessionId: c.sessionId }));
  });
}

/**
 * The one check every plan write passes, inside its transaction: a change that breaks a physio restriction
 * is refused (409 "restricted", with the hits) unless it carries the coach's reason. With a reason it is
 * saved, the override is recorded, and the medical staff get an alert and (by their e-mail choice) a mail.
 * Returns the hits let through, so the athlete's calendar mail can say which restriction was planned past.
 */
export async function guardRestrictions({
  transaction,
  teamId,
  actorUserId,
  changes,
  override,
}: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  changes: readonly SessionChange[];
  override?: Override | null;
}): Promise<Hit[]> {
  const hits = await hitsOf(teamId, changes, transaction);
  if (hits.length === 0) return hits;
  if (!override) {
    const first = hits[0]!;
    const more = hits.length > 1 ? ` (and ${hits.length - 1} more)` : "";
    throw new AppError(
      "restricted",
      `This goes past a restriction from the medical staff: ${first.rule}. ${first.detail}${more}. Give a reason to plan it anyway.`,
      { details: { hits } },
    );
  }
  await recordOverrides({ transaction, teamId, actorUserId, hits, reason: override.reason });
  return hits;
}

async function recordOverrides({
  transaction,
  teamId,
  actorUserId,
  hits,
  reason,
}: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  hits: readonly Hit[];
  reason: string;
}) {
  const team = await getNoticeTeam({ teamId, transaction });
  const coach = await getPerson({ userId: actorUserId, transaction });
  const staff = (await listAlertRecipients({ teamId, transaction })).filter(
    (r) => r.role === "physio" && r.alertEmail === "each" && r.userId !== actorUserId,
  );
  const nameOf = await athleteNames({ athleteIds: hits.map((h) => h.athleteId), transaction });
  for (const h of hits) {
    const overrideId = await insertOverride({
      transaction,
      teamId,
      restrictionId: h.restrictionId,
      athleteId: h.athleteId,
      sessionId: h.sessionId,
      sessionDate: h.date,
      detail: h.detail,
      reason,
      userId: actorUserId,
    });
    const athleteName = nameOf.get(h.athleteId) ?? "An athlete";
    const text = `${coach?.name ?? "A coach"} planned ${h.detail} on this day against "${h.rule}". Reason: ${reason}`;
    const weekStart = startOfWeek(h.date, team?.weekStartDay ?? 1);
    await addOverrideAlert({ transaction, teamId, athleteId: h.athleteId, date: h.date, weekStart, text });
    for (const r of staff) {
      await enqueueMail({
        transaction,
        teamId,
        kind: "alert",
        to: r.email,
        mail: restrictionOverrideEmail({
          recipientName: r.name,
          teamName: team?.name ?? "your team",
          athleteName,
          coachName: coach?.name ?? "A coach",
          date: h.date,
          rule: h.rule,
          detail: h.detail,
          reason,
          athleteUrl: `${appUrl().replace(/\/+$/, "")}/squad/${h.athleteId}`,
        }),
        dedupeKey: `override:${overrideId}:user:${r.userId}`,
      });
    }
  }
  if (staff.length > 0) transaction.afterCommit(() => kickOutbox());
}
