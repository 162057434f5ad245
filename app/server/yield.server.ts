// Validates a yield request, resolves a catalogue module, and runs the engine.
import { estimateMonthlyYield } from "~/domain/solar/monthly-yield";
import { moduleForEnergy } from "~/domain/sizing/array-sizing";
import { yieldRequestSchema, zodIssuesToFields } from "~/domain/solar/yield-request";
import type { ModuleSpec, YieldResult } from "~/domain/solar/yield-types";
import { db } from "./db.server";
import { isUuid } from "./modules.server";

export type YieldOutcome = { ok: true; result: YieldResult } | { ok: false; status: 400 | 404; error: { message: string; fields?: Record<string, string> } };

export async function computeYield(body: unknown): Promise<YieldOutcome> {
  const parsed = yieldRequestSchema.safeParse(body);
  if (!parsed.success) {
    const fields = zodIssuesToFields(parsed.error);
    const count = Object.keys(fields).length;
    return { ok: false, status: 400, error: { message: `${count} field${count === 1 ? " needs" : "s need"} attention.`, fields } };
  }
  const request = parsed.data;
  let module: ModuleSpec;
  const extraAssumptions: string[] = [];
  if ("moduleId" in request.module) {
    const row = await findModuleFigures(request.module.moduleId);
    if (!row)
      return {
        ok: false,
        status: 400,
        error: { message: "No module with that id in the catalogue.", fields: { "module.moduleId": "No module with that id in the catalogue." } },
      };
    // The same rule as the kit planner: verified power scales the module's currents; without
    // approved readings the nameplate is used and the answer says so.
    const chosen = moduleForEnergy(
      {
        pmaxW: row.pmax_w,
        vmpV: row.vmp_v,
        impA: row.imp_a,
        vocV: row.voc_v,
        iscA: row.isc_a,
        gammaPmaxPctPerC: row.gamma_pmax_pct_per_c,
        betaVocPctPerC: row.beta_voc_pct_per_c,
        alphaIscPctPerC: row.alpha_isc_pct_per_c,
        noctC: row.noct_c,
        cellsInSeries: row.cells_in_series,
        verifiedPmaxW: row.verified_pmax_w,
        verifiedReadingCount: row.verified_reading_count,
      },
      request.powerBasis,
    );
    module = chosen.spec;
    extraAssumptions.push(`Module: ${row.maker} ${row.model}. ${chosen.note}`);
  } else {
    module = request.module;
    extraAssumptions.push(`Module: datasheet figures entered by hand, ${module.pmaxW} W at STC.`);
  }
  const result = estimateMonthlyYield({ site: request.site, module, controller: request.controller, lossesPct: request.lossesPct, options: request.options });
  return { ok: true, result: { ...result, assumptions: [...extraAssumptions, ...result.assumptions] } };
}

/** Only the figures the engine needs: this runs on every yield request. */
async function findModuleFigures(id: string) {
  if (!isUuid(id)) return undefined;
  return db
    .selectFrom("pv_module")
    .select([
      "maker",
      "model",
      "pmax_w",
      "vmp_v",
      "imp_a",
      "voc_v",
      "isc_a",
      "gamma_pmax_pct_per_c",
      "beta_voc_pct_per_c",
      "alpha_isc_pct_per_c",
      "noct_c",
      "cells_in_series",
      "verified_pmax_w",
      "verified_reading_count",
    ])
    .where("id", "=", id)
    .executeTakeFirst();
}
