/** `/api/calendar/<token>.ics` on the app's public address. */
export function feedUrl(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/+$/, "")}/api/calendar/${encodeURIComponent(token)}.ics`;
}

/** The same feed for one-tap subscription: calendar apps open webcal:// links (a de-facto scheme, common practice). */
export function webcalUrl(url: string): string {
  return url.replace(/^https?:\/\//i, "webcal://");
}

/** The token part of a feed path segment: "abc.ics" → "abc"; anything that is not a plausible token → null. */
export function tokenFromSegment(segment: string): string | null {
  const token = segment.replace(/\.ics$/i, "");
  return /^[A-Za-z0-9_-]{20,200}$/.test(token) ? token : null;
}
