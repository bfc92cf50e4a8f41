import { AppError } from "@/lib/errors";
import { route } from "@/lib/http";
import { renderFeedForSegment } from "@/lib/notices/feed";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * GET /api/calendar/<token>.ics: an athlete's subscription feed. Calendar apps cannot sign in, so the long
 * random token in the URL is the credential (only its hash is stored); unknown or revoked → 404.
 */
export const GET = route<{ token: string }>(async (_req, { params }) => {
  const { token } = await params;
  const feed = await renderFeedForSegment(token);
  if (!feed) throw new AppError("not_found", "No such calendar");
  return new Response(feed.ics, {
    headers: {
      // RFC 5545 §8.1: media type text/calendar; the charset parameter defaults to UTF-8 and is stated anyway.
      "content-type": "text/calendar; charset=utf-8",
      "content-disposition": 'inline; filename="sprintwright.ics"',
      "cache-control": "private, no-cache",
      "x-robots-tag": "noindex",
    },
  });
});
