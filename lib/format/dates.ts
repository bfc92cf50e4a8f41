import { formatDayLabel } from "@/lib/dates/plain-date";

/** "Tue 31 Mar": the load engine's locale-free day label (throws RangeError on a malformed date). */
export const formatDayShort = formatDayLabel;

/** "Tue 31 Mar 2026", for mails and anything read outside the current week. */
export function formatDayLong(isoDate: string): string {
  return `${formatDayLabel(isoDate)} ${Number(isoDate.slice(0, 4))}`;
}

/** "2 Dec, 09:15": an instant in the reader's own zone (the browser's), for what happened when on a screen. */
export function formatInstantShort(iso: string): string {
  return new Date(iso).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });
}
