import "server-only";
import { Op, type Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import { buildWeekPreviewContext } from "@/lib/load/week-preview";
import { packSessions } from "@/lib/load/packed";
import { computeSquadWeek, type SquadAthleteInput } from "@/lib/load/squad";
import { logsFor } from "@/lib/plan/blocks";
import { compactContext } from "@/lib/plan/context";
import type { PlanAthlete, PlanGroup, PlanSession, PlanWeek, PlanWriteResult, WeekRow } from "@/lib/plan/types";
import { addDays, isoWeekOf, startOfWeek, weekDays } from "@/lib/dates/plain-date";
import { db } from "@/models";
import { listGroups } from "./athletes";
import { getLoadSeriesInputs } from "./load";
import { bumped, change, insertBlocks, loadById, loadSessions, notify, type Loaded } from "./plan-rows";
import type { Override } from "./restriction-guard";
import { listRestrictions } from "./restrictions";
import { listTemplates } from "./templates";

export { addBlock, changeBlock, createSessions, deleteSession, updateSession } from "./plan-sessions";

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
  if (own && audience.ownAthleteId === null) throw new AppError("not_found", "No athlete profile is linked to your account");
  const visible = (s: { status: string }) => !own || s.status !== "draft";
  const [inputs, groups, weekRows, templates, restrictions] = await Promise.all([
    getLoadSeriesInputs({ teamId, through: weekEnd }),
    listGroups({ teamId }),
    loadSessions({ teamId, date: { [Op.between]: [weekStart, weekEnd] }, ...(own ? { athleteId: audience.ownAthleteId! } : {}) }),
    own ? Promise.resolve([]) : listTemplates({ teamId }),
    listRestrictions({ teamId, from: weekStart, ...(own ? { athleteIds: [audience.ownAthleteId!] } : {}) }),
  ]);
  const squad: SquadAthleteInput[] = inputs.athletes
    .filter((a) => !own || a.id === audience.ownAthleteId)
    .map((a) => {
      const sessions = a.sessions.filter(visible);
      return {
        id: String(a.id),
        name: a.name,
        group: a.groupName,
        profile: a.profile,
        sessions,
        logs: a.logs,
        packed: packSessions(sessions, a.logs),
      };
    });
  const rows = computeSquadWeek(squad, inputs.settings, weekStart, today, "projected");
  const weekSessions = new Map<number, PlanSession[]>();
  for (const { dto } of weekRows) if (visible(dto)) weekSessions.set(dto.athleteId, [...(weekSessions.get(dto.athleteId) ?? []), dto]);

  const athletes: PlanAthlete[] = squad.map((a, i) => {
    const id = Number(a.id);
    const sessions = weekSessions.get(id) ?? [];
    const source = inputs.athletes.find((x) => x.id === id)!;
    return {
      id,
      name: a.name,
      groupId: source.groupId,
      profile: a.profile,
      sessions,
      logs: logsFor(a.logs, sessions),
      context: compactContext(
        buildWeekPreviewContext({
          profile: a.profile,
          settings: inputs.settings,
          sessions: a.sessions,
          logs: a.logs,
          weekStart,
          today,
        }),
        inputs.settings.acwrMetric,
      ),
      load: { week: rows[i].week, flags: rows[i].flags, topLevel: rows[i].topLevel },
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
    settings: inputs.settings,
    groups: planGroups,
    athletes,
    templates,
    restrictions: restrictions.filter((r) => r.startsOn <= weekEnd),
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
    // A drop touches one or two athletes: read just their history, not the whole squad's.
    const inputs = await getLoadSeriesInputs({ teamId, athleteIds: [...ids], through: addDays(weekStart, 6) });
    const squad = inputs.athletes;
    const computed = computeSquadWeek(
      squad.map((a) => ({
        id: String(a.id),
        name: a.name,
        group: a.groupName,
        profile: a.profile,
        sessions: a.sessions,
        logs: a.logs,
        packed: packSessions(a.sessions, a.logs),
      })),
      inputs.settings,
      weekStart,
      today,
      "projected",
    );
    computed.forEach((r, i) =>
      rows.push({ athleteId: squad[i].id, weekStart, load: { week: r.week, flags: r.flags, topLevel: r.topLevel } }),
    );
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

type WeekTool = { teamId: number; actorUserId: number; date: string; override?: Override };

async function weekTx<T>({ teamId, date }: WeekTool, fn: (t: Transaction, weekStart: string, inWeek: Loaded[]) => Promise<T>): Promise<T> {
  const { weekStart, weekEnd } = await teamWeek({ teamId, date });
  const { sequelize } = await db();
  return sequelize.transaction(async (t) =>
    fn(t, weekStart, await loadSessions({ teamId, date: { [Op.between]: [weekStart, weekEnd] } }, t)),
  );
}

/** Copies the week's sessions (cancelled ones left out) to the same days of the next week, as drafts. */
export async function copyWeekToNext(tool: WeekTool): Promise<PlanWriteResult> {
  const { PlannedSession } = await db();
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const created: number[] = [];
    for (const { dto: s } of inWeek.filter((l) => l.dto.status !== "cancelled")) {
      const row = await PlannedSession.create(
        {
          teamId: tool.teamId,
          athleteId: s.athleteId,
          date: addDays(s.date, 7),
          startTime: s.startTime,
          durationMin: s.durationMin,
          title: s.title,
          plannedRpe: s.plannedRpe,
          notes: s.notes,
          status: "draft",
          publishedAt: null,
        },
        { transaction },
      );
      await insertBlocks({ teamId: tool.teamId, sessionId: row.id, blocks: s.blocks, transaction });
      created.push(row.id);
    }
    const after = await loadById(created, transaction);
    await notify({
      transaction,
      teamId: tool.teamId,
      actorUserId: tool.actorUserId,
      changes: created.map((id) => change("created", null, after.get(id)!)),
      override: tool.override,
    });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: [] };
  });
}

/** Empties the week: drafts go, published sessions become cancelled, logged sessions stay (logs are never lost). */
export async function clearWeek(tool: WeekTool): Promise<PlanWriteResult> {
  const { PlannedSession } = await db();
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const removed: Loaded[] = [];
    const cancelled: Loaded[] = [];
    for (const l of inWeek) {
      if (l.dto.logged || l.dto.status === "cancelled") continue;
      if (l.dto.status === "draft") removed.push(l);
      else cancelled.push(l);
    }
    if (removed.length > 0) await PlannedSession.destroy({ where: { id: { [Op.in]: removed.map((l) => l.dto.id) } }, transaction });
    for (const l of cancelled) {
      await PlannedSession.update({ status: "cancelled", ...bumped(l.dto) }, { where: { id: l.dto.id }, transaction });
    }
    const after = await loadById(
      cancelled.map((l) => l.dto.id),
      transaction,
    );
    const changes = [
      ...removed.map((l) => change("deleted", l, null)),
      ...cancelled.map((l) => change("deleted", l, after.get(l.dto.id)!)),
    ];
    await notify({ transaction, teamId: tool.teamId, actorUserId: tool.actorUserId, changes });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: removed.map((l) => l.dto.id) };
  });
}

/** Sends the week: every draft becomes published (SEQUENCE stays 0: the first invitation athletes get). */
export async function publishWeek(tool: WeekTool): Promise<PlanWriteResult> {
  const { PlannedSession } = await db();
  return weekTx(tool, async (transaction, _weekStart, inWeek) => {
    const drafts = inWeek.filter((l) => l.dto.status === "draft");
    const publishedAt = new Date();
    for (const l of drafts) {
      await PlannedSession.update({ status: "published", publishedAt, ...bumped(l.dto) }, { where: { id: l.dto.id }, transaction });
    }
    const after = await loadById(
      drafts.map((l) => l.dto.id),
      transaction,
    );
    await notify({
      transaction,
      teamId: tool.teamId,
      actorUserId: tool.actorUserId,
      changes: drafts.map((l) => change("published", l, after.get(l.dto.id)!)),
    });
    return { sessions: [...after.values()].map((l) => l.dto), removedIds: [] };
  });
}
