import { formatDayLabel } from "@/lib/dates/plain-date";

/** "Tue 31 Mar": the load engine's locale-free day label (throws RangeError on a malformed date). */
export const formatDayShort = formatDayLabel;

/** "Tue 31 Mar 2026", for mails and anything read outside the current week. */
export function formatDayLong(isoDate: string): string {
  return `${formatDayLabel(isoDate)} ${Number(isoDate.slice(0, 4))}`;
}
