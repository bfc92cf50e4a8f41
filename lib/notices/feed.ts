import "server-only";
import { createHash } from "node:crypto";
import { buildAthleteFeed, FEED_FORMAT, feedStartDate } from "@/lib/calendar/athlete-feed";
import { feedSessionsStamp, readFeedRender, saveFeedRender } from "@/lib/data/calendar-feed";
import { getFeedHead, listAthleteSessions } from "@/lib/data/calendar-tokens";
import { appUrl } from "@/lib/env";
import { tokenFromSegment } from "@/lib/calendar/feed-url";

export type ServedFeed = {
  ics: string;
  /** Strong ETag (RFC 9110 §8.8.3): the same value always comes with the same bytes. */
  etag: string;
  lastModified: Date;
  athleteName: string;
};

/**
 * The feed behind a path segment ("<token>.ics"), or null when the token is unknown or revoked. It shows the
 * sessions from 8 weeks back on (FEED_WEEKS_BACK) and is rendered again only when its stamp moves: the
 * sessions in range (lib/data/calendar-feed.ts), the first day of the range, and the names, zone and address
 * the text holds. The render is kept in the database, so any app server answers from it.
 */
export async function serveFeedForSegment(segment: string, now = new Date()): Promise<ServedFeed | null> {
  const token = tokenFromSegment(segment);
  if (!token) return null;
  const head = await getFeedHead({ token, now });
  if (!head) return null;
  const { team, athlete } = head;
  const base = appUrl();
  const from = feedStartDate({ now, timeZone: team.timeZone });
  const sessions = await feedSessionsStamp({ teamId: team.id, athleteId: athlete.id, from });
  const stamp = createHash("sha256")
    .update(JSON.stringify([FEED_FORMAT, base, team.name, team.timeZone, athlete.name, from, sessions]))
    .digest("base64url");
  const served = (ics: string, lastModified: Date) => ({
    ics,
    etag: `"${stamp}"`,
    lastModified,
    athleteName: athlete.name,
  });

  const stored = await readFeedRender({ athleteId: athlete.id });
  if (stored?.stamp === stamp) return served(stored.ics, stored.renderedAt);

  // Read after the stamp: a write in between makes the text newer than its stamp, never older.
  const list = await listAthleteSessions({ teamId: team.id, athleteId: athlete.id, from });
  const ics = buildAthleteFeed({
    team,
    athlete,
    sessions: list,
    appUrl: base,
    sessionUrl: (s) => `${base}/me#session-${s.id}`,
    bounded: true,
  });
  // Whole seconds on the wire: a new render gets a later second than the last, so If-Modified-Since sees it.
  const renderedAt = new Date(Math.max(now.getTime(), (stored?.renderedAt.getTime() ?? 0) + 1000));
  try {
    await saveFeedRender({ athleteId: athlete.id, stamp, ics, renderedAt });
  } catch (err) {
    // The feed is still right; the next poll renders again.
    console.error("[sprintwright] could not keep the rendered feed", err);
  }
  return served(ics, renderedAt);
}
