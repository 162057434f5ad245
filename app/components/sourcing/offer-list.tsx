// The team's offers in a plain table: part, supplier, price with its breaks, order terms and whether
// the price still holds. Expired offers stay listed, flagged.
import { Link } from "react-router";
import { ExpiryStatus } from "./expiry-status";
import { formatAmount } from "./money-figure";
import { KIND_CSV_WORD } from "~/lib/sourcing-csv";
import type { OfferJson } from "~/lib/sourcing-types";

export function OfferList({ offers, showSupplier = true }: { offers: OfferJson[]; showSupplier?: boolean }) {
  if (!offers.length) return <p className="text-ink-soft">No offers here yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="figures w-full text-left text-sm" data-testid="offer-list">
        <thead className="border-b-2 border-ink/70 text-xs uppercase tracking-wide text-ink-soft">
          <tr>
            <th scope="col" className="px-2 py-2 font-medium">
              Part
            </th>
            {showSupplier ? (
              <th scope="col" className="px-2 py-2 font-medium">
                Supplier
              </th>
            ) : null}
            <th scope="col" className="px-2 py-2 text-right font-medium">
              Unit price
            </th>
            <th scope="col" className="px-2 py-2 font-medium">
              Breaks
            </th>
            <th scope="col" className="px-2 py-2 text-right font-medium">
              Min. order
            </th>
            <th scope="col" className="px-2 py-2 text-right font-medium">
              Shipping
            </th>
            <th scope="col" className="px-2 py-2 text-right font-medium">
              Lead time
            </th>
            <th scope="col" className="px-2 py-2 text-right font-medium">
              Stock
            </th>
            <th scope="col" className="px-2 py-2 font-medium">
              Validity
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {offers.map((o) => (
            <tr key={o.id} className={o.expired ? "bg-warn-wash/40" : "hover:bg-paper/60"} data-offer-id={o.id}>
              <td className="px-2 py-2">
                <Link to={`/sourcing/offers/${o.id}`} className="whitespace-nowrap font-medium underline decoration-rule hover:decoration-copper">
                  {o.part.maker ? `${o.part.maker} ${o.part.model}` : "part no longer in the catalogue"}
                </Link>
                <span className="block text-xs text-ink-faint">
                  {KIND_CSV_WORD[o.part.kind]}
                  {o.sku ? ` · ${o.sku}` : ""}
                </span>
              </td>
              {showSupplier ? (
                <td className="px-2 py-2">
                  <Link to={`/sourcing/suppliers/${o.supplier.id}`} className="whitespace-nowrap underline decoration-rule hover:decoration-copper">
                    {o.supplier.name}
                  </Link>
                </td>
              ) : null}
              <td className="px-2 py-2 text-right whitespace-nowrap">{formatAmount({ amount: o.unitPrice, currency: o.currency })}</td>
              <td className="px-2 py-2 text-xs text-ink-soft">
                {o.priceBreaks.length
                  ? o.priceBreaks.map((b) => `from ${b.minQuantity}: ${formatAmount({ amount: b.unitPrice, currency: o.currency })}`).join(" · ")
                  : "—"}
              </td>
              <td className="px-2 py-2 text-right">{o.minimumOrder}</td>
              <td className="px-2 py-2 text-right text-xs whitespace-nowrap">
                {formatAmount({ amount: o.shippingPerUnit, currency: o.currency })} / unit
                <span className="block">+ {formatAmount({ amount: o.shippingPerOrder, currency: o.currency })} / order</span>
              </td>
              <td className="px-2 py-2 text-right whitespace-nowrap">{o.leadTimeDays === null ? "—" : `${o.leadTimeDays} d`}</td>
              <td className="px-2 py-2 text-right">{o.stock ?? "—"}</td>
              <td className="px-2 py-2">
                <ExpiryStatus validUntil={o.validUntil} expired={o.expired} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
