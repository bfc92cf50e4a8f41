// The season forecast as a progression would leave it, before anything is written: the same planning step as the
// write (progression-plan.ts) and the same ledger steps as the server's refresh and season read
// (lib/load/ledger.ts, ledger-week.ts), run in the browser on what the server sent once (ProgressionBase). The
// numbers equal the season view after the write (tests/integration/season-preview.test.ts).
import { addDays, dayIndex, shiftWeek } from "@/lib/dates/plain-date";
import {
  ledgerDayValues,
  ledgerMethod,
  recomputeLedger,
  type LedgerDayValues,
  type LedgerRow,
} from "@/lib/load/ledger";
import { ledgerWeeks, type LedgerWeek } from "@/lib/load/ledger-week";
import type { AthleteProfile, LogInput, SessionInput, TeamLoadSettings } from "@/lib/load/types";
import { toBlockInput } from "@/lib/plan/blocks";
import type { PlanSession } from "@/lib/plan/types";
import type { ProgressionRule } from "./progression";
import { planProgression } from "./progression-plan";
import { rowWarnings, seasonCell, type GridMeet, type GridPhase, type SeasonRow } from "./season-grid";

/** What the browser needs to preview any rule from one source week into weeks from `firstWeekStart` on. */
export type ProgressionBase = {
  today: string;
  sourceWeekStart: string;
  firstWeekStart: string;
  /** Last day previewed (the season view's last day). */
  through: string;
  settings: TeamLoadSettings;
  /** The source week's sessions, in the order the write reads them. */
  source: PlanSession[];
  /** Athletes with a session in the source week. */
  athletes: {
    id: number;
    profile: AthleteProfile;
    /** Stored ledger rows up to the day before the first week (ledgerReadRange of that week's window), compacted. */
    rows: WireRow[];
    /** Every session from the recovery look-back before the first week to `through`, any status. */
    sessions: SessionInput[];
    logs: LogInput[];
  }[];
};

/**
 * A stored ledger row with only the parts the preview reads (ledger.ts): before today a window takes the stored
 * state (the prefix sums and kept days for the steps that look 7 and 28 days back; the ratios and past values
 * of the days it shows; the full state of the last day it steps on), from today on it steps from the day's
 * values ("ahead" in the projected view). Ratios carry NaN as null (JSON has no NaN).
 */
export type WireRow = {
  day: number;
  flags: number;
  onRecord: number;
  kept: number;
  cum?: number[];
  acute?: number[];
  chronic?: number[];
  ratio?: (number | null)[];
  past?: number[];
  ahead?: number[];
};

/** The rows of `rows` (ascending) for a preview from `firstDay` read on `todayDay`. */
export function toWireRows(rows: readonly LedgerRow[], firstDay: number, todayDay: number): WireRow[] {
  const shownFrom = firstDay - 7;
  return rows.map((r, i) => {
    const base = { day: r.day, flags: r.flags, onRecord: r.onRecord, kept: r.kept };
    if (r.day >= todayDay) return { ...base, ahead: r.ahead };
    const shown = r.day >= shownFrom;
    const full = shown || i === rows.length - 1 || r.day === todayDay - 1;
    return {
      ...base,
      cum: r.cum,
      ...(full ? { acute: r.acute, chronic: r.chronic } : {}),
      ...(shown ? { ratio: r.ratio.map((x) => (Number.isNaN(x) ? null : x)), past: r.past } : {}),
    };
  });
}

const ZEROS: readonly number[] = [0, 0, 0, 0, 0, 0];

/** Back to ledger rows: the parts left out are never read (zeros stand in). */
function fromWireRows(rows: readonly WireRow[]): LedgerRow[] {
  const z = () => [...ZEROS];
  return rows.map((r) => ({
    day: r.day,
    flags: r.flags,
    onRecord: r.onRecord,
    kept: r.kept,
    cum: r.cum ?? z(),
    acute: r.acute ?? z(),
    chronic: r.chronic ?? z(),
    ratio: r.ratio ? r.ratio.map((x) => x ?? Number.NaN) : z().fill(Number.NaN),
    past: r.past ?? z(),
    today: z(),
    ahead: r.ahead ?? z(),
    planned: z(),
  }));
}

/** Ids a preview gives new drafts: above every stored id, in write order, as the database will number them. */
const DRAFT_ID_BASE = 1e12;

// Plain comparisons: dates and "HH:MM" times compare as strings, and localeCompare costs more than the rest here.
const order = (x: string, y: string) => (x < y ? -1 : x > y ? 1 : 0);
const byCalendar = (a: SessionInput, b: SessionInput) =>
  order(a.date, b.date) || order(a.startTime, b.startTime) || Number(a.id) - Number(b.id);

