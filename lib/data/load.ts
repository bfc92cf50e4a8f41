import "server-only";
import { QueryTypes, type Sequelize, type Transaction } from "sequelize";
import type {
  AthleteProfile,
  EarlierProfile,
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
import type { TeamClock } from "@/lib/dates/zoned";
import { AppError } from "@/lib/errors";
import { toPlanSession } from "@/lib/plan/dto";
import type { PlanSession } from "@/lib/plan/types";
import { db } from "@/models";
import { SETTINGS_SQL_COLUMNS, toEngineSettings, type SettingsRow } from "./team-settings";

export type LoadAthleteInputs = {
  id: number;
  name: string;
  groupId: number | null;
  groupName: string | null;
  profile: AthleteProfile;
  /** Every session (any status) from the athlete's first to `through`, blocks in position order; ids as strings. */
  sessions: SessionInput[];
  /** Logs of those sessions. */
  logs: LogInput[];
};

export type LoadInputs = {
  teamId: number;
  settings: TeamLoadSettings;
  timeZone: string;
  /** ISO weekday the team's week starts on (1 = Monday … 7 = Sunday). */
  weekStartDay: number;
  athletes: LoadAthleteInputs[];
  /** With `gridFrom`: the week grid's form of every session read dated on or after it, in date order. */
  gridSessions?: PlanSession[];
};

/**
 * What every load figure is computed from: each athlete's whole history up to `through` (the last day the
 * caller shows). Nothing is cut at the start, so the engine's one daily series per athlete × metric × view
 * begins on the athlete's first day on record whichever screen asks (lib/load/README.md §5).
 */
type Through = {
  through: string;
  /** Only sessions from this day on (the ledger's refresh); the readers that compute figures leave it out. */
  from?: string;
  transaction?: Transaction;
  /** The database to read (a migration passes its own); default the app's. */
  sequelize?: Sequelize;
  /** false: leave accepted speed tests out (a migration older than 015 reads a database without them). */
  profileHistory?: boolean;
  /**
   * "YYYY-MM-DD": the same query also gives the week grid's form of the sessions from this day on (`gridSessions`:
   * titles, notes, versions, block ids and templates), so the week plan reads its sessions once.
   */
  gridFrom?: string;
};

/** The team's zone and ISO week start; 404 when the team does not exist. */
export async function getTeamClock({
  teamId,
  transaction,
}: {
  teamId: number;
  transaction?: Transaction;
}): Promise<TeamClock> {
  const { Team } = await db();
  const team = await Team.findByPk(teamId, { attributes: ["timeZone", "weekStartDay"], raw: true, transaction });
  if (!team) throw new AppError("not_found", "Not found");
  return { teamId, timeZone: team.timeZone, weekStartDay: team.weekStartDay };
}

// JSON columns come back from SQLite as text.
function json<T>(value: unknown): T | null {
  if (value === null || value === undefined) return null;
  if (typeof value !== "string") return value as T;
  try {
    return JSON.parse(value) as T;
  } catch {
    return null;
  }
}

function num(value: unknown): number | null {
  return value === null || value === undefined ? null : Number(value);
}

type TeamRow = SettingsRow & {
  time_zone: string;
  week_start_day: number;
  settings_id: number | null;
};
type AthleteRow = {
  id: number;
  name: string;
  group_id: number | null;
  group_name: string | null;
  group_order: number | null;
  vmax_ms: number | null;
  tau_s: number | null;
  step_length_m: number | null;
  plyo_level: PlyoLevel;
  /** JSON text [[effective_from, vmax, tau, step length], …] of the athlete's speed profile entries, or null. */
  earlier: string | null;
};
type SessionRow = {
  id: number;
  athlete_id: number;
  date: string;
  start_time: string;
  duration_min: number;
  planned_rpe: number;
  status: SessionStatus;
  /** The session's log (one at most: session_logs.session_id is unique); null columns when unlogged. */
  completion: Completion | null;
  rpe: unknown;
  minutes: unknown;
  completed_reps: unknown;
  /** JSON text: [[id, kind, title, running, drills], …] in position order, or null without blocks. */
  blocks: string | null;
};
/** The grid's extra columns (gridFrom); the packed blocks then also carry template id, position and notes. */
type GridColumns = {
  title: string;
  notes: string | null;
  version: number;
  sequence: number;
  published_at: Date | string | null;
  updated_at: Date | string;
  log_id: number | null;
};
type PackedBlock = [number, BlockKind, string, RunningPrescription | null, PlyoDrill[] | null];
type PackedGridBlock = [...PackedBlock, number | null, number, string | null];

// Plain SQL, not model finders: the squad-week handler has a 50 ms budget and Sequelize's row handling costs
// about twice the query itself. Values go in as escaped replacements; table names are the migrations'.
// Each session's blocks come packed into one JSON text: the sqlite3 driver pays per value it hands over, and
// this cut the squad read by about a quarter. The text is built only from integer ids, json_quote()d strings
// and the JSON columns as Sequelize stored them, so it is always valid JSON.
// Two filters, not one with "(:everyone = 1 OR athlete_id IN …)": SQLite cannot use the (athlete_id, date) index
// through an OR, and reading one athlete then scanned the whole squad's history.
const SESSION_FILTER = {
  team: "s.team_id = :teamId AND s.date <= :through AND s.date >= :from",
  athletes: "s.athlete_id IN (:athleteIds) AND s.team_id = :teamId AND s.date <= :through AND s.date >= :from",
};
const SQL = {
  team: `SELECT t.time_zone, t.week_start_day, ${SETTINGS_SQL_COLUMNS}
    FROM teams t LEFT JOIN team_load_settings s ON s.team_id = t.id WHERE t.id = :teamId`,
  athletes: `SELECT a.id, a.name, a.group_id, g.name AS group_name, g.sort_order AS group_order,
    a.vmax_ms, a.tau_s, a.step_length_m, a.plyo_level, {earlier} AS earlier
    FROM athletes a LEFT JOIN training_groups g ON g.id = a.group_id
    WHERE a.team_id = :teamId AND (:everyone = 1 OR a.id IN (:athleteIds))`,
  sessions: `SELECT s.id, s.athlete_id, s.date, s.start_time, s.duration_min, s.planned_rpe, s.status,
    l.completion, l.rpe, l.minutes, l.completed_reps{grid},
    {blocks} AS blocks
    FROM planned_sessions s LEFT JOIN session_logs l ON l.session_id = s.id
    WHERE {filter} ORDER BY s.date, s.start_time, s.id`,
};

// The same packed text in each dialect's words (PostgreSQL: string_agg and to_json for json_quote).
const BLOCKS_SQL = {
  sqlite: `(SELECT '[' || group_concat('[' || b.id || ',' || json_quote(b.kind) || ',' || json_quote(b.title) || ','
      || coalesce(b.running, 'null') || ',' || coalesce(b.drills, 'null'){grid} || ']', ',' ORDER BY b.position, b.id)
      || ']' FROM session_blocks b WHERE b.session_id = s.id)`,
  postgres: `(SELECT '[' || string_agg('[' || b.id || ',' || to_json(b.kind)::text || ',' || to_json(b.title)::text || ','
      || coalesce(b.running::text, 'null') || ',' || coalesce(b.drills::text, 'null'){grid} || ']', ','
      ORDER BY b.position, b.id) || ']' FROM session_blocks b WHERE b.session_id = s.id)`,
};
const GRID_BLOCK_SQL = {
  sqlite: ` || ',' || coalesce(b.template_id, 'null') || ',' || b.position || ',' || json_quote(b.notes)`,
  postgres: ` || ',' || coalesce(b.template_id::text, 'null') || ',' || b.position || ',' || coalesce(to_json(b.notes)::text, 'null')`,
};
const GRID_SESSION_SQL = `, s.title, s.notes, s.version, s.sequence, s.published_at, s.updated_at, l.id AS log_id`;

// Accepted speed tests (migration 015, lib/speed/README.md §4), packed like the blocks: one value per athlete.
const EARLIER_SQL = {
  sqlite: `(SELECT json_group_array(json_array(p.effective_from, p.vmax_ms, p.tau_s, p.step_length_m))
      FROM speed_profile_entries p WHERE p.athlete_id = a.id)`,
  postgres: `(SELECT json_agg(json_build_array(p.effective_from, p.vmax_ms, p.tau_s, p.step_length_m))::text
      FROM speed_profile_entries p WHERE p.athlete_id = a.id)`,
};

/**
 * Each entry is in force until the next one's date; the last one is the athlete row's current values (accepting
 * a test copies it there), so only the entries before it become `earlier`.
 */
function earlierProfiles(packed: string | null): EarlierProfile[] | undefined {
  const list = json<[string, number | null, number | null, number | null][]>(packed);
  if (!list || list.length < 2) return undefined;
  const sorted = list.map(([from, vmax, tau, step]) => ({ from: String(from).slice(0, 10), vmax, tau, step }));
  sorted.sort((x, y) => (x.from < y.from ? -1 : x.from > y.from ? 1 : 0));
  return sorted.slice(0, -1).map((e, i) => ({
    until: sorted[i + 1].from,
    vmax: num(e.vmax),
    tau: num(e.tau),
    stepLengthM: num(e.step),
  }));
}

function toBlocks(packed: string | null): BlockInput[] {
  const list = json<PackedBlock[]>(packed);
  if (!list) return [];
  return list.map(([id, kind, title, running, drills]) => ({ id: String(id), kind, title, running, drills }));
}

/** The one reader of load inputs: every athlete of the team (or only `athleteIds`) with all sessions and logs up to `through`. */
export async function getLoadSeriesInputs({
  teamId,
  athleteIds,
  through,
  from,
  transaction,
  sequelize: given,
  profileHistory = true,
  gridFrom,
}: Through & { teamId: number; athleteIds?: readonly number[] }): Promise<LoadInputs> {
  const sequelize = given ?? (await db()).sequelize;
  // IN () is not SQL: an empty list becomes [0], which matches no row.
  const replacements = {
    teamId,
    everyone: athleteIds ? 0 : 1,
    athleteIds: athleteIds && athleteIds.length > 0 ? [...athleteIds] : [0],
    through,
    // Year 1, not 0: PostgreSQL has no year 0.
    from: from ?? "0001-01-01",
  };
  const select = <T extends object>(sql: string) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements, transaction });
  const dialect = sequelize.getDialect() === "postgres" ? "postgres" : "sqlite";
  const athletesSql = SQL.athletes.replace("{earlier}", profileHistory ? EARLIER_SQL[dialect] : "NULL");
  const grid = gridFrom !== undefined;
  const sessionsSql = SQL.sessions
    .replace("{filter}", athleteIds ? SESSION_FILTER.athletes : SESSION_FILTER.team)
    .replace("{grid}", grid ? GRID_SESSION_SQL : "")
    .replace("{blocks}", BLOCKS_SQL[dialect].replace("{grid}", grid ? GRID_BLOCK_SQL[dialect] : ""));
  // A constant three queries whatever the squad size: no query per athlete or per session.
  const [[team], athletes, sessions] = await Promise.all([
    select<TeamRow>(SQL.team),
    select<AthleteRow>(athletesSql),
    select<SessionRow & Partial<GridColumns>>(sessionsSql),
  ]);
  if (!team) throw new AppError("not_found", "Not found");
  const settings = toEngineSettings(team.settings_id === null ? null : team);

  const byAthlete = new Map<number, LoadAthleteInputs>();
  for (const a of athletes) {
    const earlier = earlierProfiles(a.earlier);
    byAthlete.set(a.id, {
      id: a.id,
      name: a.name,
      groupId: a.group_id,
      groupName: a.group_name,
      profile: {
        vmax: num(a.vmax_ms),
        tau: num(a.tau_s),
        stepLengthM: num(a.step_length_m),
        plyoLevel: a.plyo_level,
        ...(earlier ? { earlier } : {}),
      },
      sessions: [],
      logs: [],
    });
  }
  for (const s of sessions) {
    const athlete = byAthlete.get(s.athlete_id);
    if (!athlete) continue;
    athlete.sessions.push({
      id: String(s.id),
      date: s.date.slice(0, 10),
      startTime: s.start_time,
      durationMin: Number(s.duration_min),
      plannedRpe: Number(s.planned_rpe),
      status: s.status,
      blocks: toBlocks(s.blocks),
    });
    if (s.completion !== null) {
      athlete.logs.push({
        sessionId: String(s.id),
        completion: s.completion,
        rpe: num(s.rpe),
        minutes: num(s.minutes),
        completedReps: json<Record<string, number>>(s.completed_reps),
      });
    }
  }
  const gridSessions = grid ? toGridSessions(sessions as (SessionRow & GridColumns)[], gridFrom) : undefined;
  const order = new Map(athletes.map((a) => [a.id, a.group_order ?? 1e9]));
  const list = [...byAthlete.values()].sort(
    (x, y) => order.get(x.id)! - order.get(y.id)! || x.name.localeCompare(y.name),
  );
  return {
    teamId,
    settings,
    timeZone: team.time_zone,
    weekStartDay: team.week_start_day,
    athletes: list,
    ...(gridSessions ? { gridSessions } : {}),
  };
}

