import "server-only";
import type { Transaction } from "sequelize";
import { medicalChangeEmail } from "@/emails/medical-change";
import { restrictionConflictsEmail } from "@/emails/restriction-conflicts";
import { addOverrideAlert } from "@/lib/data/alerts";
import { athleteNames } from "@/lib/data/athletes";
import {
  getNoticeTeam,
  listAlertRecipients,
  listAthleteContacts,
  type NoticeTeam,
} from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { listSessionConflicts } from "@/lib/data/session-conflicts";
import { formatDayLabel, startOfWeek } from "@/lib/dates/plain-date";
import { appUrl } from "@/lib/env";
import { kickOutbox } from "@/lib/notices/outbox-worker";
import type { SessionConflict } from "@/lib/restrictions/conflicts";
import type { Restriction } from "@/lib/restrictions/rules";

/**
 * A restriction (or availability level) just set, inside its transaction: every planned or published session
 * from today on that breaks it is listed, the coaches get one alert per week it touches (the team's inbox) and a
 * mail with the list, and the athlete a mail about the published ones (what their screens mark "changed by your
 * medical staff: check with your coach"), so nothing planned before the medical staff's change goes ahead unseen.
 */
export async function reportNewRestriction({
  transaction,
  teamId,
  restriction,
  today,
}: {
  transaction: Transaction;
  teamId: number;
  restriction: Restriction;
  today: string;
}): Promise<SessionConflict[]> {
  const from = restriction.startsOn > today ? restriction.startsOn : today;
  const conflicts = await listSessionConflicts({ teamId, from, restrictions: [restriction], transaction });
  if (conflicts.length === 0) return conflicts;
  const team = await getNoticeTeam({ teamId, transaction });
  const weekStartDay = team?.weekStartDay ?? 1;
  const athleteName = (await athleteNames({ athleteIds: [restriction.athleteId], transaction })).get(
    restriction.athleteId,
  );
  const byWeek = new Map<string, SessionConflict[]>();
  for (const c of conflicts) {
    const week = startOfWeek(c.date, weekStartDay);
    byWeek.set(week, [...(byWeek.get(week) ?? []), c]);
  }
  const rule = conflicts[0]!.rule;
  for (const [weekStart, list] of byWeek) {
    const lines = list.map((c) => `${formatDayLabel(c.date)} ${c.title} (${c.status}): ${c.detail}`);
    await addOverrideAlert({
      transaction,
      teamId,
      athleteId: restriction.athleteId,
      date: list[0]!.date,
      weekStart,
      kind: "restriction_conflict",
      count: list.length,
      text: `${restriction.setByName} set "${rule}". Planned before it and breaking it: ${lines.join("; ")}`,
    });
  }
  const coaches = (await listAlertRecipients({ teamId, transaction })).filter((r) => r.role !== "physio");
  for (const r of coaches) {
    await enqueueMail({
      transaction,
      teamId,
      kind: "alert",
      to: r.email,
      mail: restrictionConflictsEmail({
        recipientName: r.name,
        teamName: team?.name ?? "your team",
        athleteName: athleteName ?? "An athlete",
        setByName: restriction.setByName,
        rule,
        note: restriction.note,
        sessions: conflicts.map((c) => ({ date: c.date, title: c.title, detail: c.detail })),
        planUrl: `${appUrl().replace(/\/+$/, "")}/plan?week=${startOfWeek(conflicts[0]!.date, weekStartDay)}`,
      }),
      dedupeKey: `conflicts:${restriction.id}:user:${r.userId}`,
    });
  }
  const athleteMailed = await mailAthlete({ transaction, teamId, restriction, rule, conflicts, team });
  if (coaches.length > 0 || athleteMailed) transaction.afterCommit(() => kickOutbox());
  return conflicts;
}

/** Drafts were never sent to the athlete: only published sessions are theirs to hear about. */
async function mailAthlete({
  transaction,
  teamId,
  restriction,
  rule,
  conflicts,
  team,
}: {
  transaction: Transaction;
  teamId: number;
  restriction: Restriction;
  rule: string;
  conflicts: readonly SessionConflict[];
  team: NoticeTeam | null;
}): Promise<boolean> {
  const published = conflicts.filter((c) => c.status === "published");
  if (published.length === 0) return false;
  const contact = (await listAthleteContacts({ teamId, athleteIds: [restriction.athleteId], transaction })).get(
    restriction.athleteId,
  );
  if (!contact) return false;
  await enqueueMail({
    transaction,
    teamId,
    kind: "alert",
    to: contact.email,
    mail: medicalChangeEmail({
      athleteName: contact.name,
      teamName: team?.name ?? "your team",
      rule,
      sessions: published.map((c) => ({ date: c.date, title: c.title, detail: c.detail })),
      planUrl: `${appUrl().replace(/\/+$/, "")}/me#session-${published[0]!.sessionId}`,
    }),
    dedupeKey: `conflicts:${restriction.id}:athlete`,
  });
  return true;
}
