import "server-only";
import { buildAthleteFeed } from "@/lib/calendar/athlete-feed";
import { getFeedByToken } from "@/lib/data/calendar-tokens";
import { appUrl } from "@/lib/env";
import { tokenFromSegment } from "./feed-url";

/** The .ics text behind a feed path segment ("<token>.ics"), or null when the token is unknown or revoked. */
export async function renderFeedForSegment(segment: string): Promise<{ ics: string; athleteName: string } | null> {
  const token = tokenFromSegment(segment);
  if (!token) return null;
  const feed = await getFeedByToken({ token });
  if (!feed) return null;
  const base = appUrl();
  const ics = buildAthleteFeed({
    team: feed.team,
    athlete: feed.athlete,
    sessions: feed.sessions,
    appUrl: base,
    sessionUrl: (s) => `${base}/me#session-${s.id}`,
  });
  return { ics, athleteName: feed.athlete.name };
}
