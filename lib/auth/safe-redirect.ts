/**
 * Turns a requested `callbackUrl` into a path on this site, or `fallback`.
 *
 * The check parses the value the way a browser will (WHATWG URL) and compares origins, instead of looking at
 * the first characters: browsers drop tabs and newlines and read "\" as "/", so `/\evil.test` or `/<TAB>/evil.test`
 * start with one slash yet leave the site. Such characters are refused outright, and a path that still begins
 * with "//" after dot segments are resolved (`/.//evil.test`) is refused too. Isomorphic: the sign-in page,
 * the sign-in form and next-auth's redirect callback all use it.
 */
export function safeCallbackPath(
  raw: unknown,
  { origin, fallback = "/home" }: { origin: string; fallback?: string },
): string {
  if (typeof raw !== "string" || raw.length === 0 || raw.length > 2048) return fallback;
  // Control characters, spaces at the ends and backslashes have no place in a link we made ourselves.
  if (/[\u0000-\u001f\u007f\\]/.test(raw) || raw.trim() !== raw) return fallback;
  let site: URL;
  let url: URL;
  try {
    site = new URL(origin);
    url = new URL(raw, site);
  } catch {
    return fallback;
  }
  if (url.origin !== site.origin || url.username || url.password) return fallback;
  if (!url.pathname.startsWith("/") || url.pathname.startsWith("//")) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
