// Shapes the sourcing pages receive from their loaders (plain JSON: money as exact decimal text).
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";

export interface OfferJson {
  id: string;
  supplier: { id: string; name: string };
  part: { kind: OfferPartKind; id: string; maker: string | null; model: string | null };
  sku: string;
  currency: string;
  unitPrice: string;
  priceBreaks: { minQuantity: number; unitPrice: string }[];
  minimumOrder: number;
  shippingPerUnit: string;
  shippingPerOrder: string;
  leadTimeDays: number | null;
  stock: number | null;
  validUntil: string | null;
  expired: boolean;
  notes: string;
  updatedAt: string;
}

/** What checking (or a refused import of) an offer CSV tells the installer. */
export interface OfferImportReport {
  rowCount: number;
  readyCount: number;
  fileErrors: string[];
  problems: { row: number; label: string; errors: { column: string; message: string }[] }[];
  newSuppliers: { name: string; currency: string }[];
  newOffers: number;
  updatedOffers: number;
  /** Expired rows that match an offer already stored (same supplier, part and valid-until day, as an
   * export writes them): not written, the stored offer stays as it is. */
  expiredKept: { row: number; label: string; validUntil: string }[];
  /** Not problems: things the team may want to fix after importing (a missing exchange rate). */
  warnings: string[];
}
