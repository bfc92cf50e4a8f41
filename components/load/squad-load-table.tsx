"use client";

import { clsx } from "clsx";
import { useMemo, useState } from "react";
import useSWR from "swr";
import {
  useTable,
  type ColumnFiltersState,
  type SortingState,
  type ColumnVisibilityState,
} from "@tanstack/react-table";
import { LoadCaution } from "@/components/ui/caution";
import { fetchJson } from "@/lib/client/fetcher";
import { loadKeys } from "@/lib/client/keys";
import { Card, EmptyState } from "@/components/ui/card";
import { SortableHead, SortableRows } from "@/components/ui/sort-table";
import type { SquadWeekDto } from "@/lib/data/load-views";
import type { LoadView } from "@/lib/load/types";
import { METRIC_INFO } from "@/lib/load/types";
import { COLUMN_HINTS, NUMERIC_COLUMNS, squadColumns, squadFeatures, type SquadRow } from "./squad-load-columns";
import { Segmented } from "@/components/ui/segmented";
import { SquadToolbar } from "./squad-toolbar";
import { WeekNav } from "./week-nav";

const NO_ROWS: SquadRow[] = [];

export function SquadLoadTable({ teamId, initial }: { teamId: number; initial: SquadWeekDto }) {
  const [week, setWeek] = useState(initial.weekStart);
  const [view, setView] = useState<LoadView>(initial.view);
  const key = loadKeys.squadWeek(teamId, week, view);
  const initialKey = loadKeys.squadWeek(teamId, initial.weekStart, initial.view);
  const { data, error, isLoading } = useSWR<SquadWeekDto>(key, fetchJson, {
    fallbackData: key === initialKey ? initial : undefined,
    keepPreviousData: true,
  });
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [columnVisibility, setColumnVisibility] = useState<ColumnVisibilityState>({});

  const rows = useMemo<SquadRow[]>(
    () =>
      data
        ? data.rows.map((r) => ({
            ...r,
            acwrMetric: data.settings.acwrMetric,
            estimated: data.settings.missingLogs === "estimate",
          }))
        : NO_ROWS,
    [data],
  );
  const table = useTable({
    features: squadFeatures,
    columns: squadColumns,
    data: rows,
    state: { sorting, columnFilters, columnVisibility },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onColumnVisibilityChange: setColumnVisibility,
    getRowId: (r) => String(r.id),
  });
  const metric = data ? METRIC_INFO[data.settings.acwrMetric].short : "sRPE";
  const visible = table.getRowModel().rows;

  return (
    <div className="space-y-4">
      <div className="flex flex-col gap-3 lg:flex-row lg:items-center lg:justify-between">
        <WeekNav
          week={week}
          today={data?.today ?? initial.today}
          weekStartDay={initial.weekStartDay}
          onChange={setWeek}
        />
        <Segmented
          label="Which sessions count"
          value={view}
          onChange={setView}
          options={[
            ["projected", "Logged + plan"],
            ["actual", "Logged only"],
          ]}
        />
      </div>
      <SquadToolbar table={table} groups={data?.groups ?? []} week={week} />
      {error ? (
        <p className="rounded-lg bg-flag-spike-soft px-3 py-2 text-sm text-flag-spike">
          Could not load the week: {(error as Error).message}
        </p>
      ) : null}
      <Card className={clsx("overflow-x-auto transition-opacity [contain:inline-size]", isLoading && "opacity-60")}>
        <table className="w-full min-w-[56rem] text-sm" data-testid="squad-load-table">
          <SortableHead
            table={table}
            className="border-b border-ink-100 text-xs text-ink-500"
            headClass={(id) =>
              clsx(
                "px-3 py-2.5",
                NUMERIC_COLUMNS.has(id) ? "text-right" : "text-left",
                id === "name" && "sticky left-0 bg-paper-raised",
              )
            }
            testIdOf={(id) => `sort-${id}`}
            titleOf={(id) => COLUMN_HINTS[id]}
            after={(id) =>
              id === "ratio" || id === "change" ? <span className="font-normal text-ink-400">({metric})</span> : null
            }
          />
          <SortableRows
            rows={visible}
            cellsOf={(row) => row.getVisibleCells()}
            className="divide-y divide-ink-50"
            rowClass="hover:bg-paper/60"
            rowTestId="squad-load-row"
            cellClass={(id) =>
              clsx(
                "px-3 py-2.5 align-middle",
                NUMERIC_COLUMNS.has(id) && "text-right",
                id === "name" && "sticky left-0 bg-paper-raised",
              )
            }
          />
        </table>
        {data && visible.length === 0 ? (
          <div className="p-4">
            <EmptyState title={rows.length === 0 ? "No athletes yet" : "No athlete matches these filters"} />
          </div>
        ) : null}
      </Card>
      <p className="text-xs text-ink-500">
        Metres and steps are estimates from each athlete&apos;s tested max velocity and step length. * marks a ratio
        with under 28 days of history behind it. Ratios use{" "}
        {data?.settings.acwrMethod === "ewma" ? "EWMA (7 and 28 days)" : "rolling 7- and 28-day averages"}.
      </p>
      <LoadCaution />
    </div>
  );
}
