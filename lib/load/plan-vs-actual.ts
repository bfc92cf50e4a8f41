// Plan versus actual (lib/load/README.md §13): what the plan prescribed against what the logs say was done, per
// athlete and week, from the ledger's two log-independent value sets: `planned` (the plan alone) and `today`
// (logs only; a log's completion and per-block reps already scale it, §4). Pure: ledger rows and sessions in.
import { dateFromDayIndex, dayIndex } from "@/lib/dates/plain-date";
import { LEDGER_LOGGED, type LedgerDayValues } from "./ledger";
import { metricRecord } from "./metric-record";
import { METRICS, type LogInput, type Metric, type MetricValues, type SessionInput } from "./types";

/** The metrics the plan-versus-actual screens compare, in the order they show them. */
export const PLAN_ACTUAL_METRICS: readonly Metric[] = ["hsrM", "nearMaxM", "contacts", "srpe"];

interface SessionCounts {
  /** Sessions of the week that count in the plan (drafts in, cancelled out: the ledger's planned set). */
  planned: number;
  /** Of those, the ones already due: before today, or today and logged. */
  due: number;
  /** Due sessions logged as done in full, in part, or not done. */
  full: number;
  partly: number;
  skipped: number;
  /** Due sessions without a log. */
  unlogged: number;
}

export interface PlanActualFigures {
  /** The whole week's plan. */
  prescribed: MetricValues;
  /** The plan of the days already due (before today, or today once it holds a log): what `done` is set against. */
  prescribedToDate: MetricValues;
  /** Logged work (logs only; a missing log counts nothing here, whatever the team's missing-log rule). */
  done: MetricValues;
  /** done − prescribedToDate: below 0 the athlete did less than planned so far, above 0 more. */
  difference: MetricValues;
  /** difference ÷ prescribedToDate × 100; null when nothing was prescribed to date. */
  differencePct: Record<Metric, number | null>;
  sessions: SessionCounts;
  /** Due sessions logged as done in full or in part, as a % of due sessions; null when none was due. */
  completionPct: number | null;
}

export interface PlanActualWeek extends PlanActualFigures {
  weekStart: string;
  weekEnd: string;
}

export interface PlanActualInput {
  /** The athlete's ledger rows covering the weeks (any other rows are ignored; a day without a row holds nothing). */
  rows: readonly Pick<LedgerDayValues, "day" | "flags" | "planned" | "today">[];
  /** The athlete's sessions of the weeks (others are ignored) and their logs. */
  sessions: readonly Pick<SessionInput, "id" | "date" | "status">[];
  logs: readonly Pick<LogInput, "sessionId" | "completion">[];
  /** First day of each week asked for. */
  weekStarts: readonly string[];
  todayDay: number;
}

const zeroValues = (): MetricValues => metricRecord(() => 0);

function emptyCounts(): SessionCounts {
  return { planned: 0, due: 0, full: 0, partly: 0, skipped: 0, unlogged: 0 };
}

/** The figures that follow from the three sums and the counts (differences, percentages). */
function finishFigures(
  sums: Pick<PlanActualFigures, "prescribed" | "prescribedToDate" | "done">,
  sessions: SessionCounts,
): PlanActualFigures {
  const difference = metricRecord((m) => sums.done[m] - sums.prescribedToDate[m]);
  return {
    ...sums,
    difference,
    differencePct: metricRecord((m) =>
      sums.prescribedToDate[m] > 0 ? (difference[m] / sums.prescribedToDate[m]) * 100 : null,
    ),
    sessions,
    completionPct: sessions.due > 0 ? ((sessions.full + sessions.partly) / sessions.due) * 100 : null,
  };
}

/** One athlete's plan versus actual for each week asked for, in the order asked. */
export function planVersusActual(input: PlanActualInput): PlanActualWeek[] {
  const { todayDay } = input;
  const loggedDays = new Set<number>();
  for (const r of input.rows) if ((r.flags & LEDGER_LOGGED) !== 0) loggedDays.add(r.day);
  const isDue = (day: number) => day < todayDay || (day === todayDay && loggedDays.has(day));
  const completion = new Map(input.logs.map((l) => [l.sessionId, l.completion]));
  return input.weekStarts.map((weekStart) => {
    const ws = dayIndex(weekStart);
    const prescribed = zeroValues();
    const prescribedToDate = zeroValues();
    const done = zeroValues();
    for (const r of input.rows) {
      if (r.day < ws || r.day > ws + 6) continue;
      const due = isDue(r.day);
      METRICS.forEach((m, k) => {
        prescribed[m] += r.planned[k];
        if (due) prescribedToDate[m] += r.planned[k];
        done[m] += r.today[k];
      });
    }
    const counts = emptyCounts();
    for (const s of input.sessions) {
      const day = dayIndex(s.date);
      if (day < ws || day > ws + 6 || s.status === "cancelled") continue;
      counts.planned++;
      if (!isDue(day)) continue;
      counts.due++;
      const c = completion.get(s.id);
      if (c === "yes") counts.full++;
      else if (c === "partly") counts.partly++;
      else if (c === "no") counts.skipped++;
      else counts.unlogged++;
    }
    return {
      weekStart,
      weekEnd: dateFromDayIndex(ws + 6),
      ...finishFigures({ prescribed, prescribedToDate, done }, counts),
    };
  });
}

/** Several athletes' figures of one week added up (the squad's line): sums first, then the percentages. */
export function sumPlanActual(list: readonly PlanActualFigures[]): PlanActualFigures {
  const add = (pick: (f: PlanActualFigures) => MetricValues) =>
    metricRecord((m) => list.reduce((s, f) => s + pick(f)[m], 0));
  const counts = emptyCounts();
  for (const f of list) for (const k of Object.keys(counts) as (keyof SessionCounts)[]) counts[k] += f.sessions[k];
  return finishFigures(
    {
      prescribed: add((f) => f.prescribed),
      prescribedToDate: add((f) => f.prescribedToDate),
      done: add((f) => f.done),
    },
    counts,
  );
}
