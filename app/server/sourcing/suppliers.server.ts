// A team's suppliers. Every query carries the acting team's id: another team's id finds nothing.
import { sql } from "kysely";
import type { Executor } from "./executor.server";
import { isUuid } from "../modules.server";
import type { SupplierForm } from "~/lib/sourcing-forms";
import { todayIso } from "~/domain/sourcing/offer-validity";

function columns(form: SupplierForm) {
  return {
    name: form.name,
    contact: form.contact ?? "",
    currency: form.currency,
    shipping_terms: form.shippingTerms ?? "",
    default_shipping_per_unit: form.defaultShippingPerUnit ?? "0",
    default_shipping_per_order: form.defaultShippingPerOrder ?? "0",
    default_lead_time_days: form.defaultLeadTimeDays ?? null,
    notes: form.notes ?? "",
  };
}

export async function listSuppliers(db: Executor, teamId: string, asOf: string = todayIso()) {
  return db
    .selectFrom("supplier")
    .leftJoin("offer", "offer.supplier_id", "supplier.id")
    .select([
      "supplier.id",
      "supplier.name",
      "supplier.currency",
      "supplier.contact",
      "supplier.shipping_terms",
      (eb) => eb.fn.count<number>("offer.id").as("offerCount"),
      sql<number>`count(offer.id) filter (where offer.valid_until < ${asOf}::date)`.as("expiredCount"),
    ])
    .where("supplier.team_id", "=", teamId)
    .groupBy("supplier.id")
    .orderBy(sql`lower(supplier.name)`)
    .execute();
}

export async function findSupplier(db: Executor, teamId: string, supplierId: string) {
  if (!isUuid(supplierId)) return undefined;
  return db.selectFrom("supplier").selectAll().where("team_id", "=", teamId).where("id", "=", supplierId).executeTakeFirst();
}

export async function findSupplierByName(db: Executor, teamId: string, name: string) {
  return db
    .selectFrom("supplier")
    .selectAll()
    .where("team_id", "=", teamId)
    .where(sql<string>`lower(name)`, "=", name.trim().toLowerCase())
    .executeTakeFirst();
}

export function isDuplicateName(error: unknown) {
  return (error as { code?: string; constraint?: string })?.code === "23505" && (error as { constraint?: string }).constraint === "supplier_team_name_key";
}

export async function createSupplier(db: Executor, teamId: string, userId: string | null, form: SupplierForm) {
  const row = await db
    .insertInto("supplier")
    .values({ ...columns(form), team_id: teamId, created_by: userId })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateSupplier(db: Executor, teamId: string, supplierId: string, form: SupplierForm) {
  const result = await db
    .updateTable("supplier")
    .set({ ...columns(form), updated_at: new Date() })
    .where("team_id", "=", teamId)
    .where("id", "=", supplierId)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) > 0;
}

/** Deletes the supplier and, through the foreign key, its offers. */
export async function deleteSupplier(db: Executor, teamId: string, supplierId: string) {
  if (!isUuid(supplierId)) return false;
  const result = await db.deleteFrom("supplier").where("team_id", "=", teamId).where("id", "=", supplierId).executeTakeFirst();
  return Number(result.numDeletedRows) > 0;
}

export function supplierToForm(s: NonNullable<Awaited<ReturnType<typeof findSupplier>>>): SupplierForm {
  return {
    name: s.name,
    contact: s.contact,
    currency: s.currency,
    shippingTerms: s.shipping_terms,
    defaultShippingPerUnit: s.default_shipping_per_unit,
    defaultShippingPerOrder: s.default_shipping_per_order,
    defaultLeadTimeDays: s.default_lead_time_days ?? undefined,
    notes: s.notes,
  };
}