/** Per athlete of the base, the ledger's week for each week from the first generated one to `through`. */
export function previewProgression(
  base: ProgressionBase,
  request: { weeks: number; rule: ProgressionRule },
): Map<number, Map<string, LedgerWeek>> {
  const logged = new Set(base.athletes.flatMap((a) => a.logs.map((l) => l.sessionId)));
  const plan = planProgression({
    source: base.source,
    target: base.athletes.flatMap((a) =>
      a.sessions.map((s) => ({
        id: Number(s.id),
        athleteId: a.id,
        date: s.date,
        status: s.status,
        logged: logged.has(s.id),
      })),
    ),
    request: { ...request, sourceWeekStart: base.sourceWeekStart, firstWeekStart: base.firstWeekStart },
  });
  const replaced = new Set(plan.replacedIds.map(String));
  const drafts = new Map<number, SessionInput[]>();
  plan.drafts.forEach((d, i) => {
    if (d.date > base.through) return;
    const list = drafts.get(d.athleteId) ?? [];
    list.push({
      id: String(DRAFT_ID_BASE + i),
      date: d.date,
      startTime: d.startTime,
      durationMin: d.durationMin,
      plannedRpe: d.plannedRpe,
      status: "draft",
      blocks: d.blocks.map(toBlockInput),
    });
    drafts.set(d.athleteId, list);
  });
  const firstDay = dayIndex(base.firstWeekStart);
  const toDay = dayIndex(base.through);
  const starts: string[] = [];
  for (let w = base.firstWeekStart; w <= base.through; w = shiftWeek(w, 1)) starts.push(w);
  const method = ledgerMethod(base.settings);
  const todayDay = dayIndex(base.today);
  const out = new Map<number, Map<string, LedgerWeek>>();
  for (const a of base.athletes) {
    const stored = fromWireRows(a.rows);
    const sessions = [...a.sessions.filter((s) => !replaced.has(s.id)), ...(drafts.get(a.id) ?? [])].sort(byCalendar);
    // The refresh starts where the stored rows stop when they stop short of the first week (refreshLedger).
    const last = stored.length > 0 ? stored[stored.length - 1].day : null;
    const start = last !== null && last < firstDay - 1 ? last + 1 : firstDay;
    const before = stored.filter((r) => r.day >= start - 28 && r.day < start);
    const from = addDays(base.firstWeekStart, start - firstDay);
    const values = ledgerDayValues(
      { sessions: sessions.filter((s) => s.date >= from), logs: a.logs, profile: a.profile, settings: base.settings },
      start,
      toDay,
    );
    // From today on a window steps each day from its values and reads no stored state: the settled states of
    // those days (what the write stores) are worked out only for days before today.
    const settled = start < todayDay ? recomputeLedger(values, before, method) : values.map(aheadOnly);
    const rows = [...stored.filter((r) => r.day < start), ...settled];
    out.set(
      a.id,
      ledgerWeeks({
        rows,
        sessions,
        logs: a.logs,
        profile: a.profile,
        settings: base.settings,
        starts,
        toDay,
        todayDay,
        view: "projected",
        method,
      }),
    );
  }
  return out;
}

// A window never reads these from a day it steps on (shared, never written to).
const NO_STATE = {
  onRecord: 0,
  kept: 0,
  cum: ZEROS as number[],
  acute: ZEROS as number[],
  chronic: ZEROS as number[],
  ratio: ZEROS as number[],
};
const aheadOnly = (v: LedgerDayValues): LedgerRow => Object.assign(v, NO_STATE);

type ViewLike = {
  currentWeekStart: string;
  settings: { acwrMetric: TeamLoadSettings["acwrMetric"]; weeklyChangeLimitPct: number };
  phases: readonly GridPhase[];
  meets: readonly GridMeet[];
  athletes: ({ id: number; groupId: number | null } & SeasonRow)[];
};

/**
 * The season view with the previewed weeks in place of the stored ones (cells marked `preview`) and each changed
 * row's warnings worked out again over its cells.
 */
export function withPreview<V extends ViewLike>(view: V, preview: Map<number, Map<string, LedgerWeek>>): V {
  return {
    ...view,
    athletes: view.athletes.map((a) => {
      const weeks = preview.get(a.id);
      if (!weeks) return a;
      const ctx = {
        athlete: a,
        phases: view.phases,
        meets: view.meets,
        acwrMetric: view.settings.acwrMetric,
        weeklyChangeLimitPct: view.settings.weeklyChangeLimitPct,
        currentWeekStart: view.currentWeekStart,
      };
      const cells = a.cells.map((c) => {
        const w = weeks.get(c.weekStart);
        return w ? { ...seasonCell({ ...w.week, flags: w.flags, topLevel: w.topLevel }, ctx), preview: true } : c;
      });
      return { ...a, cells, warnings: rowWarnings(cells, ctx) };
    }),
  };
}
