import { clsx } from "clsx";
import type { ReactNode, ThHTMLAttributes } from "react";

type Sorted = false | "asc" | "desc";

/** A column header that sorts its table: aria-sort on the cell, the arrow beside the label. */
export function SortHeader({
  sorted,
  onSort,
  testId,
  className,
  children,
  ...th
}: Omit<ThHTMLAttributes<HTMLTableCellElement>, "children"> & {
  sorted: Sorted;
  onSort: ((event: unknown) => void) | undefined;
  testId?: string;
  children: ReactNode;
}) {
  return (
    <th
      scope="col"
      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
      className={clsx("font-medium", className)}
      {...th}
    >
      <button
        type="button"
        onClick={onSort}
        className={clsx("inline-flex items-center gap-1 hover:text-ink-900", sorted && "text-ink-900")}
        data-testid={testId}
      >
        {children}
        {/* No placeholder while unsorted: on a phone every column's width counts. */}
        {sorted ? (
          <span aria-hidden className="text-ink-400">
            {sorted === "asc" ? "↑" : "↓"}
          </span>
        ) : null}
      </button>
    </th>
  );
}
