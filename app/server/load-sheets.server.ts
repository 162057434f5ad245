// Load sheets belong to a site of the team; every query carries the team id.
import { db } from "./db.server";
import { isUuid } from "./modules.server";
import type { LoadSheetInput } from "~/lib/load-sheet-forms";

export function listLoadSheets(teamId: string, siteId: string) {
  return db
    .selectFrom("load_sheet")
    .select(["id", "name", "appliances", "updated_at"])
    .where("team_id", "=", teamId)
    .where("site_id", "=", siteId)
    .orderBy("updated_at", "desc")
    .execute();
}

export async function findLoadSheet(teamId: string, loadSheetId: string) {
  if (!isUuid(loadSheetId)) return undefined;
  return db.selectFrom("load_sheet").selectAll().where("team_id", "=", teamId).where("id", "=", loadSheetId).executeTakeFirst();
}

export async function createLoadSheet(teamId: string, siteId: string, userId: string | null, input: LoadSheetInput) {
  const row = await db
    .insertInto("load_sheet")
    .values({ team_id: teamId, site_id: siteId, name: input.name, appliances: JSON.stringify(input.appliances), created_by: userId })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function updateLoadSheet(teamId: string, loadSheetId: string, input: LoadSheetInput) {
  const result = await db
    .updateTable("load_sheet")
    .set({ name: input.name, appliances: JSON.stringify(input.appliances), updated_at: new Date() })
    .where("team_id", "=", teamId)
    .where("id", "=", loadSheetId)
    .executeTakeFirst();
  return Number(result.numUpdatedRows) > 0;
}

export async function deleteLoadSheet(teamId: string, loadSheetId: string) {
  const result = await db.deleteFrom("load_sheet").where("team_id", "=", teamId).where("id", "=", loadSheetId).executeTakeFirst();
  return Number(result.numDeletedRows) > 0;
}

/** Catalogue inverters, for the load sheet's "totals through this inverter" preview. */
export function listInvertersForTotals() {
  return db
    .selectFrom("inverter")
    .select(["id", "maker", "model", "continuous_w", "efficiency_pct", "idle_draw_w", "dc_input_voltage_v"])
    .where("merged_into", "is", null)
    .orderBy("continuous_w")
    .execute();
}
