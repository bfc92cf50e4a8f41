import "server-only";
import { AppError } from "@/lib/errors";
import { logsFor } from "@/lib/plan/blocks";
import type { PlanAthlete, PlanGroup, PlanSession, PlanWeek, PlanWriteResult, WeekRow } from "@/lib/plan/types";
import { addDays, dayIndex, isoWeekOf, startOfWeek, weekDays } from "@/lib/dates/plain-date";
import { ledgerPreviewContext } from "@/lib/load/ledger-week";
import { db } from "@/models";
import { listGroups } from "./athletes";
import { getLedgerWeek } from "./load-ledger";
import { listPlanMeasured } from "./measured-load";
import { loadSessions } from "./plan-rows";
import { listRestrictions } from "./restrictions";
import { listPhases } from "./season";
import { listTemplates } from "./templates";

/**
 * Whether the /plan page should carry the week in its HTML: the grid's markup plus the same week again as the
 * page's RSC payload grow by about 25 KB per athlete (1.5 MB for 60), so a large squad's page sends the frame and
 * the browser reads the week as JSON (the planner's own request), which is about a third of that.
 */
const SEED_MAX_ATHLETES = 20;

export async function seedsPlanWeek({ teamId, scope }: { teamId: number; scope: PlanAudience["scope"] }) {
  if (scope === "own") return true;
  const { Athlete } = await db();
  return (await Athlete.count({ where: { teamId } })) <= SEED_MAX_ATHLETES;
}

/** Who is looking: staff see the squad; an athlete ("own" scope) sees only their row and nothing in draft. */
export type PlanAudience = { canEdit: boolean; ownAthleteId: number | null; scope: "team" | "own" };

export async function teamWeek({
  teamId,
  date,
}: {
  teamId: number;
  date: string;
}): Promise<{ weekStart: string; weekEnd: string; timeZone: string; weekStartDay: number }> {
  const { Team } = await db();
  const team = await Team.findByPk(teamId, { attributes: ["timeZone", "weekStartDay"] });
  if (!team) throw new AppError("not_found", "Not found");
  const weekStart = startOfWeek(date, team.weekStartDay);
  return { weekStart, weekEnd: addDays(weekStart, 6), timeZone: team.timeZone, weekStartDay: team.weekStartDay };
}

/**
 * The week grid's data: athletes grouped by training group, each with the week's sessions (blocks, version),
 * the history the browser needs for the live preview, and the server's week totals and flags (the same engine
 * call the squad load screen makes, so the numbers agree everywhere).
 */
