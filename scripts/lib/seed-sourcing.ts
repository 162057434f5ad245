// Demo sourcing (data/demo/sourcing.ts) for Tallowmere Power Works: the quoting currency, a team
// rate, suppliers and their offers. Idempotent: a supplier is matched on its name, an offer on its
// supplier and part, and nothing that already exists is changed. Parts are looked up by maker and
// model; a part missing from the catalogue is skipped with a note.
import type { Kysely } from "kysely";
import type { Database } from "../../app/server/db-schema";
import { DEMO_OFFERS, DEMO_QUOTING_CURRENCY, DEMO_RATES, DEMO_SOURCING_TEAM, DEMO_SUPPLIERS } from "../../data/demo/sourcing";

const TABLE = { modules: "pv_module", batteries: "battery", controllers: "charge_controller", inverters: "inverter" } as const;

function shiftDays(isoDay: string, days: number) {
  const date = new Date(`${isoDay}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export async function seedDemoSourcing(db: Kysely<Database>, log: (line: string) => void, options: { teamId?: string; today?: string } = {}) {
  const today = options.today ?? new Date().toISOString().slice(0, 10);
  const teamId = options.teamId ?? (await db.selectFrom("organization").select("id").where("slug", "=", DEMO_SOURCING_TEAM).executeTakeFirst())?.id;
  if (!teamId) return log(`sourcing: no team "${DEMO_SOURCING_TEAM}", skipped`);

  await db
    .insertInto("team_sourcing_settings")
    .values({ team_id: teamId, quoting_currency: DEMO_QUOTING_CURRENCY })
    .onConflict((oc) => oc.column("team_id").doNothing())
    .execute();
  for (const r of DEMO_RATES) {
    const any = await db
      .selectFrom("exchange_rate")
      .select("id")
      .where("team_id", "=", teamId)
      .where("from_currency", "=", r.from)
      .where("to_currency", "=", r.to)
      .executeTakeFirst();
    if (!any)
      await db
        .insertInto("exchange_rate")
        .values({ team_id: teamId, from_currency: r.from, to_currency: r.to, rate: r.rate, as_of: shiftDays(today, -r.daysAgo), created_by: null })
        .execute();
  }

  const supplierIds = new Map<string, string>();
  for (const s of DEMO_SUPPLIERS) {
    const existing = await db.selectFrom("supplier").select("id").where("team_id", "=", teamId).where("name", "=", s.name).executeTakeFirst();
    const id =
      existing?.id ??
      (
        await db
          .insertInto("supplier")
          .values({
            team_id: teamId,
            name: s.name,
            contact: s.contact,
            currency: s.currency,
            shipping_terms: s.shippingTerms,
            default_shipping_per_unit: s.defaultShippingPerUnit,
            default_shipping_per_order: s.defaultShippingPerOrder,
            default_lead_time_days: s.defaultLeadTimeDays,
            notes: s.notes,
            created_by: null,
          })
          .returning("id")
          .executeTakeFirstOrThrow()
      ).id;
    supplierIds.set(s.name, id);
  }

  let added = 0;
  for (const o of DEMO_OFFERS) {
    const supplier = DEMO_SUPPLIERS.find((s) => s.name === o.supplier)!;
    const part = await db
      .selectFrom(TABLE[o.kind] as "battery")
      .select("id")
      .where("maker", "=", o.maker)
      .where("model", "=", o.model)
      .where("merged_into", "is", null)
      .executeTakeFirst();
    if (!part) {
      log(`sourcing: ${o.maker} ${o.model} is not in the catalogue, offer skipped`);
      continue;
    }
    const supplierId = supplierIds.get(o.supplier)!;
    const existing = await db
      .selectFrom("offer")
      .select("id")
      .where("supplier_id", "=", supplierId)
      .where("part_kind", "=", o.kind)
      .where("part_id", "=", part.id)
      .executeTakeFirst();
    if (existing) continue;
    await db.transaction().execute(async (trx) => {
      const offer = await trx
        .insertInto("offer")
        .values({
          team_id: teamId,
          supplier_id: supplierId,
          part_kind: o.kind,
          part_id: part.id,
          sku: o.sku,
          currency: supplier.currency,
          unit_price: o.unitPrice,
          minimum_order: o.minimumOrder ?? 1,
          shipping_per_unit: o.shippingPerUnit ?? supplier.defaultShippingPerUnit,
          shipping_per_order: o.shippingPerOrder ?? supplier.defaultShippingPerOrder,
          lead_time_days: o.leadTimeDays ?? supplier.defaultLeadTimeDays,
          stock: o.stock ?? null,
          valid_until: o.validForDays === null ? null : shiftDays(today, o.validForDays),
          notes: o.notes ?? "",
          created_by: null,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      if (o.priceBreaks?.length) {
        await trx
          .insertInto("offer_price_break")
          .values(o.priceBreaks.map(([minQuantity, unitPrice]) => ({ offer_id: offer.id, min_quantity: minQuantity, unit_price: unitPrice })))
          .execute();
      }
    });
    added += 1;
  }
  if (added) log(`${added} demo offers`);
}
