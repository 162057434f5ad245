// Demo catalogue parts: inserted when absent (matched on maker + model).
import type { Kysely } from "kysely";
import type { Database } from "../../app/server/db-schema";
import { DEMO_MODULES } from "../../data/demo/modules";

export async function seedDemoCatalogue(db: Kysely<Database>, log: (line: string) => void) {
  const rows = DEMO_MODULES.map((m) => ({
    maker: m.maker,
    model: m.model,
    cell_technology: m.cellTechnology,
    cells_in_series: m.cellsInSeries,
    pmax_w: m.pmaxW,
    vmp_v: m.vmpV,
    imp_a: m.impA,
    voc_v: m.vocV,
    isc_a: m.iscA,
    gamma_pmax_pct_per_c: m.gammaPmaxPctPerC,
    beta_voc_pct_per_c: m.betaVocPctPerC,
    alpha_isc_pct_per_c: m.alphaIscPctPerC,
    noct_c: m.noctC,
    length_mm: m.lengthMm,
    width_mm: m.widthMm,
    mass_kg: m.massKg,
  }));
  const inserted = await db.insertInto("pv_module").values(rows).onConflict((oc) => oc.columns(["maker", "model"]).doNothing()).returning("id").execute();
  if (inserted.length) log(`${inserted.length} demo modules`);
}
