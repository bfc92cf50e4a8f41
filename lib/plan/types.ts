// Plain JSON shapes of the week plan, shared by lib/data/plan.ts, the route handlers and the week grid.
import type { GridPhase } from "@/lib/season/season-grid";
import type { Flag, FlagLevel } from "@/lib/load/flags";
import type {
  AthleteProfile,
  BlockKind,
  LogInput,
  PlyoDrill,
  RunningPrescription,
  SessionStatus,
  TeamLoadSettings,
} from "@/lib/load/types";
import type { WeekPreviewContext } from "@/lib/load/week-preview";
import type { WeekSummary } from "@/lib/load/week-summary";
import type { Restriction } from "@/lib/restrictions/rules";
import type { PlanMeasured } from "@/lib/speed/plan-measured";

export type PlanBlock = {
  id: number;
  templateId: number | null;
  position: number;
  kind: BlockKind;
  title: string;
  running: RunningPrescription | null;
  drills: PlyoDrill[] | null;
  notes: string | null;
};

export type PlanSession = {
  id: number;
  athleteId: number;
  date: string;
  startTime: string;
  durationMin: number;
  title: string;
  plannedRpe: number;
  status: SessionStatus;
  notes: string | null;
  /** Optimistic lock: send it back with every write. */
  version: number;
  /** iCalendar SEQUENCE (RFC 5545 §3.8.7.4). */
  sequence: number;
  publishedAt: string | null;
  /** The athlete has logged this session (it can no longer be moved). */
  logged: boolean;
  blocks: PlanBlock[];
};

export type PlanTemplate = {
  id: number;
  kind: BlockKind;
  title: string;
  running: RunningPrescription | null;
  drills: PlyoDrill[] | null;
  notes: string | null;
  durationMin: number;
  plannedRpe: number;
  /** Optimistic-locking counter: an edit sends the version it read. */
  version: number;
};

/** The week's numbers for one row, exactly as computeWeekPreview answers. */
export type RowLoad = { week: WeekSummary; flags: Flag[]; topLevel: FlagLevel | null };

export type PlanAthlete = {
  id: number;
  name: string;
  groupId: number | null;
  profile: AthleteProfile;
  /** The week's sessions (cancelled ones included, shown faded), by date then start time. */
  sessions: PlanSession[];
  /** Logs of the week's sessions, in engine shape. */
  logs: LogInput[];
  /** History before the week, so the browser can recompute the week while a block is dragged. */
  context: WeekPreviewContext;
  /** The server's numbers for the week as stored. */
  load: RowLoad;
};

export type PlanGroup = { id: number | null; name: string; athleteIds: number[] };

export type PlanWeek = {
  teamId: number;
  timeZone: string;
  /** ISO weekday the team's week starts on (1 = Monday … 7 = Sunday). */
  weekStartDay: number;
  weekStart: string;
  weekEnd: string;
  isoWeek: number;
  isoYear: number;
  days: string[];
  today: string;
  settings: TeamLoadSettings;
  groups: PlanGroup[];
  athletes: PlanAthlete[];
  templates: PlanTemplate[];
  /** Physio restrictions that apply on some day of the week, for the athletes shown. */
  restrictions: Restriction[];
  /**
   * Season phases in force on the week's first day (staff only): each row shows its week against the targets of
   * the athlete's phase (the group's own, else the team's; lib/season/season-grid.ts phaseOfWeek).
   */
  phases?: GridPhase[];
  /** Staff only: the week's sessions with a speed trace, planned against measured (lib/speed/README.md §8). */
  measured?: PlanMeasured[];
  /** The viewer may change the plan (head coach, coach). */
  canEdit: boolean;
  /** "own": an athlete seeing only their own row. */
  scope: "team" | "own";
  /** Browser only: some rows hold numbers computed locally after a save; refetch to confirm them. */
  unconfirmed?: boolean;
};

/** An athlete's day a write changed (before or after), so the week numbers can be recomputed for it. */
export type Touched = { athleteId: number; date: string };

/** The server's week numbers of one athlete after a write. */
export type WeekRow = { athleteId: number; weekStart: string; load: RowLoad };

/**
 * What each write answers: the sessions as they now are, those that are gone, the days it touched and, from
 * the session handlers, the server's week numbers for the touched athletes (so no refetch is needed).
 */
export type PlanWriteResult = { sessions: PlanSession[]; removedIds: number[]; touched?: Touched[]; rows?: WeekRow[] };
