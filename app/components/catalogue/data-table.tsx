// A catalogue table (TanStack Table v9) whose rows arrive sorted and paged by the server: the table
// renders headers and cells, and a click on a sortable header asks the page for a new sort.
import { rowSortingFeature, tableFeatures, useTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import { SortableHeaderCell } from "~/components/sortable-header-cell";

export const catalogueFeatures = tableFeatures({ rowSortingFeature });
export type CatalogueFeatures = typeof catalogueFeatures;
export type CatalogueColumns<T extends Record<string, any>> = ColumnDef<CatalogueFeatures, T, any>[];

export interface SortChoice {
  sort: string;
  dir: "asc" | "desc";
}

export function DataTable<T extends { id: string } & Record<string, any>>({
  columns,
  data,
  sort,
  onSort,
  caption,
  numericColumns,
  pending,
}: {
  columns: CatalogueColumns<T>;
  data: T[];
  sort: SortChoice;
  onSort: (choice: SortChoice) => void;
  caption: string;
  numericColumns: ReadonlySet<string>;
  pending: boolean;
}) {
  const sorting: SortingState = [{ id: sort.sort, desc: sort.dir === "desc" }];
  const table = useTable({
    features: catalogueFeatures,
    columns,
    data,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      if (next[0]) onSort({ sort: next[0].id, dir: next[0].desc ? "desc" : "asc" });
    },
    manualSorting: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    getRowId: (row) => row.id,
  });

  // relative: the hidden (sr-only) sort words are absolutely positioned; without a positioned box here
  // they escape this scroll box and widen the whole page on a phone.
  return (
    <div className={`relative min-w-0 overflow-x-auto transition-opacity ${pending ? "opacity-60" : ""}`} aria-busy={pending}>
      <table className="figures w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b-2 border-ink/70 text-xs text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <SortableHeaderCell key={header.id} column={header.column} numeric={numericColumns.has(header.column.id)} placeholder={header.isPlaceholder}>
                  <table.FlexRender header={header} />
                </SortableHeaderCell>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-rule">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="hover:bg-paper/60">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className={`px-2 py-2 align-top ${numericColumns.has(cell.column.id) ? "text-right" : ""}`}>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {data.length === 0 ? <p className="px-2 py-6 text-center text-ink-soft">No parts match these filters.</p> : null}
    </div>
  );
}
