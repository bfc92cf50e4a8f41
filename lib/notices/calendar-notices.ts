import "server-only";
import type { Transaction } from "sequelize";
import type { RenderedEmail } from "@/emails/layout";
import { sessionCancelledEmail } from "@/emails/session-cancelled";
import { sessionInvitationsEmail } from "@/emails/session-invitations";
import { sessionUpdatedEmail } from "@/emails/session-updated";
import { buildInvite } from "@/lib/calendar/invite";
import type { CalendarSession } from "@/lib/calendar/types";
import { getNoticeTeam, getPerson, listAthleteContacts, type NoticeTeam } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { appUrl } from "@/lib/env";
import { startOfWeek } from "@/lib/dates/plain-date";
import type { SessionChange, SessionSnapshot } from "@/lib/plan/changes";
import type { RestrictionHit } from "@/lib/restrictions/rules";
import { medicalNote } from "@/emails/medical-notes";

/** Restrictions a change was let past with the coach's reason (lib/services/restriction-guard.ts). */
export type PlannedPast = { hits: ReadonlyArray<RestrictionHit & { sessionId: number }>; reason: string };

export type CalendarAction =
  { method: "REQUEST"; update: boolean; session: CalendarSession } | { method: "CANCEL"; session: CalendarSession };

function toCalendarSession(s: SessionSnapshot, overrides: Partial<CalendarSession> = {}): CalendarSession {
  return {
    id: String(s.id),
    date: s.date,
    startTime: s.startTime,
    durationMin: s.durationMin,
    title: s.title,
    status: s.status,
    sequence: s.sequence,
    updatedAt: s.updatedAt,
    blocks: s.blocks,
    notes: s.notes,
    ...overrides,
  };
}

// What an attendee sees of a session; a change elsewhere (a draft note, the lock version) sends nothing.
function visibleChange(a: SessionSnapshot, b: SessionSnapshot): boolean {
  return (
    a.sequence !== b.sequence ||
    a.date !== b.date ||
    a.startTime !== b.startTime ||
    a.durationMin !== b.durationMin ||
    a.title !== b.title ||
    (a.notes ?? "") !== (b.notes ?? "") ||
    JSON.stringify(a.blocks) !== JSON.stringify(b.blocks)
  );
}

/**
 * The iTIP message a change calls for (RFC 5546 §3.2): REQUEST when a session becomes visible or a visible
 * one changes, CANCEL when a published session is cancelled, unpublished or deleted; nothing for drafts.
 * A CANCEL's SEQUENCE must not be lower than the last REQUEST's (message sequencing, §2.1.4 from memory), so it is one above.
 */
export function calendarActionFor(change: SessionChange): CalendarAction | null {
  const { before, after } = change;
  const wasVisible = before?.status === "published";
  const isVisible = after?.status === "published";
  if (after && isVisible) {
    if (!wasVisible) return { method: "REQUEST", update: false, session: toCalendarSession(after) };
    if (before && visibleChange(before, after)) {
      return {
        method: "REQUEST",
        update: true,
        session: toCalendarSession(after, { sequence: Math.max(after.sequence, before.sequence + 1) }),
      };
    }
    return null;
  }
  if (!wasVisible || !before) return null;
  const last = after ?? before;
  return {
    method: "CANCEL",
    session: toCalendarSession(last, { sequence: Math.max(last.sequence, before.sequence + 1), status: "cancelled" }),
  };
}

function meUrl(base: string): string {
  return `${base}/me`;
}

/** Queues the invitations, updates and cancellations a plan change calls for, one mail per athlete and kind. */
export async function queueCalendarNotices({
  transaction,
  teamId,
  actorUserId,
  changes,
  overrides = null,
}: {
  transaction: Transaction;
  teamId: number;
  actorUserId: number;
  changes: readonly SessionChange[];
  overrides?: PlannedPast | null;
}): Promise<number> {
  const actions = changes
    .map((c) => ({ athleteId: c.athleteId, action: calendarActionFor(c) }))
    .filter((a): a is { athleteId: number; action: CalendarAction } => a.action !== null);
  if (actions.length === 0) return 0;
  const team = await getNoticeTeam({ teamId, transaction });
  if (!team) return 0;
  const contacts = await listAthleteContacts({
    teamId,
    athleteIds: [...new Set(actions.map((a) => a.athleteId))],
    transaction,
  });
  const organizer = (await getPerson({ userId: actorUserId, transaction })) ?? {
    name: team.name,
    email: "no-reply@sprintwright.local",
  };
  const base = appUrl();
  const sessionUrl = (s: CalendarSession) => `${base}/me#session-${s.id}`;
  let queued = 0;

  for (const [athleteId, contact] of contacts) {
    const mine = actions.filter((a) => a.athleteId === athleteId).map((a) => a.action);
    const medicalNotesOf = (sessions: readonly CalendarSession[]) => {
      const ids = new Set(sessions.map((s) => Number(s.id)));
      return (overrides?.hits ?? [])
        .filter((h) => h.athleteId === athleteId && ids.has(h.sessionId))
        .map((h) => medicalNote(h, overrides!.reason));
    };
    const send = async (method: "REQUEST" | "CANCEL", sessions: CalendarSession[], mail: RenderedEmail) => {
      let icalEvent: { method: typeof method; content: string } | null = null;
      try {
        icalEvent = {
          method,
          content: buildInvite({
            method,
            team,
            organizer,
            attendee: { name: contact.name, email: contact.email },
            sessions,
            appUrl: base,
            sessionUrl,
          }),
        };
      } catch (err) {
        // The coach's plan change must not fail over a calendar attachment: the mail still lists the sessions.
        console.error(`[notices] no calendar attachment for ${contact.email}:`, err);
      }
      await enqueueMail({
        transaction,
        teamId,
        kind: method === "CANCEL" ? "calendar_cancel" : "calendar_request",
        to: contact.email,
        mail,
        icalEvent,
      });
      queued += 1;
    };
    for (const [weekStart, sessions] of byWeek(
      team,
      mine.filter((a) => a.method === "REQUEST" && !a.update),
    )) {
      await send(
        "REQUEST",
        sessions,
        sessionInvitationsEmail({
          athleteName: contact.name,
          teamName: team.name,
          coachName: organizer.name,
          weekStart,
          sessions,
          planUrl: meUrl(base),
          feedUrl: `${meUrl(base)}#calendar`,
          medicalNotes: medicalNotesOf(sessions),
        }),
      );
    }
    const updates = mine.filter((a) => a.method === "REQUEST" && a.update).map((a) => a.session);
    if (updates.length > 0)
      await send(
        "REQUEST",
        updates,
        sessionUpdatedEmail({
          athleteName: contact.name,
          teamName: team.name,
          coachName: organizer.name,
          sessions: updates,
          planUrl: meUrl(base),
          medicalNotes: medicalNotesOf(updates),
        }),
      );
    const cancels = mine.filter((a) => a.method === "CANCEL").map((a) => a.session);
    if (cancels.length > 0)
      await send(
        "CANCEL",
        cancels,
        sessionCancelledEmail({
          athleteName: contact.name,
          teamName: team.name,
          sessions: cancels,
          planUrl: meUrl(base),
        }),
      );
  }
  return queued;
}

function byWeek(team: NoticeTeam, actions: CalendarAction[]): Map<string, CalendarSession[]> {
  const out = new Map<string, CalendarSession[]>();
  for (const a of actions) {
    const week = startOfWeek(a.session.date, team.weekStartDay);
    out.set(week, [...(out.get(week) ?? []), a.session]);
  }
  return new Map([...out.entries()].sort(([x], [y]) => x.localeCompare(y)));
}
