// A team's offers, with their price breaks and the part's maker and model. Every query filters by
// the acting team in SQL. Money leaves PostgreSQL as text and becomes decimal.js in OfferFacts.
import Decimal from "decimal.js";
import { sql, type ExpressionBuilder } from "kysely";
import type { Database } from "../db-schema";
import type { Executor } from "./executor.server";
import { isUuid } from "../modules.server";
import { isExpired, todayIso } from "~/domain/sourcing/offer-validity";
import type { OfferFacts, OfferPartKind } from "~/domain/sourcing/offer-facts";

export interface PriceBreakText {
  minQuantity: number;
  unitPrice: string;
}

function offerQuery(db: Executor, teamId: string) {
  return db
    .selectFrom("offer")
    .innerJoin("supplier", (j) => j.onRef("supplier.id", "=", "offer.supplier_id").onRef("supplier.team_id", "=", "offer.team_id"))
    .leftJoin("pv_module", (j) => j.onRef("pv_module.id", "=", "offer.part_id").on("offer.part_kind", "=", "modules"))
    .leftJoin("battery", (j) => j.onRef("battery.id", "=", "offer.part_id").on("offer.part_kind", "=", "batteries"))
    .leftJoin("charge_controller", (j) => j.onRef("charge_controller.id", "=", "offer.part_id").on("offer.part_kind", "=", "controllers"))
    .leftJoin("inverter", (j) => j.onRef("inverter.id", "=", "offer.part_id").on("offer.part_kind", "=", "inverters"))
    .where("offer.team_id", "=", teamId)
    .select([
      "offer.id",
      "offer.supplier_id as supplierId",
      "supplier.name as supplierName",
      "offer.part_kind as partKind",
      "offer.part_id as partId",
      "offer.sku",
      "offer.currency",
      "offer.unit_price as unitPrice",
      "offer.minimum_order as minimumOrder",
      "offer.shipping_per_unit as shippingPerUnit",
      "offer.shipping_per_order as shippingPerOrder",
      "offer.lead_time_days as leadTimeDays",
      "offer.stock",
      "offer.notes",
      "offer.updated_at as updatedAt",
      sql<string | null>`offer.valid_until::text`.as("validUntil"),
      sql<string | null>`coalesce(pv_module.maker, battery.maker, charge_controller.maker, inverter.maker)`.as("maker"),
      sql<string | null>`coalesce(pv_module.model, battery.model, charge_controller.model, inverter.model)`.as("model"),
      // Break prices as text inside the JSON, so that they never become JSON numbers (floats).
      sql<
        PriceBreakText[]
      >`(select coalesce(json_agg(json_build_object('minQuantity', b.min_quantity, 'unitPrice', b.unit_price::text) order by b.min_quantity), '[]'::json)
        from offer_price_break b where b.offer_id = offer.id)`.as("priceBreaks"),
    ]);
}

type OfferRow = Awaited<ReturnType<ReturnType<typeof offerQuery>["executeTakeFirstOrThrow"]>>;

/** An offer as lists, pages and the API show it: the domain facts plus the part's name and status. */
export interface OfferListItem extends OfferFacts {
  maker: string | null;
  model: string | null;
  /** Exact decimal texts as stored, for forms, CSV and JSON. */
  text: { unitPrice: string; shippingPerUnit: string; shippingPerOrder: string; priceBreaks: PriceBreakText[] };
  expired: boolean;
  updatedAt: Date;
}

