"use client";

import { clsx } from "clsx";
import { useState } from "react";
import { useTable, type ColumnFiltersState, type SortingState } from "@tanstack/react-table";
import { Card, EmptyState } from "@/components/ui/card";
import { Input, Select } from "@/components/ui/field";
import { LoadCaution } from "@/components/ui/caution";
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
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
          Availability
          <Select
            className="w-44"
            value={(level?.getFilterValue() as string | undefined) ?? ""}
            onChange={(e) => level?.setFilterValue((e.target.value || undefined) as AvailabilityLevel | undefined)}
            data-testid="status-filter-level"
          >
            <option value="">Everyone</option>
            {AVAILABILITY_LEVELS.map((l) => (
              <option key={l} value={l}>
                {AVAILABILITY_LABEL[l]}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-600">
          Sort by
          <Select
            className="w-52"
            value={sortKey}
            onChange={(e) => {
              const s = SORTS.find(([id]) => id === e.target.value);
              setSorting(s ? [{ id: s[0], desc: s[2] }] : []);
            }}
            data-testid="status-sort"
          >
            {SORTS.map(([id, label]) => (
              <option key={id} value={id}>
                {label}
              </option>
            ))}
          </Select>
        </label>
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
          <thead className="border-b border-ink-100 text-left text-xs text-ink-500 max-md:sr-only">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                      className="px-3 py-2.5 font-medium"
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={clsx("inline-flex items-center gap-1 hover:text-ink-900", sorted && "text-ink-900")}
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden className="w-3">
                          {sorted === "asc" ? "↑" : sorted === "desc" ? "↓" : ""}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-ink-100 max-md:block">
            {visible.map((row) => (
              <tr
                key={row.id}
                data-testid="status-row"
                data-athlete={row.original.name}
                className="max-md:block max-md:p-3"
              >
                {row.getAllCells().map((cell) => (
                  <td
                    key={cell.id}
                    className="px-3 py-2.5 align-top max-md:flex max-md:justify-between max-md:gap-4 max-md:px-0 max-md:py-1"
                  >
                    {cell.column.id === "name" ? null : (
                      <span className="shrink-0 text-xs text-ink-500 md:hidden" aria-hidden>
                        {STATUS_COLUMN_LABELS[cell.column.id]}
                      </span>
                    )}
                    <span className="min-w-0 max-md:text-right">
                      <table.FlexRender cell={cell} />
                    </span>
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
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
