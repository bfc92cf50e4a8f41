"use client";

import { clsx } from "clsx";
import { useMemo, useState } from "react";
import { useTable, type SortingState } from "@tanstack/react-table";
import { Card, EmptyState } from "@/components/ui/card";
import { SortableHead, SortableRows } from "@/components/ui/sort-table";
import type { PlanActualDto } from "@/lib/data/plan-vs-actual";
import { formatNumber } from "@/lib/format/number";
import type { Metric } from "@/lib/load/types";
import {
  DifferenceText,
  NUMERIC,
  CompletionText,
  PHONE_HIDDEN,
  planActualColumns,
  planActualFeatures,
  type PlanActualRow,
} from "./plan-actual-columns";

/** The chosen week, one row per athlete and the squad's line, for one metric. */
export function PlanActualTable({ data, metric, unit }: { data: PlanActualDto; metric: Metric; unit: string }) {
  const last = data.weeks.length - 1;
  const rows = useMemo<PlanActualRow[]>(
    () => data.athletes.map((a) => ({ ...a.weeks[last], id: a.id, name: a.name, metric })),
    [data, last, metric],
  );
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useTable({
    features: planActualFeatures,
    columns: planActualColumns,
    data: rows,
    state: { sorting },
    onSortingChange: setSorting,
    getRowId: (r) => String(r.id),
  });
  const squad = data.squad[last];
  if (rows.length === 0) return <EmptyState title="No athletes yet" />;
  return (
    <Card className="overflow-x-auto [contain:inline-size]">
      <table className="w-full text-sm" data-testid="plan-actual-table">
        <caption className="sr-only">
          Prescribed against done per athlete, {unit}, week of {data.weekStart}
        </caption>
        <SortableHead
          table={table}
          className="border-b border-ink-100 text-xs text-ink-500"
          headClass={(id) =>
            clsx(
              "px-2 py-2 sm:px-3",
              NUMERIC.has(id) ? "text-right" : "text-left",
              PHONE_HIDDEN.has(id) && "hidden sm:table-cell",
            )
          }
        />
        <SortableRows
          rows={table.getRowModel().rows}
          cellsOf={(row) => row.getAllCells()}
          className="divide-y divide-ink-50"
          rowTestId="plan-actual-row"
          cellClass={(id) =>
            clsx(
              "px-2 py-2 align-middle sm:px-3",
              NUMERIC.has(id) && "text-right",
              PHONE_HIDDEN.has(id) && "hidden sm:table-cell",
            )
          }
        />
        <tfoot className="border-t-2 border-ink-100 font-semibold" data-testid="plan-actual-squad">
          <tr>
            <th scope="row" className="px-2 py-2 text-left sm:px-3">
              Squad
            </th>
            <td className="hidden px-2 py-2 text-right text-ink-500 tabular-nums sm:table-cell sm:px-3">
              {formatNumber(squad.prescribed[metric], 0)}
            </td>
            <td className="px-2 py-2 text-right tabular-nums sm:px-3">
              {formatNumber(squad.prescribedToDate[metric], 0)}
            </td>
            <td className="px-2 py-2 text-right tabular-nums sm:px-3">{formatNumber(squad.done[metric], 0)}</td>
            <td className="px-2 py-2 text-right sm:px-3">
              <DifferenceText f={squad} m={metric} />
            </td>
            <td className="px-2 py-2 text-right tabular-nums sm:px-3">
              <CompletionText f={squad} />
            </td>
          </tr>
        </tfoot>
      </table>
    </Card>
  );
}