/** The grid's sessions (lib/plan/dto.ts, as the model reader gives them) from the rows dated `from` on. */
function toGridSessions(rows: readonly (SessionRow & GridColumns)[], from: string): PlanSession[] {
  return rows
    .filter((s) => s.date.slice(0, 10) >= from)
    .map((s) =>
      toPlanSession({
        id: s.id,
        athleteId: s.athlete_id,
        date: s.date,
        startTime: s.start_time,
        durationMin: s.duration_min,
        title: s.title,
        plannedRpe: s.planned_rpe,
        status: s.status,
        notes: s.notes,
        version: Number(s.version),
        sequence: Number(s.sequence),
        publishedAt: s.published_at,
        updatedAt: s.updated_at,
        log: s.log_id === null ? null : { id: s.log_id },
        blocks: (json<PackedGridBlock[]>(s.blocks) ?? []).map(
          ([id, kind, title, running, drills, templateId, position, notes]) => ({
            id,
            templateId,
            position,
            kind,
            title,
            running,
            drills,
            notes,
          }),
        ),
      }),
    );
}

/** One athlete's engine inputs (getLoadSeriesInputs for their team); 404 when the athlete does not exist. */
export async function getAthleteLoadInputs({
  athleteId,
  through,
  transaction,
}: Through & { athleteId: number }): Promise<LoadInputs & { athlete: LoadAthleteInputs }> {
  const { Athlete } = await db();
  const row = await Athlete.findByPk(athleteId, { attributes: ["teamId"], raw: true, transaction });
  if (!row) throw new AppError("not_found", "Not found");
  const inputs = await getLoadSeriesInputs({ teamId: row.teamId, athleteIds: [athleteId], through, transaction });
  const athlete = inputs.athletes[0];
  if (!athlete) throw new AppError("not_found", "Not found");
  return { ...inputs, athlete };
}