function toListItem(row: OfferRow, asOf: string): OfferListItem {
  return {
    id: row.id,
    supplierId: row.supplierId,
    supplierName: row.supplierName,
    partKind: row.partKind,
    partId: row.partId,
    sku: row.sku,
    terms: {
      currency: row.currency,
      unitPrice: new Decimal(row.unitPrice),
      breaks: row.priceBreaks.map((b) => ({ minQuantity: b.minQuantity, unitPrice: new Decimal(b.unitPrice) })),
      minimumOrder: row.minimumOrder,
      shippingPerUnit: new Decimal(row.shippingPerUnit),
      shippingPerOrder: new Decimal(row.shippingPerOrder),
    },
    leadTimeDays: row.leadTimeDays,
    stock: row.stock,
    validUntil: row.validUntil,
    notes: row.notes,
    maker: row.maker,
    model: row.model,
    text: { unitPrice: row.unitPrice, shippingPerUnit: row.shippingPerUnit, shippingPerOrder: row.shippingPerOrder, priceBreaks: row.priceBreaks },
    expired: isExpired(row.validUntil, asOf),
    updatedAt: row.updatedAt,
  };
}

function stillValid(asOf: string) {
  return (eb: ExpressionBuilder<Database, "offer">) => eb.or([eb("offer.valid_until", "is", null), eb("offer.valid_until", ">=", asOf)]);
}

export interface OfferFilter {
  partKind?: OfferPartKind;
  supplierId?: string;
  partIds?: readonly string[];
  /** The day expiry is judged on (ISO date); today by default. */
  asOf?: string;
  /** Leave out offers whose valid-until day is before asOf. */
  validOnly?: boolean;
}

/** The team's offers (expired ones included and flagged unless validOnly). */
export async function listOffers(db: Executor, teamId: string, filter: OfferFilter = {}): Promise<OfferListItem[]> {
  const asOf = filter.asOf ?? todayIso();
  let query = offerQuery(db, teamId);
  if (filter.partKind) query = query.where("offer.part_kind", "=", filter.partKind);
  if (filter.supplierId) {
    if (!isUuid(filter.supplierId)) return [];
    query = query.where("offer.supplier_id", "=", filter.supplierId);
  }
  if (filter.partIds) {
    const ids = filter.partIds.filter(isUuid);
    if (!ids.length) return [];
    query = query.where("offer.part_id", "in", ids);
  }
  if (filter.validOnly) query = query.where(stillValid(asOf));
  const rows = await query
    .orderBy(sql`array_position(array['modules', 'batteries', 'controllers', 'inverters'], offer.part_kind)`)
    .orderBy("maker")
    .orderBy("model")
    .orderBy(sql`lower(supplier.name)`)
    .execute();
  return rows.map((r) => toListItem(r, asOf));
}

/**
 * Offers a comparison (or a kit optimiser) may use: one part kind, not expired on `asOf`, optionally
 * only for some parts. Price each with costOffer(offer.terms, quantity, await loadTeamPricing(…)).
 */
export function listValidOffers(db: Executor, teamId: string, options: { partKind: OfferPartKind; partIds?: readonly string[]; asOf?: string }) {
  return listOffers(db, teamId, { ...options, validOnly: true });
}

/** How many of the team's offers of a kind are expired on `asOf` (the comparisons leave them out). */
export async function countExpiredOffers(db: Executor, teamId: string, partKind: OfferPartKind, asOf: string = todayIso()) {
  const row = await db
    .selectFrom("offer")
    .select((eb) => eb.fn.countAll<number>().as("count"))
    .where("team_id", "=", teamId)
    .where("part_kind", "=", partKind)
    .where("valid_until", "<", asOf)
    .executeTakeFirstOrThrow();
  return Number(row.count);
}

export async function findOffer(db: Executor, teamId: string, offerId: string, asOf: string = todayIso()) {
  if (!isUuid(offerId)) return undefined;
  const row = await offerQuery(db, teamId).where("offer.id", "=", offerId).executeTakeFirst();
  return row ? toListItem(row, asOf) : undefined;
}

export async function deleteOffer(db: Executor, teamId: string, offerId: string) {
  if (!isUuid(offerId)) return false;
  const result = await db.deleteFrom("offer").where("team_id", "=", teamId).where("id", "=", offerId).executeTakeFirst();
  return Number(result.numDeletedRows) > 0;
}
