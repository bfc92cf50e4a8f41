"use client";

import { clsx } from "clsx";
import Link from "next/link";
import type { ReactNode } from "react";
import {
  columnFilteringFeature,
  createFilteredRowModel,
  createSortedRowModel,
  FlexRender,
  rowSortingFeature,
  sortFn_alphanumeric,
  type Cell,
  type ReactTable,
  type Row,
  type RowData,
  type TableFeatures,
} from "@tanstack/react-table";
import { SortHeader } from "./sort-header";

// The head and body every sortable table of ours renders the same way (squad load, squad status, plan versus actual);
// each table keeps its own columns, toolbar and the classes that make it fit its screen.

type Sortable = TableFeatures & { rowSortingFeature: typeof rowSortingFeature };
type ByColumn<T> = (columnId: string) => T;

/** One header row of SortHeaders (aria-sort and the arrow); `after` adds words beside a column's label. */
export function SortableHead<F extends Sortable, D extends RowData>({
  table,
  className,
  headClass,
  testIdOf,
  titleOf,
  after,
}: {
  table: ReactTable<F, D>;
  className?: string;
  headClass: ByColumn<string | undefined>;
  testIdOf?: ByColumn<string | undefined>;
  titleOf?: ByColumn<string | undefined>;
  after?: ByColumn<ReactNode>;
}) {
  return (
    <thead className={className}>
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => {
            const { column } = header;
            const id = column.id;
            // Narrows the features union to the sorting one (every table here has it: `Sortable`).
            const sorts = "getIsSorted" in column;
            return (
              <SortHeader
                key={header.id}
                sorted={sorts ? column.getIsSorted() : false}
                onSort={sorts ? column.getToggleSortingHandler() : undefined}
                testId={testIdOf?.(id)}
                title={titleOf?.(id)}
                className={headClass(id)}
              >
                <FlexRender header={header} />
                {after?.(id)}
              </SortHeader>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}

/**
 * The table's rows, a cell per column `cellsOf` gives (all, or the visible ones); `wrap` puts a cell's content in
 * what the screen needs around it (a phone label).
 */
export function SortableRows<F extends Sortable, D extends RowData & { name: string }>({
  rows,
  cellsOf,
  className,
  rowClass,
  rowTestId,
  cellClass,
  wrap,
}: {
  rows: ReadonlyArray<Row<F, D>>;
  cellsOf: (row: Row<F, D>) => ReadonlyArray<Cell<F, D, unknown>>;
  className?: string;
  rowClass?: string;
  rowTestId: string;
  cellClass: ByColumn<string | undefined>;
  wrap?: (columnId: string, content: ReactNode) => ReactNode;
}) {
  return (
    <tbody className={className}>
      {rows.map((row) => (
        <tr key={row.id} data-testid={rowTestId} data-athlete={row.original.name} className={rowClass}>
          {cellsOf(row).map((cell) => {
            const content = <FlexRender cell={cell} />;
            return (
              <td key={cell.id} className={cellClass(cell.column.id)}>
                {wrap ? wrap(cell.column.id, content) : content}
              </td>
            );
          })}
        </tr>
      ))}
    </tbody>
  );
}

/** Sorting and filtering as our athlete tables use them; a fresh set per table (the row models keep state). */
export function sortAndFilterFeatures() {
  return {
    rowSortingFeature,
    columnFilteringFeature,
    filteredRowModel: createFilteredRowModel(),
    sortedRowModel: createSortedRowModel(),
    sortFns: { alphanumeric: sortFn_alphanumeric },
  };
}

/** An athlete's name linking to the screen of that table, with lines under it (group, missing logs). */
export function AthleteNameCell({
  href,
  name,
  testId,
  className,
  children,
}: {
  href: string;
  name: string;
  testId: string;
  className?: string;
  children?: ReactNode;
}) {
  return (
    <span className={clsx("flex flex-col", className)}>
      <Link
        href={href}
        className="font-medium text-ink-900 underline-offset-2 hover:text-lane-700 hover:underline"
        data-testid={testId}
      >
        {name}
      </Link>
      {children}
    </span>
  );
}
