// An offer's landed cost at the quantities where its price changes: goods and shipping in the
// offer's currency, and the total in the team's quoting currency with the rate used.
import { formatAmount, MissingRate, RateNote } from "./money-figure";
import type { MoneyText, RateText } from "~/domain/sourcing/comparison-rows";

export interface LandedPreviewRow {
  quantity: number;
  bought: number;
  unitPrice: MoneyText;
  goods: MoneyText;
  shipping: MoneyText;
  total: MoneyText;
  totalQuoting: MoneyText | null;
  rate: RateText | null;
  missingRate: { from: string; to: string } | null;
}

export function LandedPreview({ rows, quotingCurrency, asOf }: { rows: LandedPreviewRow[]; quotingCurrency: string; asOf: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full text-left text-sm" data-testid="landed-preview">
        <thead className="border-b border-rule text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th className="px-2 py-1 font-medium">Needed</th>
            <th className="px-2 py-1 text-right font-medium">Bought</th>
            <th className="px-2 py-1 text-right font-medium">Unit price</th>
            <th className="px-2 py-1 text-right font-medium">Goods</th>
            <th className="px-2 py-1 text-right font-medium">Shipping</th>
            <th className="px-2 py-1 text-right font-medium">Landed</th>
            <th className="px-2 py-1 text-right font-medium">In {quotingCurrency}</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {rows.map((r) => (
            <tr key={r.quantity}>
              <td className="px-2 py-1">{r.quantity}</td>
              <td className="px-2 py-1 text-right">{r.bought}</td>
              <td className="px-2 py-1 text-right">{formatAmount(r.unitPrice)}</td>
              <td className="px-2 py-1 text-right">{formatAmount(r.goods)}</td>
              <td className="px-2 py-1 text-right">{formatAmount(r.shipping)}</td>
              <td className="px-2 py-1 text-right font-medium">{formatAmount(r.total)}</td>
              <td className="px-2 py-1 text-right">
                {r.totalQuoting ? formatAmount(r.totalQuoting) : <MissingRate message={`No ${r.missingRate?.from} → ${r.missingRate?.to} rate`} />}
                <RateNote rate={r.rate} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-2 text-xs text-ink-faint">
        Each line rounded once to the currency's smallest unit; a need below the minimum order is raised to it. Rates as on {asOf}.
      </p>
    </div>
  );
}
