// Lists of batteries, charge controllers and inverters for the catalogue page: search, one filter
// per kind, a sort on any numeric column and paging, in SQL. Merged duplicates never appear.
import { sql, type Expression, type Kysely, type SqlBool } from "kysely";
import type { Database } from "../db-schema";
import { likePattern, listModulePage, searchTerms } from "./module-list.server";
import { batteryItem, controllerItem, inverterItem } from "./part-rows.server";
import type { PartKind } from "~/domain/catalogue/part-kinds";
import type { PartListQuery } from "~/lib/catalogue-query";
import type { PartPage } from "~/lib/catalogue-types";

const SORT_EXPRESSIONS = {
  batteries: {
    nominalVoltageV: "nominal_voltage_v",
    capacityAh: "capacity_ah",
    energyKWh: "nominal_voltage_v * capacity_ah",
    usableEnergyKWh: "nominal_voltage_v * capacity_ah * usable_dod_pct",
    usableDodPct: "usable_dod_pct",
    cycleLife: "cycle_life",
    roundTripEfficiencyPct: "round_trip_efficiency_pct",
    massKg: "mass_kg",
  },
  controllers: { maxPvVocV: "max_pv_voc_v", maxChargeCurrentA: "max_charge_current_a", efficiencyPct: "efficiency_pct" },
  inverters: {
    continuousW: "continuous_w",
    surgeW: "surge_w",
    dcInputVoltageV: "dc_input_voltage_v",
    efficiencyPct: "efficiency_pct",
    idleDrawW: "idle_draw_w",
  },
} as const;

export async function listPartPage<K extends PartKind>(db: Kysely<Database>, query: PartListQuery<K>): Promise<PartPage<K>> {
  if (query.kind === "modules") return (await listModulePage(db, query as PartListQuery<"modules">)) as PartPage<K>;
  const kind = query.kind as Exclude<PartKind, "modules">;
  const table = kind === "batteries" ? "battery" : kind === "controllers" ? "charge_controller" : "inverter";
  // The three tables share maker, model and merged_into; the kind's own columns are reached by name.
  let base = db.selectFrom(table as "battery").where("merged_into", "is", null);
  for (const term of searchTerms(query.q)) base = base.where(sql<SqlBool>`(maker || ' ' || model) ilike ${likePattern(term)}`);
  if (kind === "batteries" && query.chemistry) base = base.where("chemistry", "=", query.chemistry);
  if (kind === "controllers" && query.controllerType) base = base.where(sql.ref("kind"), "=", query.controllerType);
  if (kind === "inverters" && query.dcV !== undefined) base = base.where(sql.ref("dc_input_voltage_v"), "=", query.dcV);

  let page = base.selectAll();
  const expressions: Record<string, string> = SORT_EXPRESSIONS[kind];
  const expression = expressions[query.sort as string];
  if (expression) {
    page = page.orderBy(sql.raw(expression) as Expression<unknown>, (ob) => (query.dir === "desc" ? ob.desc() : ob.asc()).nullsLast());
  }
  const dir = expression ? "asc" : query.dir;
  page = page.orderBy("maker", dir).orderBy("model", dir).orderBy("id");
  const [rows, count] = await Promise.all([
    page.limit(query.limit).offset(query.offset).execute(),
    base.select((eb) => eb.fn.countAll<number>().as("count")).executeTakeFirstOrThrow(),
  ]);
  const map = kind === "batteries" ? batteryItem : kind === "controllers" ? controllerItem : inverterItem;
  return { items: rows.map((r) => map(r as never)) as PartPage<K>["items"], total: Number(count.count) };
}
