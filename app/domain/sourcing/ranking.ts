// Ordering comparison rows by a money figure given as decimal text (compared as decimals, never as
// floats). Rows without the figure (no readings, no exchange rate) go last whichever the direction.
import Decimal from "decimal.js";
import type { MoneyText } from "./comparison-rows";

export function compareAmounts(a: MoneyText | null | undefined, b: MoneyText | null | undefined): number {
  if (!a && !b) return 0;
  if (!a) return 1;
  if (!b) return -1;
  return new Decimal(a.amount).comparedTo(b.amount);
}

/** A new array, cheapest first; ties keep their order. */
export function rankBy<T>(rows: readonly T[], pick: (row: T) => MoneyText | null | undefined): T[] {
  return rows
    .map((row, index) => ({ row, index }))
    .sort((x, y) => compareAmounts(pick(x.row), pick(y.row)) || x.index - y.index)
    .map((x) => x.row);
}
