import { AppError } from "@/lib/errors";
import { route } from "@/lib/http";
import { isNotModified, validatorHeaders } from "@/lib/http-conditional";
import { serveFeedForSegment } from "@/lib/notices/feed";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * GET /api/calendar/<token>.ics: an athlete's subscription feed, with the sessions from 8 weeks back and every
 * session ahead. Calendar apps cannot sign in, so the long random token in the URL is the credential (only its
 * hash is stored); unknown or revoked → 404. A poll that sends the last ETag (or Last-Modified) gets 304 and
 * no body until the athlete's sessions change.
 */
export const GET = route<{ token: string }>(async (req, { params }) => {
  const { token } = await params;
  const feed = await serveFeedForSegment(token);
  if (!feed) throw new AppError("not_found", "No such calendar");
  const headers = {
    ...validatorHeaders(feed),
    // no-cache: a cache may keep the feed but asks again (with the ETag) before using it.
    "cache-control": "private, no-cache",
    "x-robots-tag": "noindex",
  };
  if (isNotModified(req, feed)) return new Response(null, { status: 304, headers });
  return new Response(feed.ics, {
    headers: {
      ...headers,
      // RFC 5545 §8.1: media type text/calendar; the charset parameter defaults to UTF-8 and is stated anyway.
      "content-type": "text/calendar; charset=utf-8",
      "content-disposition": 'inline; filename="sprintwright.ics"',
    },
  });
});
