/**
 * The address a sign-in comes from, for throttling. `next start` fills X-Forwarded-For with the socket's address
 * only when the request has none, and a reverse proxy appends the address it saw, so the last entry is the one
 * written by the nearest trusted hop. Served without a proxy, a client can still send its own header: the
 * per-account limit does not depend on this value (DEVELOPERS.md, "Sign-in and sessions").
 */
export function clientAddress(headers: Record<string, unknown> | undefined): string {
  const raw = headers?.["x-forwarded-for"];
  const value = Array.isArray(raw) ? raw.join(",") : typeof raw === "string" ? raw : "";
  const last = value
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean)
    .at(-1);
  return last ? last.slice(0, 64) : "unknown";
}
