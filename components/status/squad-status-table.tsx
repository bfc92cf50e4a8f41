"use client";

import { useState } from "react";
import { useTable, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { Card, EmptyState } from "@/components/ui/card";
import { Input } from "@/components/ui/field";
import { LoadCaution } from "@/components/ui/caution";
import { SortableHead, SortableRows } from "@/components/ui/sort-table";
import { ToolbarSelect } from "@/components/ui/toolbar-select";
import { AVAILABILITY_LABEL, AVAILABILITY_LEVELS, type AvailabilityLevel } from "@/lib/availability/levels";
import type { SquadStatusRow } from "@/lib/data/squad-status";
import { STATUS_COLUMN_LABELS, statusColumns, statusFeatures, type AttentionFilter } from "./squad-status-columns";

const SORTS: Array<[string, string, boolean]> = [
  ["alerts", "Needs attention first", true],
  ["name", "Name", false],
  ["level", "Availability", true],
  ["ratio", "ACWR, highest first", true],
  ["note", "Latest log note", true],
  ["pain", "Latest pain report", true],
];

const LEVEL_OPTIONS: [string, string][] = [
  ["", "Everyone"],
  ...AVAILABILITY_LEVELS.map((l): [string, string] => [l, AVAILABILITY_LABEL[l]]),
];

/**
 * The physio's squad status: one row per athlete, sortable and filterable. On a phone each row is a card with its
 * labels; from md up it is a table with sortable headers.
 */
export function SquadStatusTable({ rows }: { rows: SquadStatusRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "alerts", desc: true }]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const table = useTable({
    features: statusFeatures,
    columns: statusColumns,
    data: rows,
    state: { sorting, columnFilters },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    getRowId: (r) => String(r.id),
  });
  const level = table.getColumn("level");
  const attention = table.getColumn("alerts");
  const name = table.getColumn("name");
  const visible = table.getRowModel().rows;
  const sortKey = sorting[0]?.id ?? "";
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3" data-testid="status-toolbar">
        <label className="flex w-full flex-col gap-1 text-xs font-medium text-ink-600 sm:w-48">
          Find an athlete
          <Input
            type="search"
            value={(name?.getFilterValue() as string | undefined) ?? ""}
            onChange={(e) => name?.setFilterValue(e.target.value || undefined)}
            data-testid="status-search"
          />
        </label>
        <ToolbarSelect
          label="Availability"
          testId="status-filter-level"
          value={(level?.getFilterValue() as string | undefined) ?? ""}
          onChange={(v) => level?.setFilterValue((v || undefined) as AvailabilityLevel | undefined)}
          options={LEVEL_OPTIONS}
        />
        <ToolbarSelect
          label="Sort by"
          testId="status-sort"
          className="w-52"
          value={sortKey}
          onChange={(v) => {
            const s = SORTS.find(([id]) => id === v);
            setSorting(s ? [{ id: s[0], desc: s[2] }] : []);
          }}
          options={SORTS.map(([id, words]): [string, string] => [id, words])}
        />
        <label className="flex h-10 items-center gap-2 text-sm text-ink-800">
          <input
            type="checkbox"
            className="h-4 w-4"
            checked={attention?.getFilterValue() === "attention"}
            onChange={(e) =>
              attention?.setFilterValue((e.target.checked ? "attention" : undefined) as AttentionFilter | undefined)
            }
            data-testid="status-filter-attention"
          />
          Only athletes with open alerts or plan conflicts
        </label>
      </div>
      <Card>
        <table className="w-full text-sm max-md:block" data-testid="squad-status-table">
          <SortableHead
            table={table}
            className="border-b border-ink-100 text-left text-xs text-ink-500 max-md:sr-only"
            headClass={() => "px-3 py-2.5 text-left"}
            testIdOf={(id) => `status-sort-${id}`}
          />
          <SortableRows
            rows={visible}
            cellsOf={(row) => row.getAllCells()}
            className="divide-y divide-ink-100 max-md:block"
            rowClass="max-md:block max-md:p-3"
            rowTestId="status-row"
            cellClass={() =>
              "px-3 py-2.5 align-top max-md:flex max-md:justify-between max-md:gap-4 max-md:px-0 max-md:py-1"
            }
            wrap={(id, content) => (
              <>
                {id === "name" ? null : (
                  <span className="shrink-0 text-xs text-ink-500 md:hidden" aria-hidden>
                    {STATUS_COLUMN_LABELS[id]}
                  </span>
                )}
                <span className="min-w-0 max-md:text-right">{content}</span>
              </>
            )}
          />
        </table>
        {visible.length === 0 ? (
          <div className="p-4">
            <EmptyState title={rows.length === 0 ? "No athletes yet" : "No athlete matches these filters"} />
          </div>
        ) : null}
      </Card>
      <LoadCaution />
    </div>
  );
}
