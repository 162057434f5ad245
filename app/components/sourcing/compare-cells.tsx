// Cells every comparison shares: which offer, its unit price and landed cost (quoting currency, with
// the original amount and the rate when converted), and delivery.
import { createColumnHelper } from "@tanstack/react-table";
import { Link } from "react-router";
import type { CompareFeatures } from "./compare-table";
import { MissingRate, MoneyFigure, RateNote } from "./money-figure";
import type { MoneyText, OfferCostRow } from "~/domain/sourcing/comparison-rows";

export function num(value: number | null | undefined, decimals = 0) {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return value.toLocaleString("en-GB", { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

export function Unit({ value, unit, decimals = 0 }: { value: number | null | undefined; unit: string; decimals?: number }) {
  if (value === null || value === undefined) return <span className="text-xs text-ink-faint">—</span>;
  return (
    <span className="whitespace-nowrap">
      {num(value, decimals)} <span className="text-ink-soft">{unit}</span>
    </span>
  );
}

/** A money accessor for sorting: null becomes undefined so that TanStack's sortUndefined applies. */
export function moneyValue(m: MoneyText | null): MoneyText | undefined {
  return m ?? undefined;
}

export function sharedColumns<T extends OfferCostRow>() {
  const h = createColumnHelper<CompareFeatures, T>();
  const offer = h.accessor((r) => `${r.maker} ${r.model} ${r.supplierName}`, {
    id: "offer",
    header: "Offer",
    sortFn: "text",
    cell: (info) => {
      const r = info.row.original;
      return (
        <span className="block min-w-44">
          <Link to={`/sourcing/offers/${r.offerId}`} className="font-medium text-ink underline decoration-rule hover:decoration-copper">
            {r.maker} {r.model}
          </Link>
          <span className="block text-xs text-ink-soft">
            {r.supplierName}
            {r.sku ? ` · ${r.sku}` : ""}
          </span>
        </span>
      );
    },
  });
  const unitPrice = h.accessor((r) => moneyValue(r.unitPrice), {
    id: "unitPrice",
    header: "Unit price",
    sortFn: "money",
    sortUndefined: "last",
    cell: (info) => {
      const r = info.row.original;
      return (
        <span className="block">
          {r.unitPrice ? <MoneyFigure value={r.unitPrice} original={r.offerUnitPrice} rate={r.rate} /> : <MoneyFigure value={r.offerUnitPrice} />}
          <RateNote rate={r.rate} />
        </span>
      );
    },
  });
  const landed = h.accessor((r) => moneyValue(r.landed), {
    id: "landed",
    header: "Landed",
    sortFn: "money",
    sortUndefined: "last",
    cell: (info) => {
      const r = info.row.original;
      return (
        <span className="block">
          {r.landed ? <MoneyFigure value={r.landed} original={r.offerLanded} rate={r.rate} testId="landed" /> : <MoneyFigure value={r.offerLanded} />}
          <span className="block text-xs text-ink-faint">
            for {r.quantityBought}
            {r.quantityBought > r.quantityNeeded ? ` (minimum order; ${r.quantityNeeded} needed)` : ""}
          </span>
          {r.missingRate ? <MissingRate message={r.missingRate} /> : null}
        </span>
      );
    },
  });
  const delivery = h.accessor((r) => r.leadTimeDays ?? undefined, {
    id: "leadTime",
    header: "Lead time",
    sortFn: "basic",
    sortUndefined: "last",
    cell: (info) => {
      const r = info.row.original;
      return (
        <span className="block whitespace-nowrap">
          <Unit value={r.leadTimeDays} unit="d" />
          <span className="block text-xs text-ink-faint">{r.stock === null ? "stock unknown" : `${r.stock} in stock`}</span>
          <span className="block text-xs text-ink-faint">{r.validUntil ? `until ${r.validUntil}` : "no end date"}</span>
        </span>
      );
    },
  });
  return { offer, unitPrice, landed, delivery };
}
