import "server-only";
import { DateTime } from "luxon";
import { Op, type Transaction } from "sequelize";
import type {
  AthleteProfile,
  BlockInput,
  BlockKind,
  Completion,
  LogInput,
  PlyoDrill,
  PlyoLevel,
  RunningPrescription,
  SessionInput,
  SessionStatus,
  TeamLoadSettings,
} from "@/lib/load/types";
import { AppError } from "@/lib/errors";
import { db } from "@/models";
import { getTeamLoadSettings } from "./team-settings";

export type LoadAthleteInputs = {
  id: number;
  name: string;
  groupId: number | null;
  groupName: string | null;
  profile: AthleteProfile;
  /** Every session (any status) dated in [from, to], blocks in position order; ids as strings. */
  sessions: SessionInput[];
  /** Logs of those sessions. */
  logs: LogInput[];
};

export type LoadInputs = {
  teamId: number;
  settings: TeamLoadSettings;
  timeZone: string;
  /** Engine convention: 0 = Sunday, 1 = Monday … 6 = Saturday (the Team row stores ISO 1–7). */
  weekStartDay: number;
  athletes: LoadAthleteInputs[];
};

type Range = { from: string; to: string; transaction?: Transaction };

/**
 * Days of history to load before the first day a caller shows. The engine seeds the EWMA with the first day's
 * load; a seed error decays as (27/29)^t (methods.md §2), so after 168 days it is below 1e-5 and answers do
 * not depend on where loading started. Rolling windows need only 28 days.
 */
export const LOAD_HISTORY_DAYS = 168;

/** The date range to load for answers about [from, to]: LOAD_HISTORY_DAYS of history before it. */
export function historyRange({ from, to }: { from: string; to: string }): { from: string; to: string } {
  return { from: DateTime.fromISO(from).minus({ days: LOAD_HISTORY_DAYS }).toISODate()!, to };
}

/** Today's local date in the team's time zone: the one place the load feature reads the clock. */
export function teamToday({ timeZone, now }: { timeZone: string; now?: Date }): string {
  const dt = (now ? DateTime.fromJSDate(now) : DateTime.now()).setZone(timeZone);
  return (dt.isValid ? dt : DateTime.utc()).toISODate()!;
}

export type TeamClock = { teamId: number; timeZone: string; weekStartDay: number };

/** The team's zone and week start (engine convention); 404 when the team does not exist. */
export async function getTeamClock({ teamId, transaction }: { teamId: number; transaction?: Transaction }): Promise<TeamClock> {
  const { Team } = await db();
  const team = await Team.findByPk(teamId, { attributes: ["timeZone", "weekStartDay"], raw: true, transaction });
  if (!team) throw new AppError("not_found", "Not found");
  return { teamId, timeZone: team.timeZone, weekStartDay: engineWeekStartDay(team.weekStartDay) };
}

/** ISO weekday (1 = Monday … 7 = Sunday) → engine weekday (0 = Sunday … 6 = Saturday). */
export function engineWeekStartDay(isoWeekday: number): number {
  return ((isoWeekday % 7) + 7) % 7;
}

// Raw rows skip model instantiation (the squad-week handler has a 50 ms budget); JSON columns may come back as text.
function json<T>(value: unknown): T | null {
  if (value === null || value === undefined) return null;
  if (typeof value === "string") {
    try {
      return JSON.parse(value) as T;
    } catch {
      return null;
    }
  }
  return value as T;
}

function num(value: unknown): number | null {
  return value === null || value === undefined ? null : Number(value);
}

function dateOnly(value: unknown): string {
  return typeof value === "string" ? value.slice(0, 10) : DateTime.fromJSDate(value as Date, { zone: "utc" }).toISODate()!;
}

type AthleteRow = { id: number; name: string; groupId: number | null; vmaxMs: number | null; tauS: number | null; stepLengthM: number | null; plyoLevel: PlyoLevel };
type SessionRow = { id: number; athleteId: number; date: unknown; startTime: string; durationMin: number; plannedRpe: number; status: SessionStatus };
type BlockRow = { id: number; sessionId: number; kind: BlockKind; title: string; running: unknown; drills: unknown; notes: string | null };
type LogRow = { sessionId: number; athleteId: number; completion: Completion; rpe: unknown; minutes: unknown; completedReps: unknown };

