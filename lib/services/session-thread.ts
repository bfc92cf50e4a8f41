import "server-only";
import { sessionMessageEmail } from "@/emails/session-message";
import { getNoticeTeam } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import {
  insertSessionMessage,
  listSessionMessages,
  listThreadPeople,
  type SessionMessageDto,
  type ThreadTarget,
} from "@/lib/data/session-messages";
import { inTransaction } from "@/lib/data/transaction";
import { appUrl } from "@/lib/env";
import { kickOutbox } from "@/lib/notices/outbox-worker";

/**
 * One message in a session's thread. The people in the thread are the session's athlete and everyone who has
 * written in it; each new message is queued (same transaction) as an e-mail to all of them but its author.
 */
export async function postSessionMessage({
  target,
  actorUserId,
  body,
}: {
  target: ThreadTarget;
  actorUserId: number;
  body: string;
}): Promise<SessionMessageDto[]> {
  return inTransaction(async (transaction) => {
    const earlier = await listSessionMessages({ sessionId: target.id, transaction });
    const id = await insertSessionMessage({
      transaction,
      teamId: target.teamId,
      sessionId: target.id,
      userId: actorUserId,
      body,
    });
    const people = await listThreadPeople({ teamId: target.teamId, athleteId: target.athleteId, transaction });
    const writers = new Set(earlier.map((m) => m.userId));
    const author = people.find((p) => p.userId === actorUserId);
    const team = await getNoticeTeam({ teamId: target.teamId, transaction });
    const base = appUrl().replace(/\/+$/, "");
    const recipients = people.filter((p) => p.userId !== actorUserId && (p.isAthlete || writers.has(p.userId)));
    for (const r of recipients) {
      await enqueueMail({
        transaction,
        teamId: target.teamId,
        kind: "session_message",
        to: r.email,
        mail: sessionMessageEmail({
          recipientName: r.name,
          authorName: author?.name ?? "A team member",
          teamName: team?.name ?? "your team",
          athleteName: target.athleteName,
          date: target.date,
          title: target.title,
          body,
          url: r.isAthlete
            ? `${base}/me#session-${target.id}`
            : `${base}/status/${target.athleteId}#session-${target.id}`,
        }),
        dedupeKey: `message:${id}:user:${r.userId}`,
      });
    }
    if (recipients.length > 0) transaction.afterCommit(() => kickOutbox());
    return listSessionMessages({ sessionId: target.id, transaction });
  });
}
