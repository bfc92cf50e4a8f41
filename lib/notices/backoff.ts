/** Retry policy of the outbox: exponential backoff, capped, with a bounded number of attempts. */
export interface BackoffPolicy {
  baseMs: number;
  maxMs: number;
  maxAttempts: number;
}

// 10 s, 20 s, 40 s … capped at 1 h: twenty attempts cover a mail server that is down for about 11 hours.
export const DEFAULT_BACKOFF: BackoffPolicy = { baseMs: 10_000, maxMs: 60 * 60_000, maxAttempts: 20 };

/** Wait before the next try after `attempts` failed tries (1 → baseMs, 2 → 2·baseMs, …). */
export function backoffDelayMs(attempts: number, policy: BackoffPolicy = DEFAULT_BACKOFF): number {
  const n = Math.max(1, Math.floor(attempts));
  // 2^(n−1) overflows to Infinity long after the cap applies, so Math.min keeps it finite.
  return Math.min(policy.maxMs, policy.baseMs * 2 ** (n - 1));
}
