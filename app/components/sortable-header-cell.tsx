// A column heading of the app's tables: click to sort, the direction said by an arrow and to screen
// readers (aria-sort and a hidden word), never by colour alone.
import type { ReactNode } from "react";

interface SortableColumn {
  getIsSorted(): false | "asc" | "desc";
  getCanSort(): boolean;
  getToggleSortingHandler(): ((event: unknown) => void) | undefined;
}

export function SortableHeaderCell({
  column,
  numeric,
  placeholder = false,
  children,
}: {
  column: SortableColumn;
  numeric: boolean;
  placeholder?: boolean;
  children: ReactNode;
}) {
  const sorted = column.getIsSorted();
  return (
    <th
      scope="col"
      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
      className={`px-2 py-2 align-bottom font-medium ${numeric ? "text-right" : ""}`}
    >
      {placeholder ? null : column.getCanSort() ? (
        <button
          type="button"
          onClick={column.getToggleSortingHandler()}
          className={`inline-flex items-end gap-1 text-left font-medium hover:text-ink ${numeric ? "text-right" : ""} ${sorted ? "text-ink" : ""}`}
        >
          {children}
          <span aria-hidden="true" className={`w-3 ${sorted ? "text-copper" : "text-ink-faint"}`}>
            {sorted === "asc" ? "↑" : sorted === "desc" ? "↓" : "↕"}
          </span>
          <span className="sr-only">{sorted ? `sorted ${sorted === "asc" ? "ascending" : "descending"}` : "sort"}</span>
        </button>
      ) : (
        children
      )}
    </th>
  );
}
