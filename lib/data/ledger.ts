import "server-only";
import { jsonIds } from "@/lib/db/sql";
import { QueryTypes, type Sequelize, type Transaction } from "sequelize";
import { sqliteConnectionOf } from "@/lib/db/raw";
import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import { ledgerDayValues, ledgerMethod, recomputeLedger, type LedgerRow, type LedgerState } from "@/lib/load/ledger";
import { METRICS } from "@/lib/load/types";
import { db } from "@/models";
import { transactionTeam } from "./transaction";
import { getLoadSeriesInputs } from "./load";

// The load ledger's rows (migration 011, lib/load/README.md §12). Plain SQL with bound values: a row is five
// integers and eight BLOBs of six doubles, so a squad's week is a few thousand small rows and a rebuild is
// a hundred thousand of them.

const GROUPS = ["past", "today", "ahead", "planned", "cum", "acute", "chronic", "ratio"] as const;
const COLUMNS = ["athlete_id", "day", "flags", "on_record", "kept", ...GROUPS];
const NM = METRICS.length;

// SQLite stores the bytes as given; the app reads them back on the same kind of machine, and DataView-free
// Float64Array views keep a rebuild's hundred thousand rows from allocating a buffer per value set.
const LITTLE_ENDIAN = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

/** One chunk's value sets in one buffer: set(i, values) writes the i-th set, blob(i) is a view of it. */
function blobChunk(count: number) {
  const f64 = new Float64Array(count * NM);
  const bytes = Buffer.from(f64.buffer);
  return {
    set(i: number, values: readonly number[]) {
      for (let k = 0; k < NM; k++) f64[i * NM + k] = values[k];
      if (!LITTLE_ENDIAN) for (let k = 0; k < NM; k++) bytes.writeDoubleLE(values[k], 8 * (i * NM + k));
    },
    blob: (i: number) => bytes.subarray(8 * NM * i, 8 * NM * (i + 1)),
  };
}

function decode(b: Uint8Array): number[] {
  const buf = Buffer.isBuffer(b) ? b : Buffer.from(b);
  const out = new Array<number>(NM);
  for (let k = 0; k < NM; k++) out[k] = buf.readDoubleLE(8 * k);
  return out;
}

type StoredRow = { athlete_id: number; day: number; flags: number; on_record: number; kept: number } & Record<
  (typeof GROUPS)[number],
  Uint8Array
>;

function fromStored(r: StoredRow): LedgerRow {
  return {
    day: Number(r.day),
    flags: Number(r.flags),
    onRecord: Number(r.on_record),
    kept: Number(r.kept),
    past: decode(r.past),
    today: decode(r.today),
    ahead: decode(r.ahead),
    planned: decode(r.planned),
    cum: decode(r.cum),
    acute: decode(r.acute),
    chronic: decode(r.chronic),
    ratio: decode(r.ratio),
  };
}

type Conn = { sequelize?: Sequelize; transaction?: Transaction | null };

async function handle(c: Conn): Promise<Sequelize> {
  return c.sequelize ?? (await db()).sequelize;
}

/**
 * Stored rows of each athlete for [from, to] and the 28 rows up to the last stored day before `from` (what
 * lib/load/ledger.ts ledgerWindow reads), ascending by day. Index seeks only: the cost follows the days asked for.
 */
export async function readLedgerRows({
  athleteIds,
  from,
  to,
  ...c
}: Conn & { athleteIds: readonly number[]; from: number; to: number }): Promise<Map<number, LedgerRow[]>> {
  const out = new Map<number, LedgerRow[]>(athleteIds.map((id) => [id, []]));
  if (athleteIds.length === 0) return out;
  const sequelize = await handle(c);
  const rows = await sequelize.query<StoredRow>(
    `WITH ids(id) AS (${jsonIds(sequelize)}),
      last AS (SELECT ids.id, (SELECT max(day) FROM load_ledger WHERE athlete_id = ids.id AND day < :from) AS day FROM ids)
    SELECT ${COLUMNS.join(", ")} FROM load_ledger l JOIN ids ON l.athlete_id = ids.id WHERE l.day BETWEEN :from AND :to
    UNION ALL
    SELECT ${COLUMNS.map((n) => `l.${n}`).join(", ")} FROM load_ledger l JOIN last ON l.athlete_id = last.id
      WHERE last.day IS NOT NULL AND l.day BETWEEN last.day - 27 AND last.day
    ORDER BY athlete_id, day`,
    {
      type: QueryTypes.SELECT,
      replacements: { ids: JSON.stringify(athleteIds), from, to },
      transaction: c.transaction ?? undefined,
    },
  );
  for (const r of rows) out.get(Number(r.athlete_id))?.push(fromStored(r));
  return out;
}

