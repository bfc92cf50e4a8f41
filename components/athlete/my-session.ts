import type { AthleteSession } from "@/lib/data/calendar-tokens";
import type { SessionStatus } from "@/lib/domain/sessions";
import type { BlockInput } from "@/lib/load/types";
import type { PainReportInput } from "@/lib/validations/athlete-reports";

/** One of the athlete's sessions as "My training" shows it (plain data, so a sheet in the browser can hold it). */
export type MySession = {
  sessionId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  status: SessionStatus;
  notes: string | null;
  blocks: BlockInput[];
  log: AthleteSession["log"];
  pain: PainReportInput | null;
  /** Whether the athlete may still write the log, and the words that say until when or why not. */
  logState: "ahead" | "open" | "locked" | "cancelled";
  lockLabel: string | null;
  /** The medical staff's limits in force that day, in words. */
  restrictions: string[];
  /** What in this session goes past one of those limits. */
  breaches: string[];
  /** Restrictions set after the session was sent that it now breaks and the coach has not planned past (in words). */
  medicalChanges: string[];
};
