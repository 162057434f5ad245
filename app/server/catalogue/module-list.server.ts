// The module list behind the catalogue page and GET /api/v1/modules: search, filters, a sort on
// any numeric column and paging, all in SQL. Merged duplicates never appear.
import { sql, type Expression, type Kysely, type SqlBool } from "kysely";
import type { Database } from "../db-schema";
import { MODULE_ITEM_COLUMNS, moduleItem } from "./part-rows.server";
import type { ModuleSortKey, PartListQuery } from "~/lib/catalogue-query";
import type { PartPage } from "~/lib/catalogue-types";

/** Each sort key's column; efficiency sorts as density (η = density / 1000 W/m²). */
const MODULE_SORT_COLUMNS: Record<ModuleSortKey, string> = {
  maker: "maker",
  pmaxW: "pmax_w",
  vmpV: "vmp_v",
  vocV: "voc_v",
  iscA: "isc_a",
  cellsInSeries: "cells_in_series",
  gammaPmaxPctPerC: "gamma_pmax_pct_per_c",
  noctC: "noct_c",
  areaM2: "area_m2",
  massKg: "mass_kg",
  nameplateDensityWm2: "nameplate_density_wm2",
  nameplateEfficiencyPct: "nameplate_density_wm2",
  measuredDensityWm2: "measured_density_wm2",
  verifiedPmaxW: "verified_pmax_w",
  verifiedRatio: "verified_ratio",
  readingCount: "verified_reading_count",
  spreadPct: "verified_spread_pct",
};

const NULLABLE_SORT_COLUMNS = new Set(["measured_density_wm2", "verified_pmax_w", "verified_ratio", "verified_spread_pct"]);

/** `%term%` for (I)LIKE with the pattern characters escaped. */
export function likePattern(term: string) {
  return `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Every whitespace-separated term must appear in "maker model" (so "harrow 100" finds HG-100M36). */
export function searchTerms(q: string) {
  return q.split(/\s+/).filter(Boolean).slice(0, 6);
}

export async function listModulePage(db: Kysely<Database>, query: PartListQuery<"modules">): Promise<PartPage<"modules">> {
  const f = query.modules;
  let base = db.selectFrom("pv_module").where("merged_into", "is", null);
  // search_text is lower(maker || ' ' || model): LIKE on it is case-insensitive without folding every row.
  for (const term of searchTerms(query.q)) base = base.where("search_text", "like", likePattern(term.toLowerCase()));
  if (f.technology) base = base.where("cell_technology", "=", f.technology);
  if (f.minW !== undefined) base = base.where("pmax_w", ">=", f.minW);
  if (f.maxW !== undefined) base = base.where("pmax_w", "<=", f.maxW);
  if (f.hasReadings === true) base = base.where("verified_reading_count", ">", 0);
  if (f.hasReadings === false) base = base.where("verified_reading_count", "=", 0);
  if (f.ratioBelow !== undefined) base = base.where("verified_ratio", "<", f.ratioBelow);

  const countQuery = base.select((eb) => eb.fn.countAll<number>().as("n"));
  // The total rides along as an uncorrelated subquery (PostgreSQL runs it once): one round trip
  // instead of two for every page.
  let page = base.select(MODULE_ITEM_COLUMNS).select(countQuery.as("total"));
  if (query.sort !== "maker") {
    const name = MODULE_SORT_COLUMNS[query.sort];
    const column = sql.ref(name) as Expression<unknown>;
    // Modules without readings have no verified figures: they go last whichever way the sort runs.
    // Nameplate columns are never null, and a plain direction lets PostgreSQL walk their index.
    page = NULLABLE_SORT_COLUMNS.has(name)
      ? page.orderBy(column, (ob) => (query.dir === "desc" ? ob.desc() : ob.asc()).nullsLast())
      : page.orderBy(column, query.dir);
  }
  const dir = query.sort === "maker" ? query.dir : "asc";
  page = page.orderBy("maker", dir).orderBy("model", dir).orderBy("id");

  const rows = await page.limit(query.limit).offset(query.offset).execute();
  // A page past the end has no row to carry the total: ask for it alone.
  const total = rows.length ? Number(rows[0].total) : query.offset > 0 ? Number((await countQuery.executeTakeFirstOrThrow()).n) : 0;
  return { items: rows.map(moduleItem), total };
}
