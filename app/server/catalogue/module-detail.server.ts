// One module with its readings summary, for the module page and GET /api/v1/modules/:id. The
// catalogue is shared by every team: approved readings appear as STC values and dates only, never
// with who took them, for which team or where.
import type { Kysely } from "kysely";
import type { Database } from "../db-schema";
import { moduleItem } from "./part-rows.server";
import type { ModuleItem, ReadingsSummary } from "~/lib/catalogue-types";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const MAX_CHART_POINTS = 500;

export interface ModuleDetail {
  module: ModuleItem;
  /** The model this duplicate was merged into (its readings live there now). */
  mergedInto: { id: string; maker: string; model: string } | null;
  readings: ReadingsSummary;
}

export async function findModuleDetail(db: Kysely<Database>, id: string): Promise<ModuleDetail | null> {
  if (!UUID.test(id)) return null;
  const row = await db.selectFrom("pv_module").selectAll().where("id", "=", id).executeTakeFirst();
  if (!row) return null;
  const mergedInto = row.merged_into
    ? ((await db.selectFrom("pv_module").select(["id", "maker", "model"]).where("id", "=", row.merged_into).executeTakeFirst()) ?? null)
    : null;
  const [latest, range] = await Promise.all([
    db
      .selectFrom("field_reading")
      .select(["taken_at", "stc_pmax_w", "irradiance_source", "kind"])
      .where("module_id", "=", id)
      .where("status", "=", "approved")
      .orderBy("taken_at", "desc")
      .orderBy("id")
      .limit(MAX_CHART_POINTS)
      .execute(),
    db
      .selectFrom("field_reading")
      .select((eb) => [eb.fn.min("stc_pmax_w").as("min"), eb.fn.max("stc_pmax_w").as("max"), eb.fn.countAll<number>().as("count")])
      .where("module_id", "=", id)
      .where("status", "=", "approved")
      .executeTakeFirstOrThrow(),
  ]);
  const module = moduleItem(row);
  const approvedCount = Number(range.count);
  const firstIndex = approvedCount - latest.length;
  return {
    module,
    mergedInto,
    readings: {
      approvedCount,
      verifiedPmaxW: module.verifiedPmaxW,
      spreadPct: module.spreadPct,
      verifiedRatio: module.verifiedRatio,
      measuredDensityWm2: module.measuredDensityWm2,
      minStcPmaxW: range.min === null ? null : Number(range.min),
      maxStcPmaxW: range.max === null ? null : Number(range.max),
      points: latest.reverse().map((r, i) => ({
        index: firstIndex + i + 1,
        takenAt: new Date(r.taken_at).toISOString(),
        stcPmaxW: r.stc_pmax_w,
        irradianceSource: r.irradiance_source,
        kind: r.kind,
      })),
    },
  };
}