/** Inserts rows in chunks; on SQLite straight through the transaction's connection (Sequelize's bind handling costs 8× more). */
async function insertRows(
  sequelize: Sequelize,
  transaction: Transaction,
  athleteId: number,
  rows: readonly LedgerRow[],
): Promise<void> {
  const per = COLUMNS.length;
  const chunk = 400;
  const raw = sqliteConnectionOf(transaction);
  for (let at = 0; at < rows.length; at += chunk) {
    const part = rows.slice(at, at + chunk);
    const params: unknown[] = [];
    const blobs = blobChunk(part.length * GROUPS.length);
    part.forEach((r, i) => {
      params.push(athleteId, r.day, r.flags, r.onRecord, r.kept);
      GROUPS.forEach((g, j) => {
        blobs.set(i * GROUPS.length + j, r[g]);
        params.push(blobs.blob(i * GROUPS.length + j));
      });
    });
    if (raw) {
      const tuple = `(${new Array(per).fill("?").join(",")})`;
      const sql = `INSERT INTO load_ledger (${COLUMNS.join(", ")}) VALUES ${part.map(() => tuple).join(",")}`;
      await new Promise<void>((resolve, reject) => raw.run(sql, params, (err) => (err ? reject(err) : resolve())));
    } else {
      let n = 0;
      const tuples = part.map(() => `(${COLUMNS.map(() => `$${++n}`).join(",")})`);
      const sql = `INSERT INTO load_ledger (${COLUMNS.join(", ")}) VALUES ${tuples.join(",")}`;
      await sequelize.query(sql, { bind: params, transaction });
    }
  }
}

/** Replaces one athlete's rows from `from` on (and any before `keepFrom`) with `rows`. */
export async function writeLedgerRows({
  athleteId,
  keepFrom,
  from,
  rows,
  transaction,
  ...c
}: Conn & {
  athleteId: number;
  keepFrom: number;
  from: number;
  rows: readonly LedgerRow[];
  transaction: Transaction;
}): Promise<void> {
  const sequelize = await handle(c);
  await sequelize.query("DELETE FROM load_ledger WHERE athlete_id = :athleteId AND (day < :keepFrom OR day >= :from)", {
    replacements: { athleteId, keepFrom, from },
    transaction,
  });
  await insertRows(sequelize, transaction, athleteId, rows);
}

type Bounds = {
  id: number;
  team_id: number;
  first: string | null;
  last: string | null;
  lmin: number | null;
  lmax: number | null;
  mark: string | null;
};

/**
 * Brings the ledger of the marked athletes up to date inside `transaction`: each from the first day a trigger
 * (migration 011) or the caller (`athleteIds` from `fromDay`) marked, forward. Returns how many were refreshed.
 * Every writer of sessions, blocks, logs, profiles or team settings calls it before it commits, so readers
 * never see a stale ledger; a reader that still finds a mark refreshes first (ensureLedgerFresh).
 */
