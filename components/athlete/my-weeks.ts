import { addDays, startOfWeek } from "@/lib/dates/plain-date";

/** "This week" and "next week" of "My training": the team's own week start (Monday or Sunday), never a default. */
export function myWeeks(today: string, weekStartDay: number): { thisWeek: string; nextWeek: string; end: string } {
  const thisWeek = startOfWeek(today, weekStartDay);
  const nextWeek = addDays(thisWeek, 7);
  return { thisWeek, nextWeek, end: addDays(nextWeek, 6) };
}
