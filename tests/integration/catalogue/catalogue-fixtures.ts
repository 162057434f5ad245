// Invented parts and approved readings for the catalogue's integration tests. Each call makes a
// maker name of its own, so tests can search for exactly their rows in the shared database.
import { db } from "~/server/db.server";
import { recomputeVerifiedFigures } from "~/server/catalogue/verified-figures.server";

let counter = 0;
export function uniqueMaker(label: string) {
  counter += 1;
  return `Testmaker ${label} ${Date.now().toString(36)}${counter}`;
}

/** A consistent 36-cell 100 W module as form fields (strings, as a browser sends them). */
export function moduleFields(maker: string, model = "TM-100", change: Record<string, string> = {}): Record<string, string> {
  return {
    maker,
    model,
    cellTechnology: "mono-PERC",
    cellsInSeries: "36",
    pmaxW: "100",
    vmpV: "18.6",
    impA: "5.38",
    vocV: "22.4",
    iscA: "5.75",
    gammaPmaxPctPerC: "-0.39",
    betaVocPctPerC: "-0.29",
    alphaIscPctPerC: "0.05",
    nominalTempKind: "noct",
    noctC: "45",
    lengthMm: "1010",
    widthMm: "665",
    massKg: "6.9",
    ...change,
  };
}

export async function insertModule(
  maker: string,
  model: string,
  change: Partial<{ pmax_w: number; cell_technology: string; vmp_v: number; imp_a: number; length_mm: number; width_mm: number }> = {},
) {
  const pmax = change.pmax_w ?? 100;
  const row = await db
    .insertInto("pv_module")
    .values({
      maker,
      model,
      cell_technology: change.cell_technology ?? "mono-PERC",
      cells_in_series: 36,
      pmax_w: pmax,
      vmp_v: change.vmp_v ?? 18.6,
      imp_a: change.imp_a ?? pmax / 18.6,
      voc_v: (change.vmp_v ?? 18.6) * 1.2,
      isc_a: (change.imp_a ?? pmax / 18.6) * 1.07,
      gamma_pmax_pct_per_c: -0.39,
      beta_voc_pct_per_c: -0.29,
      alpha_isc_pct_per_c: 0.05,
      noct_c: 45,
      length_mm: change.length_mm ?? 1010,
      width_mm: change.width_mm ?? 665,
      mass_kg: 7,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Readings as a curator would have approved them (the submission flow is another feature's). */
export async function addReadings(
  moduleId: string,
  stcValues: number[],
  status: "approved" | "pending" | "rejected" = "approved",
  submittedBy: string | null = null,
) {
  for (const [i, stc] of stcValues.entries()) {
    await db
      .insertInto("field_reading")
      .values({
        module_id: moduleId,
        submitted_by: submittedBy,
        status,
        kind: "single",
        measured_pmax_w: stc * 0.85,
        taken_at: new Date(Date.UTC(2026, 5, 1 + i, 12)),
        latitude_deg: 46.2,
        longitude_deg: 7.4,
        tilt_deg: 35,
        azimuth_deg: 180,
        air_temp_c: 20,
        irradiance_wm2: 950,
        irradiance_source: "pyranometer",
        instrument: "electronic load",
        method: "test",
        cell_temp_c: 48,
        stc_pmax_w: stc,
        uncertainty_pct: 4,
      })
      .execute();
  }
  await recomputeVerifiedFigures(db, moduleId);
}
