import type { PlanSession, PlanWeek } from "./types";

/** What is being dragged: a template from the shelf, or a session card from the grid. */
export type DragSource = { type: "template"; templateId: number } | { type: "session"; sessionId: number };

/** Where it is dropped: one athlete's day, or a training group's day (the whole group). */
export type DropTarget =
  { type: "cell"; athleteId: number; date: string } | { type: "group"; groupId: number; date: string };

/** The change a drop asks for, before it is saved. */
export type PlanChange =
  | { kind: "create"; templateId: number; athleteId: number; date: string }
  | { kind: "add-block"; templateId: number; sessionId: number; athleteId: number; date: string }
  | { kind: "group"; templateId: number; groupId: number; date: string; targets: GroupTarget[] }
  | { kind: "move"; sessionId: number; athleteId: number; date: string; fromAthleteId: number; fromDate: string }
  | { kind: "copy"; sessionId: number; athleteId: number; date: string };

/** One athlete of a group drop: the block joins `sessionId`, or a new session is made when it is null. */
export type GroupTarget = { athleteId: number; sessionId: number | null };

export type DropOutcome = { ok: true; change: PlanChange } | { ok: false; reason: string } | null;

/**
 * The session a template joins when dropped on a day that already has one: the earliest session that is
 * still on (not cancelled) and not yet logged. Null means the drop makes a new session.
 */
export function cellTargetSession<T extends Pick<PlanSession, "id" | "status" | "logged" | "startTime">>(
  cell: readonly T[],
): T | null {
  const open = cell.filter((s) => s.status !== "cancelled" && !s.logged);
  if (open.length === 0) return null;
  return [...open].sort((a, b) => a.startTime.localeCompare(b.startTime) || a.id - b.id)[0];
}

/** For each athlete of a group drop, the session its block joins (same rule as a single drop). */
export function groupTargets(
  athleteIds: readonly number[],
  sessionsOnDay: (athleteId: number) => readonly PlanSession[],
): GroupTarget[] {
  return athleteIds.map((athleteId) => ({
    athleteId,
    sessionId: cellTargetSession(sessionsOnDay(athleteId))?.id ?? null,
  }));
}

export function findSession(week: PlanWeek, sessionId: number): PlanSession | null {
  for (const a of week.athletes) for (const s of a.sessions) if (s.id === sessionId) return s;
  return null;
}

function sessionsOn(week: PlanWeek, athleteId: number, date: string): PlanSession[] {
  return week.athletes.find((a) => a.id === athleteId)?.sessions.filter((s) => s.date === date) ?? [];
}

/**
 * Maps a finished drag to a plan change. `copy` is true while the copy modifier (Alt) is held or when the
 * card menu's "Copy to…" started the drag. Null means nothing changes (dropped where it came from, or nowhere).
 */
export function resolveDrop({
  week,
  source,
  target,
  copy = false,
}: {
  week: PlanWeek;
  source: DragSource;
  target: DropTarget | null;
  copy?: boolean;
}): DropOutcome {
  if (!target) return null;
  if (!week.days.includes(target.date)) return { ok: false, reason: "That day is outside this week." };
  if (source.type === "template") {
    if (!week.templates.some((t) => t.id === source.templateId))
      return { ok: false, reason: "That template no longer exists." };
    if (target.type === "group") {
      const group = week.groups.find((g) => g.id === target.groupId);
      if (!group || group.athleteIds.length === 0) return { ok: false, reason: "That group has no athletes." };
      const targets = groupTargets(group.athleteIds, (id) => sessionsOn(week, id, target.date));
      return {
        ok: true,
        change: { kind: "group", templateId: source.templateId, groupId: target.groupId, date: target.date, targets },
      };
    }
    const joins = cellTargetSession(sessionsOn(week, target.athleteId, target.date));
    return joins
      ? {
          ok: true,
          change: {
            kind: "add-block",
            templateId: source.templateId,
            sessionId: joins.id,
            athleteId: target.athleteId,
            date: target.date,
          },
        }
      : {
          ok: true,
          change: { kind: "create", templateId: source.templateId, athleteId: target.athleteId, date: target.date },
        };
  }
  const session = findSession(week, source.sessionId);
  if (!session) return { ok: false, reason: "That session is no longer in this week." };
  if (target.type === "group")
    return { ok: false, reason: "Drop a session on one athlete's day; groups take templates." };
  if (session.status === "cancelled") return { ok: false, reason: "A cancelled session stays where it was." };
  if (copy)
    return {
      ok: true,
      change: { kind: "copy", sessionId: session.id, athleteId: target.athleteId, date: target.date },
    };
  if (session.athleteId === target.athleteId && session.date === target.date) return null;
  if (session.logged)
    return {
      ok: false,
      reason: "The athlete has logged this session, so it stays on its day. Hold Alt to copy it instead.",
    };
  return {
    ok: true,
    change: {
      kind: "move",
      sessionId: session.id,
      athleteId: target.athleteId,
      date: target.date,
      fromAthleteId: session.athleteId,
      fromDate: session.date,
    },
  };
}
