import "server-only";
import { diffDays } from "@/lib/dates/plain-date";
import { listSquad } from "./athletes";

/**
 * Six weeks between sprint-speed tests: re-testing every 4–6 weeks of a training block is common practice
 * (from memory); the longer end keeps the list short.
 */
export const RETEST_AFTER_DAYS = 42;

export type RetestDue = {
  athleteId: number;
  athleteName: string;
  lastTestedOn: string | null;
  daysSince: number | null;
};

/**
 * Athletes due a speed re-test on `today`: never tested, or last tested RETEST_AFTER_DAYS or more ago, longest
 * waiting first. The one place that decides it: today it reads the profile's test date; when the speed lab keeps
 * its own tests, this function reads their latest date instead and every screen follows.
 */
export async function listSpeedRetestsDue({ teamId, today }: { teamId: number; today: string }): Promise<RetestDue[]> {
  const squad = await listSquad({ teamId });
  return squad
    .map((a) => ({
      athleteId: a.id,
      athleteName: a.name,
      lastTestedOn: a.vmaxTestedOn,
      daysSince: a.vmaxTestedOn ? diffDays(today, a.vmaxTestedOn) : null,
    }))
    .filter((a) => a.daysSince === null || a.daysSince >= RETEST_AFTER_DAYS)
    .sort(
      (x, y) => (y.daysSince ?? Infinity) - (x.daysSince ?? Infinity) || x.athleteName.localeCompare(y.athleteName),
    );
}