export async function getPlanWeek({
  teamId,
  date,
  today,
  audience,
}: {
  teamId: number;
  date: string;
  today: string;
  audience: PlanAudience;
}): Promise<PlanWeek> {
  const frame = await teamWeek({ teamId, date });
  const { weekStart, weekEnd } = frame;
  const own = audience.scope === "own";
  if (own && audience.ownAthleteId === null)
    throw new AppError("not_found", "No athlete profile is linked to your account");
  const visible = (s: { status: string }) => !own || s.status !== "draft";
  const athleteIds = own ? [audience.ownAthleteId!] : undefined;
  const [source, groups, templates, restrictions, phases, measured] = await Promise.all([
    // From the ledger (README §12): the week, and the 28 days before it the drag preview continues from. An
    // athlete's own view leaves drafts out. The same query gives the grid's sessions of the week.
    getLedgerWeek({
      teamId,
      athleteIds,
      weekStart,
      from: addDays(weekStart, -28),
      today,
      view: "projected",
      withDrafts: !own,
      gridFrom: weekStart,
    }),
    listGroups({ teamId }),
    own ? Promise.resolve([]) : listTemplates({ teamId }),
    listRestrictions({ teamId, from: weekStart, ...(own ? { athleteIds } : {}) }),
    own ? Promise.resolve([]) : listPhases({ teamId, from: weekStart, to: weekStart }),
    own ? Promise.resolve([]) : listPlanMeasured({ teamId, from: weekStart, to: weekEnd }),
  ]);
  const weekSessions = new Map<number, PlanSession[]>();
  for (const dto of source.gridSessions ?? [])
    if (visible(dto)) weekSessions.set(dto.athleteId, [...(weekSessions.get(dto.athleteId) ?? []), dto]);

  const athletes: PlanAthlete[] = source.athletes.map((a) => {
    const sessions = weekSessions.get(a.id) ?? [];
    const context = ledgerPreviewContext(a.window, {
      sessions: a.sessions,
      logs: a.logs,
      profile: a.profile,
      settings: source.settings,
      todayDay: dayIndex(today),
      weekStart,
    });
    return {
      id: a.id,
      name: a.name,
      groupId: a.groupId,
      profile: a.profile,
      sessions,
      logs: logsFor(a.logs, sessions),
      context,
      load: { week: a.load.week, flags: a.load.flags, topLevel: a.load.topLevel },
    };
  });
  const planGroups: PlanGroup[] = [...groups, { id: null, name: "No group", sortOrder: Number.MAX_SAFE_INTEGER }]
    .map((g) => ({ id: g.id, name: g.name, athleteIds: athletes.filter((a) => a.groupId === g.id).map((a) => a.id) }))
    .filter((g) => g.athleteIds.length > 0);
  const iso = isoWeekOf(weekStart);
  return {
    teamId,
    timeZone: frame.timeZone,
    weekStartDay: frame.weekStartDay,
    weekStart,
    weekEnd,
    isoWeek: iso.week,
    isoYear: iso.year,
    days: weekDays(weekStart),
    today,
    settings: source.settings,
    groups: planGroups,
    athletes,
    templates,
    restrictions: restrictions.filter((r) => r.startsOn <= weekEnd),
    phases,
    measured,
    canEdit: audience.canEdit,
    scope: audience.scope,
  };
}

/**
 * Adds the server's week numbers for every athlete a write touched (the team week of each touched day), so
 * the grid confirms a drop without refetching the whole week. The same engine call as getPlanWeek.
 */
export async function withWeekRows({
  teamId,
  today,
  result,
}: {
  teamId: number;
  today: string;
  result: PlanWriteResult;
}): Promise<PlanWriteResult> {
  const touched = result.touched ?? [];
  if (touched.length === 0) return { ...result, rows: [] };
  const { weekStartDay } = await teamWeek({ teamId, date: touched[0].date });
  const weeks = new Map<string, Set<number>>();
  for (const t of touched) {
    const ws = startOfWeek(t.date, weekStartDay);
    weeks.set(ws, (weeks.get(ws) ?? new Set()).add(t.athleteId));
  }
  const rows: WeekRow[] = [];
  for (const [weekStart, ids] of weeks) {
    // A drop touches one or two athletes: their ledger rows for the week, not the squad's.
    const { athletes } = await getLedgerWeek({ teamId, athleteIds: [...ids], weekStart, today, view: "projected" });
    for (const a of athletes) {
      rows.push({
        athleteId: a.id,
        weekStart,
        load: { week: a.load.week, flags: a.load.flags, topLevel: a.load.topLevel },
      });
    }
  }
  return { ...result, rows };
}

/** Team and athlete of a session, for the permission check before anything else is read. */
export async function findSessionRef({
  sessionId,
}: {
  sessionId: number;
}): Promise<{ teamId: number; athleteId: number; status: string } | null> {
  const { PlannedSession } = await db();
  const row = await PlannedSession.findByPk(sessionId, { attributes: ["teamId", "athleteId", "status"] });
  return row ? { teamId: row.teamId, athleteId: row.athleteId, status: row.status } : null;
}

export async function getSession({ teamId, sessionId }: { teamId: number; sessionId: number }): Promise<PlanSession> {
  const [loaded] = await loadSessions({ id: sessionId, teamId });
  if (!loaded) throw new AppError("not_found", "That session was not found");
  return loaded.dto;
}
