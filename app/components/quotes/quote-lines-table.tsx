// The lines as the customer reads them: what, how many, the unit price, any discount, tax rate and
// the line's amount. The team's costs and margins never appear here.
import Decimal from "decimal.js";
import { formatMoney, money } from "~/domain/money/money";

export interface ShownLine {
  position: number;
  description: string;
  quantity: string;
  unitPrice: string;
  discountPct: string;
  taxRatePct: string;
  lineNet: string;
}

export function QuoteLinesTable({ lines, currency }: { lines: ShownLine[]; currency: string }) {
  const m = (amount: string) => formatMoney(money(amount, currency));
  const anyDiscount = lines.some((l) => !new Decimal(l.discountPct).isZero());
  // On a phone the money columns need more than the width: the table scrolls in its own box.
  return (
    <div className="relative min-w-0 overflow-x-auto">
      <table className="w-full text-sm" data-testid="quote-lines">
        <thead>
          <tr className="border-b border-ink text-left">
            <th className="py-1.5 pr-2 font-semibold">#</th>
            <th className="py-1.5 pr-2 font-semibold">Description</th>
            <th className="py-1.5 pr-2 text-right font-semibold">Qty</th>
            <th className="py-1.5 pr-2 text-right font-semibold">Unit price</th>
            {anyDiscount ? <th className="py-1.5 pr-2 text-right font-semibold">Discount</th> : null}
            <th className="py-1.5 pr-2 text-right font-semibold">Tax</th>
            <th className="py-1.5 text-right font-semibold">Amount</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {lines.map((l) => (
            <tr key={l.position}>
              <td className="py-1.5 pr-2 tabular-nums">{l.position}</td>
              <td className="py-1.5 pr-2">{l.description}</td>
              <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">{new Decimal(l.quantity).toString()}</td>
              <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">{m(l.unitPrice)}</td>
              {anyDiscount ? (
                <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">
                  {new Decimal(l.discountPct).isZero() ? "—" : `${new Decimal(l.discountPct).toString()} %`}
                </td>
              ) : null}
              <td className="py-1.5 pr-2 text-right whitespace-nowrap tabular-nums">{new Decimal(l.taxRatePct).toString()} %</td>
              <td className="py-1.5 text-right whitespace-nowrap tabular-nums">{m(l.lineNet)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
