"use client";

import { clsx } from "clsx";
import type { ReactTable } from "@tanstack/react-table";
import { Button } from "@/components/ui/button";
import { ToolbarSelect } from "@/components/ui/toolbar-select";
import { toCsv } from "@/lib/format/csv";
import { FLAG_DISPLAY, LOAD_CAUTION } from "@/lib/load/flag-display";
import type { FlagKind } from "@/lib/load/flags";
import { COLUMN_LABELS, csvValue, type FlagFilter, type SquadRow, type squadFeatures } from "./squad-load-columns";

type Table = ReactTable<typeof squadFeatures, SquadRow>;

const FLAG_OPTIONS: [string, string][] = [
  ["", "Everyone"],
  ["any", "Any flag"],
  ...(Object.keys(FLAG_DISPLAY) as FlagKind[]).map((k): [string, string] => [k, FLAG_DISPLAY[k].label]),
];

/** CSV of the rows as shown (filtered, sorted) and the visible columns. */
function exportCsv(table: Table, week: string) {
  const columns = table.getVisibleLeafColumns().map((c) => c.id);
  const data = table.getRowModel().rows.map((r) => columns.map((id) => csvValue(r.original, id)));
  // The caution travels with the figures (flags are monitoring aids, not diagnoses).
  const csv = toCsv(
    columns.map((id) => COLUMN_LABELS[id] ?? id),
    data,
    { note: LOAD_CAUTION },
  );
  const url = URL.createObjectURL(new Blob([csv], { type: "text/csv;charset=utf-8" }));
  const a = document.createElement("a");
  a.href = url;
  a.download = `squad-load-${week}.csv`;
  a.click();
  URL.revokeObjectURL(url);
}

export function SquadToolbar({
  table,
  groups,
  week,
}: {
  table: Table;
  groups: { id: number; name: string }[];
  week: string;
}) {
  const group = table.getColumn("group");
  const flags = table.getColumn("flags");
  return (
    <div className="relative flex flex-wrap items-end gap-3">
      <ToolbarSelect
        label="Group"
        testId="filter-group"
        value={(group?.getFilterValue() as string | undefined) ?? ""}
        onChange={(v) => group?.setFilterValue(v || undefined)}
        options={[["", "All groups"], ...groups.map((g): [string, string] => [g.name, g.name])]}
      />
      <ToolbarSelect
        label="Flags"
        testId="filter-flag"
        value={(flags?.getFilterValue() as FlagFilter | undefined) ?? ""}
        onChange={(v) => flags?.setFilterValue((v || undefined) as FlagFilter | undefined)}
        options={FLAG_OPTIONS}
      />
      {/* Below sm the list spans the toolbar (it may sit at the right edge); from sm it hangs under its button. */}
      <details className="sm:relative">
        <summary
          className={clsx(
            "flex h-10 cursor-pointer list-none items-center rounded-lg px-3 text-sm",
            "font-medium text-ink-700 ring-1 ring-ink-200 ring-inset hover:bg-ink-50",
          )}
          data-testid="choose-columns"
        >
          Columns
        </summary>
        <div
          className={clsx(
            "absolute inset-x-0 z-10 mt-1 space-y-1 rounded-lg bg-paper-raised p-3 shadow-lift ring-1 ring-ink-100",
            "sm:right-auto sm:w-56",
          )}
        >
          {table
            .getAllLeafColumns()
            .filter((c) => c.getCanHide())
            .map((c) => (
              <label key={c.id} className="flex items-center gap-2 text-sm text-ink-700">
                <input
                  type="checkbox"
                  checked={c.getIsVisible()}
                  onChange={(e) => c.toggleVisibility(e.target.checked)}
                  className="accent-lane-600"
                />
                {COLUMN_LABELS[c.id] ?? c.id}
              </label>
            ))}
        </div>
      </details>
      <Button variant="secondary" onClick={() => exportCsv(table, week)} data-testid="export-csv">
        Export CSV
      </Button>
    </div>
  );
}
