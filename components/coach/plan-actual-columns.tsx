"use client";

import { clsx } from "clsx";
import Link from "next/link";
import {
  createColumnHelper,
  createSortedRowModel,
  rowSortingFeature,
  sortFn_alphanumeric,
  tableFeatures,
} from "@tanstack/react-table";
import { formatNumber } from "@/lib/format/number";
import type { PlanActualFigures } from "@/lib/load/plan-vs-actual";
import type { Metric } from "@/lib/load/types";

export const planActualFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric },
});

/** One athlete's week with the metric the screen compares. */
export type PlanActualRow = PlanActualFigures & { id: number; name: string; metric: Metric };

/** More than this far from the plan (either way) is marked: our choice of a visible step, not a published line. */
const OFF_PLAN_PCT = 10;

export type OffPlan = "under" | "over" | null;

function offPlan(f: PlanActualFigures, m: Metric): OffPlan {
  const pct = f.differencePct[m];
  if (pct === null) return null;
  return pct < -OFF_PLAN_PCT ? "under" : pct > OFF_PLAN_PCT ? "over" : null;
}

const signed = (v: number) => `${v > 0 ? "+" : v < 0 ? "−" : ""}${formatNumber(Math.abs(v), 0)}`;

/** "+120 (+12 %)" with the under/over words for screen readers and phones alike. */
export function DifferenceText({ f, m }: { f: PlanActualFigures; m: Metric }) {
  const pct = f.differencePct[m];
  const off = offPlan(f, m);
  return (
    <span
      data-off-plan={off ?? "on"}
      className={clsx(
        "whitespace-nowrap tabular-nums",
        // Words, not a flag colour: being off the plan is not a load flag.
        off && "font-semibold text-ink-950",
      )}
    >
      {signed(f.difference[m])}
      {/* On a phone the percentage and the word go under the figure, so the table keeps to the screen's width. */}
      {pct === null ? null : <span className="block sm:ml-1 sm:inline">{`${signed(pct)} %`}</span>}
      {off ? <span className="block text-2xs font-medium uppercase sm:ml-1 sm:inline">{off}</span> : null}
    </span>
  );
}

export function CompletionText({ f }: { f: PlanActualFigures }) {
  const s = f.sessions;
  if (s.due === 0) return <span className="text-ink-500">{s.planned === 0 ? "–" : "none due yet"}</span>;
  return (
    <span className="whitespace-nowrap tabular-nums">
      {s.full + s.partly} of {s.due}
      <span className="block sm:ml-1 sm:inline">{formatNumber(f.completionPct ?? 0, 0)} %</span>
    </span>
  );
}

/** Columns a phone leaves out (the comparison itself is "due so far" against "done"). */
export const PHONE_HIDDEN = new Set(["prescribed"]);

const helper = createColumnHelper<typeof planActualFeatures, PlanActualRow>();

export const NUMERIC = new Set(["prescribed", "toDate", "done", "difference", "completion"]);

export const planActualColumns = helper.columns([
  helper.accessor("name", {
    header: "Athlete",
    sortFn: "alphanumeric",
    cell: (c) => (
      <Link href={`/load/${c.row.original.id}`} className="font-medium text-ink-900 underline-offset-2 hover:underline">
        {c.getValue()}
      </Link>
    ),
  }),
  helper.accessor((r) => r.prescribed[r.metric], {
    id: "prescribed",
    header: "Week plan",
    cell: (c) => <span className="text-ink-500 tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  }),
  helper.accessor((r) => r.prescribedToDate[r.metric], {
    id: "toDate",
    header: "Due so far",
    cell: (c) => <span className="tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  }),
  helper.accessor((r) => r.done[r.metric], {
    id: "done",
    header: "Done",
    cell: (c) => <span className="font-medium tabular-nums">{formatNumber(c.getValue(), 0)}</span>,
  }),
  helper.accessor((r) => r.differencePct[r.metric] ?? r.difference[r.metric], {
    id: "difference",
    header: "Difference",
    cell: (c) => <DifferenceText f={c.row.original} m={c.row.original.metric} />,
  }),
  helper.accessor((r) => r.completionPct ?? -1, {
    id: "completion",
    header: "Sessions",
    cell: (c) => <CompletionText f={c.row.original} />,
  }),
]);
