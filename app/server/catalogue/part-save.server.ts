// Creates and updates catalogue parts from validated form values. A maker + model that already
// exists is answered at the model field, never with a server error.
import { sql, type Kysely, type Transaction } from "kysely";
import type { Database } from "../db-schema";
import { batteryItem, batteryRow, controllerItem, controllerRow, inverterItem, inverterRow, moduleItem, moduleRow, PART_TABLES } from "./part-rows.server";
import type { PartKind } from "~/domain/catalogue/part-kinds";
import type { BatteryForm, ControllerForm, InverterForm, ModuleForm, PartForm } from "~/lib/catalogue-forms";
import type { BatteryItem, ControllerItem, InverterItem, ModuleItem } from "~/lib/catalogue-types";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

type Db = Kysely<Database> | Transaction<Database>;
export type AnyPartItem = ModuleItem | BatteryItem | ControllerItem | InverterItem;

export async function findPartItem(db: Db, kind: PartKind, id: string): Promise<(AnyPartItem & { mergedInto: string | null }) | null> {
  if (!UUID.test(id)) return null;
  const row = await db
    .selectFrom(PART_TABLES[kind] as "battery")
    .selectAll()
    .where("id", "=", id)
    .executeTakeFirst();
  if (!row) return null;
  const map = { modules: moduleItem, batteries: batteryItem, controllers: controllerItem, inverters: inverterItem }[kind] as (r: unknown) => AnyPartItem;
  return { ...map(row), mergedInto: row.merged_into };
}

export function partRow(kind: PartKind, value: PartForm) {
  switch (kind) {
    case "modules":
      return moduleRow(value as ModuleForm);
    case "batteries":
      return batteryRow(value as BatteryForm);
    case "controllers":
      return controllerRow(value as ControllerForm);
    case "inverters":
      return inverterRow(value as InverterForm);
  }
}

export function isUniqueViolation(error: unknown) {
  return typeof error === "object" && error !== null && (error as { code?: string }).code === "23505";
}

export const DUPLICATE_MODEL_MESSAGE = "This maker already has a model of that name in the catalogue.";

export type SaveOutcome = { ok: true; id: string } | { ok: false; fields: Record<string, string> };

export async function createPart(db: Db, kind: PartKind, value: PartForm): Promise<SaveOutcome> {
  try {
    const row = await db
      .insertInto(PART_TABLES[kind] as "battery")
      .values(partRow(kind, value) as never)
      .returning("id")
      .executeTakeFirstOrThrow();
    return { ok: true, id: row.id };
  } catch (error) {
    if (isUniqueViolation(error)) return { ok: false, fields: { model: DUPLICATE_MODEL_MESSAGE } };
    throw error;
  }
}

export async function updatePart(db: Db, kind: PartKind, id: string, value: PartForm): Promise<SaveOutcome> {
  try {
    const result = await db
      .updateTable(PART_TABLES[kind] as "battery")
      .set({ ...(partRow(kind, value) as object), updated_at: sql`now()` })
      .where("id", "=", id)
      .where("merged_into", "is", null)
      .executeTakeFirst();
    if (Number(result.numUpdatedRows) === 0) return { ok: false, fields: { model: "This part was merged or removed while you edited it." } };
    return { ok: true, id };
  } catch (error) {
    if (isUniqueViolation(error)) return { ok: false, fields: { model: DUPLICATE_MODEL_MESSAGE } };
    throw error;
  }
}
