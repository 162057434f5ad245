// The team's offers as CSV, in the import's columns (money exactly as stored), expired ones included.
import type { Executor } from "./executor.server";
import { listOffers } from "./offers.server";
import { offersToCsv } from "~/lib/sourcing-csv";

export async function exportOffersCsv(db: Executor, teamId: string) {
  const offers = await listOffers(db, teamId);
  return offersToCsv(
    offers.map((o) => ({
      supplierName: o.supplierName,
      partKind: o.partKind,
      maker: o.maker,
      model: o.model,
      sku: o.sku,
      currency: o.terms.currency,
      unitPrice: o.text.unitPrice,
      priceBreaks: o.text.priceBreaks,
      minimumOrder: o.terms.minimumOrder,
      shippingPerUnit: o.text.shippingPerUnit,
      shippingPerOrder: o.text.shippingPerOrder,
      leadTimeDays: o.leadTimeDays,
      stock: o.stock,
      validUntil: o.validUntil,
      notes: o.notes,
    })),
  );
}
