// Data the plan pages need besides the plan itself: the site's load sheets and the parts to choose.
import { listLoadSheets } from "../load-sheets.server";
import { partChoices } from "./catalogue-parts.server";
import { db } from "../db.server";
import type { PlanChoices } from "~/lib/plan-choices";
import { DEFAULT_DESIGN } from "~/lib/plan-choices";

export async function editorOptions(teamId: string, siteId: string) {
  const [sheets, parts] = await Promise.all([listLoadSheets(teamId, siteId), partChoices()]);
  return { ...parts, loadSheets: sheets.map((s) => ({ id: s.id, label: s.name })) };
}

/** Sensible first choices for a new plan: an MPPT controller, a battery and inverter for 24 V. */
export async function defaultChoices(siteId: string, siteName: string, loadSheetId: string): Promise<Partial<PlanChoices> & { design: PlanChoices["design"] }> {
  const [module, controller, battery, inverter] = await Promise.all([
    db
      .selectFrom("pv_module")
      .select("id")
      .where("merged_into", "is", null)
      .orderBy((eb) => eb.fn("abs", [eb("pmax_w", "-", 200)]))
      .executeTakeFirst(),
    db
      .selectFrom("charge_controller")
      .select("id")
      .where("merged_into", "is", null)
      .where("kind", "=", "mppt")
      .orderBy("max_charge_current_a")
      .executeTakeFirst(),
    db
      .selectFrom("battery")
      .select("id")
      .where("merged_into", "is", null)
      .where("nominal_voltage_v", "in", [12, 24])
      .orderBy("chemistry", "desc")
      .executeTakeFirst(),
    db.selectFrom("inverter").select("id").where("merged_into", "is", null).where("dc_input_voltage_v", "=", 24).orderBy("continuous_w").executeTakeFirst(),
  ]);
  return {
    name: `Kit for ${siteName}`,
    siteId,
    loadSheetId,
    systemVoltageV: 24,
    moduleId: module?.id,
    controllerId: controller?.id,
    batteryId: battery?.id,
    inverterId: inverter?.id ?? null,
    design: DEFAULT_DESIGN,
  };
}
