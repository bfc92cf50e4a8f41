import { env } from "@/lib/env";

/**
 * How long a sign-in lasts (OWASP ASVS 4.0 §3.3.2, level 2: re-authenticate after 12 hours, or after 30 minutes
 * without activity). Both are checked on the server against the session's row on every request.
 */
export const IDLE_MINUTES = 30;
export const MAX_HOURS = 12;

export function sessionPolicy() {
  const e = env();
  const idleMs = (e.SESSION_IDLE_MINUTES ?? IDLE_MINUTES) * 60_000;
  const maxMs = (e.SESSION_MAX_HOURS ?? MAX_HOURS) * 3_600_000;
  // Activity is written at most this often, so a busy page does not write on every request.
  const touchMs = Math.min(60_000, idleMs / 4);
  return { idleMs, maxMs, touchMs };
}
