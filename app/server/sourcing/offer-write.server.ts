// Writing offers: the row and its price breaks together, inside the caller's transaction (or a new
// one), so a failure leaves nothing half-saved.
import { sql } from "kysely";
import type { Executor } from "./executor.server";
import type { PriceBreakText } from "./offers.server";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";
import type { OfferForm } from "~/lib/sourcing-forms";

export interface OfferValues {
  supplierId: string;
  partKind: OfferPartKind;
  partId: string;
  sku: string;
  currency: string;
  unitPrice: string;
  priceBreaks: PriceBreakText[];
  minimumOrder: number;
  shippingPerUnit: string;
  shippingPerOrder: string;
  leadTimeDays: number | null;
  stock: number | null;
  validUntil: string | null;
  notes: string;
}

/** Blank currency, shipping and lead time take the supplier's defaults. */
export function offerValuesFromForm(
  form: OfferForm,
  supplier: { id: string; currency: string; default_shipping_per_unit: string; default_shipping_per_order: string; default_lead_time_days: number | null },
): OfferValues {
  return {
    supplierId: supplier.id,
    partKind: form.partKind,
    partId: form.partId,
    sku: form.sku ?? "",
    currency: form.currency ?? supplier.currency,
    unitPrice: form.unitPrice,
    priceBreaks: [...(form.priceBreaks ?? [])].sort((a, b) => a.minQuantity - b.minQuantity),
    minimumOrder: form.minimumOrder ?? 1,
    shippingPerUnit: form.shippingPerUnit ?? supplier.default_shipping_per_unit,
    shippingPerOrder: form.shippingPerOrder ?? supplier.default_shipping_per_order,
    leadTimeDays: form.leadTimeDays ?? supplier.default_lead_time_days,
    stock: form.stock ?? null,
    validUntil: form.validUntil ?? null,
    notes: form.notes ?? "",
  };
}

function columns(v: OfferValues) {
  return {
    supplier_id: v.supplierId,
    part_kind: v.partKind,
    part_id: v.partId,
    sku: v.sku,
    currency: v.currency,
    unit_price: v.unitPrice,
    minimum_order: v.minimumOrder,
    shipping_per_unit: v.shippingPerUnit,
    shipping_per_order: v.shippingPerOrder,
    lead_time_days: v.leadTimeDays,
    stock: v.stock,
    valid_until: v.validUntil,
    notes: v.notes,
  };
}

export async function inTransaction<T>(db: Executor, work: (trx: Executor) => Promise<T>): Promise<T> {
  return db.isTransaction ? work(db) : db.transaction().execute(work);
}

async function replaceBreaks(trx: Executor, offerId: string, breaks: readonly PriceBreakText[]) {
  await trx.deleteFrom("offer_price_break").where("offer_id", "=", offerId).execute();
  if (breaks.length) {
    await trx
      .insertInto("offer_price_break")
      .values(breaks.map((b) => ({ offer_id: offerId, min_quantity: b.minQuantity, unit_price: b.unitPrice })))
      .execute();
  }
}

export function isDuplicateOffer(error: unknown) {
  return (error as { code?: string })?.code === "23505" && (error as { constraint?: string }).constraint === "offer_supplier_part_key";
}

export async function createOffer(db: Executor, teamId: string, userId: string | null, values: OfferValues) {
  return inTransaction(db, async (trx) => {
    const row = await trx
      .insertInto("offer")
      .values({ ...columns(values), team_id: teamId, created_by: userId })
      .returning("id")
      .executeTakeFirstOrThrow();
    await replaceBreaks(trx, row.id, values.priceBreaks);
    return row.id;
  });
}

export async function updateOffer(db: Executor, teamId: string, offerId: string, values: OfferValues) {
  return inTransaction(db, async (trx) => {
    const result = await trx
      .updateTable("offer")
      .set({ ...columns(values), updated_at: new Date() })
      .where("team_id", "=", teamId)
      .where("id", "=", offerId)
      .executeTakeFirst();
    if (Number(result.numUpdatedRows) === 0) return false;
    await replaceBreaks(trx, offerId, values.priceBreaks);
    return true;
  });
}

/** Adds the offer, or replaces the terms of the supplier's existing offer for the same part. */
export async function upsertOffer(db: Executor, teamId: string, userId: string | null, values: OfferValues) {
  const cols = columns(values);
  const row = await db
    .insertInto("offer")
    .values({ ...cols, team_id: teamId, created_by: userId })
    .onConflict((oc) => oc.columns(["supplier_id", "part_kind", "part_id"]).doUpdateSet({ ...cols, updated_at: new Date() }))
    // xmax = 0 only on a freshly inserted row (a PostgreSQL idiom for telling insert from update).
    .returning(["id", sql<boolean>`(xmax = 0)`.as("inserted")])
    .executeTakeFirstOrThrow();
  await replaceBreaks(db, row.id, values.priceBreaks);
  return { id: row.id, created: row.inserted };
}