export async function refreshLedger({
  athleteIds,
  fromDay,
  teamId,
  ...c
}: Conn & {
  athleteIds?: readonly number[];
  fromDay?: number;
  teamId?: number;
  transaction: Transaction;
}): Promise<number> {
  const sequelize = await handle(c);
  const transaction = c.transaction!;
  const select = <T extends object>(sql: string, replacements: Record<string, unknown>) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements, transaction });
  if (athleteIds && athleteIds.length > 0 && fromDay !== undefined) {
    const from = Number.isFinite(fromDay) ? dateFromDayIndex(fromDay) : "0000-01-01";
    for (const id of athleteIds) {
      await sequelize.query(
        `INSERT INTO load_ledger_dirty (athlete_id, from_date) VALUES (:id, :from)
          ON CONFLICT (athlete_id) DO UPDATE SET from_date = CASE WHEN excluded.from_date < load_ledger_dirty.from_date
            THEN excluded.from_date ELSE load_ledger_dirty.from_date END`,
        { replacements: { id, from }, transaction },
      );
    }
  }
  const marked = await select<Bounds>(
    `SELECT a.id, a.team_id, m.from_date AS mark,
      (SELECT min(date) FROM planned_sessions WHERE athlete_id = a.id) AS first,
      (SELECT max(date) FROM planned_sessions WHERE athlete_id = a.id) AS last,
      (SELECT min(day) FROM load_ledger WHERE athlete_id = a.id) AS lmin,
      (SELECT max(day) FROM load_ledger WHERE athlete_id = a.id) AS lmax
    FROM load_ledger_dirty m JOIN athletes a ON a.id = m.athlete_id
    WHERE (:team = 0 OR a.team_id = :team)`,
    // A transaction confined to one team takes in that team's marks only: another team's writer may hold its own.
    { team: teamId ?? transactionTeam(transaction) ?? 0 },
  );
  if (marked.length === 0) return 0;
  const byTeam = new Map<number, Bounds[]>();
  for (const b of marked) byTeam.set(b.team_id, [...(byTeam.get(b.team_id) ?? []), b]);
  for (const [team, list] of byTeam) {
    const plans = list.map((b) => {
      if (b.first === null || b.last === null) return { b, start: null as number | null, first: 0, last: 0 };
      const first = dayIndex(b.first.slice(0, 10));
      const last = dayIndex(b.last.slice(0, 10));
      let start = b.mark && b.mark > "0000-01-01" ? dayIndex(b.mark) : first;
      // A ledger that does not reach back to the first session, or stops short of the start, is rebuilt from there.
      if (b.lmin === null || b.lmin > first) start = first;
      else if (b.lmax !== null && b.lmax < start - 1) start = b.lmax + 1;
      // Past the last session: only rows to drop.
      return { b, start: Math.min(Math.max(start, first), last + 1), first, last };
    });
    const live = plans.filter((p) => p.start !== null);
    for (const p of plans)
      if (p.start === null)
        await writeLedgerRows({ sequelize, transaction, athleteId: p.b.id, keepFrom: 0, from: -1e9, rows: [] });
    if (live.length > 0) {
      const from = dateFromDayIndex(Math.min(...live.map((p) => p.start!)));
      const through = dateFromDayIndex(Math.max(...live.map((p) => p.last)));
      const [inputs, stored] = await Promise.all([
        getLoadSeriesInputs({
          sequelize,
          teamId: team,
          athleteIds: live.map((p) => p.b.id),
          from,
          through,
          transaction,
        }),
        Promise.all(
          live.map((p) =>
            readLedgerRows({ sequelize, transaction, athleteIds: [p.b.id], from: p.start! - 28, to: p.start! - 1 }),
          ),
        ),
      ]);
      const method = ledgerMethod(inputs.settings);
      for (let i = 0; i < live.length; i++) {
        const p = live[i];
        const a = inputs.athletes.find((x) => x.id === p.b.id);
        if (!a) continue;
        // Rows before the first session (a first session moved later) are about to go: no state comes from them.
        const before: LedgerState[] = (stored[i].get(p.b.id) ?? []).filter(
          (r) => r.day >= Math.max(p.start! - 28, p.first) && r.day < p.start!,
        );
        const values = ledgerDayValues(
          {
            sessions: a.sessions,
            logs: a.logs,
            profile: a.profile,
            settings: inputs.settings,
          },
          p.start!,
          p.last,
        );
        await writeLedgerRows({
          sequelize,
          transaction,
          athleteId: a.id,
          keepFrom: p.first,
          from: p.start!,
          rows: recomputeLedger(values, before, method),
        });
      }
    }
    await sequelize.query("DELETE FROM load_ledger_dirty WHERE athlete_id IN (:ids)", {
      replacements: { ids: list.map((b) => b.id) },
      transaction,
    });
  }
  return marked.length;
}

/** True when some athlete (of `athleteIds`, or any) has a change the ledger has not taken in yet. */
export async function ledgerHasMarks({
  athleteIds,
  ...c
}: Conn & { athleteIds?: readonly number[] }): Promise<boolean> {
  const sequelize = await handle(c);
  const rows = await sequelize.query<{ one: number }>(
    `SELECT 1 AS one FROM load_ledger_dirty WHERE (:all = 1 OR athlete_id IN (${jsonIds(sequelize)})) LIMIT 1`,
    {
      type: QueryTypes.SELECT,
      replacements: { all: athleteIds ? 0 : 1, ids: JSON.stringify(athleteIds ?? []) },
      transaction: c.transaction ?? undefined,
    },
  );
  return rows.length > 0;
}

/**
 * Before a read: takes in any change still marked for these athletes (a writer that bypassed the refresh, e.g.
 * a seed or a test fixture). One indexed probe when nothing is marked, which is the normal case.
 */
export async function ensureLedgerFresh({
  athleteIds,
  ...c
}: Conn & { athleteIds?: readonly number[] }): Promise<void> {
  if (c.transaction) {
    if (await ledgerHasMarks({ ...c, athleteIds })) await refreshLedger({ ...c, transaction: c.transaction });
    return;
  }
  if (!(await ledgerHasMarks({ ...c, athleteIds }))) return;
  const sequelize = await handle(c);
  await sequelize.transaction((transaction) => refreshLedger({ sequelize, transaction }));
}
