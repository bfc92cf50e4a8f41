import "server-only";
import { alertDigestEmail } from "@/emails/alert-digest";
import { listAlertsCreatedBetween } from "@/lib/data/alerts";
import { claimDigestWindow, listDigestSubscribers } from "@/lib/data/notification-settings";
import { enqueueMail } from "@/lib/data/outbox";
import { lastLocalHour, teamToday } from "@/lib/dates/zoned";
import { appUrl } from "@/lib/env";
import { db } from "@/models";
import { toLoadAlertItem } from "./alert-display";

/** Local hour the daily digest goes out, in each team's own zone. */
const DIGEST_HOUR = 7;

/** The most recent digest time at or before `now` in the zone (today 07:00, or yesterday's before 07:00). */
export function lastDigestSlot(now: Date, timeZone: string): Date {
  return lastLocalHour({ now, timeZone, hour: DIGEST_HOUR });
}

/**
 * For every member on the daily digest whose slot has come, queues one mail with the alerts created since
 * their last digest (none → no mail). The window moves forward in the same transaction as the enqueue.
 */
export async function queueDueDigests({ now }: { now: Date }): Promise<number> {
  const subscribers = await listDigestSubscribers();
  const { sequelize } = await db();
  let queued = 0;
  for (const s of subscribers) {
    const slot = lastDigestSlot(now, s.timeZone);
    if (s.lastDigestAt && s.lastDigestAt >= slot) continue;
    const after = s.lastDigestAt ?? new Date(slot.getTime() - 24 * 3_600_000);
    await sequelize.transaction(async (transaction) => {
      if (!(await claimDigestWindow({ settingId: s.settingId, previous: s.lastDigestAt, now, transaction }))) return;
      const alerts = await listAlertsCreatedBetween({ teamId: s.teamId, after, until: now });
      if (alerts.length === 0) return;
      const base = appUrl();
      const date = teamToday({ timeZone: s.timeZone, now: slot });
      const id = await enqueueMail({
        transaction,
        teamId: s.teamId,
        kind: "digest",
        to: s.email,
        mail: alertDigestEmail({
          recipientName: s.name,
          teamName: s.teamName,
          date,
          alerts: alerts.map((a) => toLoadAlertItem(a, base)),
          inboxUrl: `${base}/alerts`,
        }),
        dedupeKey: `digest:${s.userId}:${s.teamId}:${date}`,
      });
      if (id !== null) queued += 1;
    });
  }
  return queued;
}
