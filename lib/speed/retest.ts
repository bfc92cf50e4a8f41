import { dayIndex } from "@/lib/dates/plain-date";

// Who is due a re-test and whose vmax dropped (lib/speed/README.md §6). Compared with the athlete's own
// previous test, never with team-mates.

/** Weeks without a timing test after which an athlete is due one (team setting; common practice, from memory). */
export const DEFAULT_RETEST_WEEKS = 6;
/** A drop smaller than this is within timing noise (our choice: ≈ 1 % of a trained sprinter's vmax). */
const VMAX_DROP_NOISE_MS = 0.1;

export type RetestStatus = {
  /** Days since the last timing test; null when never tested. */
  daysSince: number | null;
  due: boolean;
};

export function retestStatus({
  lastTimingTest,
  today,
  retestWeeks = DEFAULT_RETEST_WEEKS,
}: {
  lastTimingTest: string | null;
  today: string;
  retestWeeks?: number;
}): RetestStatus {
  if (lastTimingTest === null) return { daysSince: null, due: true };
  const daysSince = dayIndex(today) - dayIndex(lastTimingTest);
  return { daysSince, due: daysSince >= retestWeeks * 7 };
}

/** Fitted vmax of the latest test minus the one before (m/s); `dropped` when it fell by more than timing noise. */
export function vmaxChange(vmaxNewestFirst: readonly number[]): { change: number | null; dropped: boolean } {
  if (vmaxNewestFirst.length < 2) return { change: null, dropped: false };
  const change = vmaxNewestFirst[0] - vmaxNewestFirst[1];
  return { change, dropped: change < -VMAX_DROP_NOISE_MS };
}
