// A comparison table (TanStack Table v9) sorted in the browser: every row is loaded, so a click on a
// header re-sorts at once. The chosen sort is kept in the page's URL by the caller. Money columns
// sort as decimals; rows missing a figure (no readings, no rate) stay last in either direction.
import {
  createSortedRowModel,
  rowSortingFeature,
  sortFn_basic,
  sortFn_text,
  tableFeatures,
  useTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { compareAmounts } from "~/domain/sourcing/ranking";
import type { MoneyText } from "~/domain/sourcing/comparison-rows";
import { SortableHeaderCell } from "~/components/sortable-header-cell";

export const compareFeatures = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: {
    text: sortFn_text,
    basic: sortFn_basic,
    money: (a, b, id) => compareAmounts(a.getValue<MoneyText>(id), b.getValue<MoneyText>(id)),
  },
});
export type CompareFeatures = typeof compareFeatures;
export type CompareColumns<T extends Record<string, any>> = ColumnDef<CompareFeatures, T, any>[];

export interface SortChoice {
  id: string;
  desc: boolean;
}

export function CompareTable<T extends { offerId: string } & Record<string, any>>({
  columns,
  data,
  sort,
  onSort,
  caption,
  numericColumns,
}: {
  columns: CompareColumns<T>;
  data: T[];
  sort: SortChoice;
  onSort: (choice: SortChoice) => void;
  caption: string;
  numericColumns: ReadonlySet<string>;
}) {
  const sorting: SortingState = [{ id: sort.id, desc: sort.desc }];
  const table = useTable({
    features: compareFeatures,
    columns,
    data,
    state: { sorting },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      if (next[0]) onSort({ id: next[0].id, desc: next[0].desc });
    },
    enableSortingRemoval: false,
    enableMultiSort: false,
    // Cheapest first on the first click, for money and figures alike.
    sortDescFirst: false,
    getRowId: (row) => row.offerId,
  });
  // relative: keeps the absolutely positioned hidden (sr-only) words inside this scroll box.
  return (
    <div className="relative min-w-0 overflow-x-auto">
      <table className="figures w-full text-left text-sm" data-testid="compare-table">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b-2 border-ink/70 text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <SortableHeaderCell key={header.id} column={header.column} numeric={numericColumns.has(header.column.id)}>
                  <table.FlexRender header={header} />
                </SortableHeaderCell>
              ))}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-rule">
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              className="hover:bg-paper/60"
              data-offer-id={row.original.offerId}
              data-model={`${row.original.maker} ${row.original.model}`}
              data-supplier={row.original.supplierName}
            >
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className={`px-2 py-2 align-top ${numericColumns.has(cell.column.id) ? "text-right" : ""}`}>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {data.length === 0 ? <p className="px-2 py-6 text-center text-ink-soft">No valid offers of this kind yet. Add offers or import a price list.</p> : null}
    </div>
  );
}