async function loadInputs({ teamId, athleteId, from, to, transaction }: Range & { teamId: number; athleteId?: number }): Promise<LoadInputs> {
  const { Team, Athlete, TrainingGroup, PlannedSession, SessionBlock, SessionLog } = await db();
  const athleteWhere = athleteId === undefined ? { teamId } : { teamId, id: athleteId };
  const sessionWhere = { teamId, ...(athleteId === undefined ? {} : { athleteId }), date: { [Op.between]: [from, to] } };
  // A constant six queries whatever the squad size: no query per athlete or per session.
  const [team, settings, groups, athletes, sessions, blocks, logs] = await Promise.all([
    Team.findByPk(teamId, { attributes: ["timeZone", "weekStartDay"], raw: true, transaction }),
    getTeamLoadSettings({ teamId, transaction }),
    TrainingGroup.findAll({ where: { teamId }, attributes: ["id", "name", "sortOrder"], raw: true, transaction }),
    Athlete.findAll({
      where: athleteWhere,
      attributes: ["id", "name", "groupId", "vmaxMs", "tauS", "stepLengthM", "plyoLevel"],
      raw: true,
      transaction,
    }) as unknown as Promise<AthleteRow[]>,
    PlannedSession.findAll({
      where: sessionWhere,
      attributes: ["id", "athleteId", "date", "startTime", "durationMin", "plannedRpe", "status"],
      order: [["date", "ASC"], ["startTime", "ASC"], ["id", "ASC"]],
      raw: true,
      transaction,
    }) as unknown as Promise<SessionRow[]>,
    SessionBlock.findAll({
      attributes: ["id", "sessionId", "kind", "title", "running", "drills", "notes"],
      include: [{ model: PlannedSession, as: "session", attributes: [], where: sessionWhere, required: true }],
      order: [["sessionId", "ASC"], ["position", "ASC"], ["id", "ASC"]],
      raw: true,
      transaction,
    }) as unknown as Promise<BlockRow[]>,
    SessionLog.findAll({
      attributes: ["sessionId", "athleteId", "completion", "rpe", "minutes", "completedReps"],
      include: [{ model: PlannedSession, as: "session", attributes: [], where: sessionWhere, required: true }],
      raw: true,
      transaction,
    }) as unknown as Promise<LogRow[]>,
  ]);
  if (!team) throw new AppError("not_found", "Not found");

  const blocksBySession = new Map<number, BlockInput[]>();
  for (const b of blocks) {
    const list = blocksBySession.get(b.sessionId) ?? [];
    list.push({
      id: String(b.id),
      kind: b.kind,
      title: b.title,
      running: json<RunningPrescription>(b.running),
      drills: json<PlyoDrill[]>(b.drills),
      ...(b.notes ? { notes: b.notes } : {}),
    });
    blocksBySession.set(b.sessionId, list);
  }
  const byAthlete = new Map<number, LoadAthleteInputs>();
  const groupById = new Map(groups.map((g) => [g.id, g]));
  for (const a of athletes) {
    byAthlete.set(a.id, {
      id: a.id,
      name: a.name,
      groupId: a.groupId,
      groupName: a.groupId ? (groupById.get(a.groupId)?.name ?? null) : null,
      profile: { vmax: num(a.vmaxMs), tau: num(a.tauS), stepLengthM: num(a.stepLengthM), plyoLevel: a.plyoLevel },
      sessions: [],
      logs: [],
    });
  }
  for (const s of sessions) {
    byAthlete.get(s.athleteId)?.sessions.push({
      id: String(s.id),
      date: dateOnly(s.date),
      startTime: s.startTime,
      durationMin: Number(s.durationMin),
      plannedRpe: Number(s.plannedRpe),
      status: s.status,
      blocks: blocksBySession.get(s.id) ?? [],
    });
  }
  for (const l of logs) {
    byAthlete.get(l.athleteId)?.logs.push({
      sessionId: String(l.sessionId),
      completion: l.completion,
      rpe: num(l.rpe),
      minutes: num(l.minutes),
      completedReps: json<Record<string, number>>(l.completedReps),
    });
  }
  const sortOrder = (groupId: number | null) => (groupId !== null && groupById.has(groupId) ? groupById.get(groupId)!.sortOrder : 1e9);
  const list = [...byAthlete.values()].sort((x, y) => sortOrder(x.groupId) - sortOrder(y.groupId) || x.name.localeCompare(y.name));
  return { teamId, settings, timeZone: team.timeZone, weekStartDay: engineWeekStartDay(team.weekStartDay), athletes: list };
}

/** Every athlete of the team with sessions (and blocks) and logs dated in [from, to], as engine inputs. */
export async function getSquadLoadInputs({ teamId, from, to, transaction }: Range & { teamId: number }): Promise<LoadInputs> {
  return loadInputs({ teamId, from, to, transaction });
}

/** One athlete's engine inputs for [from, to]; 404 when the athlete does not exist. */
export async function getAthleteLoadInputs({ athleteId, from, to, transaction }: Range & { athleteId: number }): Promise<LoadInputs & { athlete: LoadAthleteInputs }> {
  const { Athlete } = await db();
  const row = await Athlete.findByPk(athleteId, { attributes: ["teamId"], raw: true, transaction });
  if (!row) throw new AppError("not_found", "Not found");
  const inputs = await loadInputs({ teamId: row.teamId, athleteId, from, to, transaction });
  const athlete = inputs.athletes[0];
  if (!athlete) throw new AppError("not_found", "Not found");
  return { ...inputs, athlete };
}
