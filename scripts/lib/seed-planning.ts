// Demo sites, load sheets and one saved plan each for Tallowmere Power Works (idempotent by site name).
import { DEMO_SITES } from "../../data/demo/sites";
import { DEFAULT_DESIGN } from "../../app/lib/plan-choices";

export async function seedDemoPlanning(log: (line: string) => void) {
  const { db } = await import("../../app/server/db.server");
  const { createSite } = await import("../../app/server/sites.server");
  const { createLoadSheet } = await import("../../app/server/load-sheets.server");
  const { planFromChoices } = await import("../../app/server/plans/plan-service.server");
  const { createPlan } = await import("../../app/server/plans/plans.server");
  const team = await db.selectFrom("organization").select("id").where("slug", "=", "tallowmere-power-works").executeTakeFirst();
  const owner = await db.selectFrom("user").select("id").where("email", "=", "maren@tallowmere.example").executeTakeFirst();
  if (!team || !owner) return;

  const partId = async (table: "pv_module" | "charge_controller" | "battery" | "inverter", name: string | null) => {
    if (!name) return null;
    const rows = await db.selectFrom(table).select(["id", "maker", "model"]).execute();
    return rows.find((r) => `${r.maker} ${r.model}` === name)?.id ?? null;
  };

  for (const demo of DEMO_SITES) {
    const exists = await db.selectFrom("site").select("id").where("team_id", "=", team.id).where("name", "=", demo.site.name).executeTakeFirst();
    if (exists) continue;
    const siteId = await createSite(team.id, owner.id, demo.site);
    const loadSheetId = await createLoadSheet(team.id, siteId, owner.id, demo.loadSheet);
    log(`site ${demo.site.name}`);
    const [moduleId, controllerId, batteryId, inverterId] = await Promise.all([
      partId("pv_module", demo.plan.module),
      partId("charge_controller", demo.plan.controller),
      partId("battery", demo.plan.battery),
      partId("inverter", demo.plan.inverter),
    ]);
    if (!moduleId || !controllerId || !batteryId || (demo.plan.inverter && !inverterId)) {
      log(`  (no demo plan: a part of "${demo.plan.name}" is not in the catalogue)`);
      continue;
    }
    const outcome = await planFromChoices(team.id, {
      name: demo.plan.name,
      siteId,
      loadSheetId,
      systemVoltageV: demo.plan.systemVoltageV,
      moduleId,
      controllerId,
      batteryId,
      inverterId,
      design: DEFAULT_DESIGN,
    });
    if (!outcome.ok) {
      log(`  (no demo plan: ${outcome.message} ${JSON.stringify(outcome.fields)})`);
      continue;
    }
    await createPlan(team.id, owner.id, outcome.choices, outcome.input, outcome.plan);
  }
}
