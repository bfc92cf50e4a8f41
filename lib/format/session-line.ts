import type { BlockInput } from "@/lib/load/types";
import { BLOCK_KIND_LABEL, mainBlockKind } from "./block-summary";
import { formatDayShort } from "./dates";
import { formatMinutes } from "./duration";

export interface SessionHeadlineInput {
  title: string;
  blocks: readonly Pick<BlockInput, "kind">[];
}

/** "Flying 30s · Max velocity"; the kind is left out when the title already says it. */
export function sessionHeadline({ title, blocks }: SessionHeadlineInput): string {
  const kind = mainBlockKind(blocks);
  const name = title.trim() || (kind ? BLOCK_KIND_LABEL[kind] : "Training session");
  if (!kind) return name;
  const label = BLOCK_KIND_LABEL[kind];
  return name.toLowerCase().includes(label.toLowerCase()) ? name : `${name} · ${label}`;
}

export interface SessionLineInput extends SessionHeadlineInput {
  date: string;
  startTime: string;
  durationMin: number;
  location?: string | null;
}

/** One line per session for lists and mails: "Tue 3 Mar, 17:30 (1 h 15 min): Flying 30s · Max velocity, Track 2". */
export function sessionLine(session: SessionLineInput): string {
  const place = session.location?.trim() ? `, ${session.location.trim()}` : "";
  return (
    `${formatDayShort(session.date)}, ${session.startTime} (${formatMinutes(session.durationMin)}): ` +
    `${sessionHeadline(session)}${place}`
  );
}

/** Sessions in calendar order (date, then start time). */
export function byStart<T extends { date: string; startTime: string }>(a: T, b: T): number {
  return `${a.date}T${a.startTime}`.localeCompare(`${b.date}T${b.startTime}`);
}
