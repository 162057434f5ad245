// A site, a load sheet and one part of each kind, made for a team in the shared test database.
import { db } from "~/server/db.server";
import { createSite } from "~/server/sites.server";
import { createLoadSheet } from "~/server/load-sheets.server";
import { VELL_HUT_SITE } from "../../../data/demo/vell-valley-climate";

let n = 0;
const unique = () => `${Date.now().toString(36)}-${++n}`;

export async function planningSetup(teamId: string) {
  const siteId = await createSite(teamId, null, {
    name: `Hut ${unique()}`,
    customerName: "Warden",
    latitudeDeg: VELL_HUT_SITE.latitudeDeg,
    longitudeDeg: VELL_HUT_SITE.longitudeDeg,
    elevationM: 2000,
    timeZone: "Europe/Vienna",
    tiltDeg: 55,
    azimuthDeg: 180,
    albedo: 0.2,
    shadingDeratePct: 0,
    coldestTempC: -20,
    irradianceSource: "measured",
    months: VELL_HUT_SITE.months.map(({ ghiKWhM2Day, tMaxC, tMinC }) => ({ ghiKWhM2Day, tMaxC, tMinC })),
  });
  const loadSheetId = await createLoadSheet(teamId, siteId, null, {
    name: "All year",
    appliances: [
      { name: "Fridge", powerW: 60, quantity: 1, hoursPerDay: 10, daysPerWeek: 7, circuit: "dc", surgeW: 180 },
      { name: "Laptop", powerW: 45, quantity: 2, hoursPerDay: 4, daysPerWeek: 7, circuit: "ac" },
    ],
  });
  const tag = unique();
  const module = await db
    .insertInto("pv_module")
    .values({
      maker: "Fixture",
      model: `M-${tag}`,
      cell_technology: "mono-PERC",
      cells_in_series: 60,
      pmax_w: 330,
      vmp_v: 33.5,
      imp_a: 9.85,
      voc_v: 40.6,
      isc_a: 10.4,
      gamma_pmax_pct_per_c: -0.38,
      beta_voc_pct_per_c: -0.29,
      alpha_isc_pct_per_c: 0.05,
      noct_c: 45,
      length_mm: 1690,
      width_mm: 1000,
      mass_kg: 19,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  const controller = await db
    .insertInto("charge_controller")
    .values({
      maker: "Fixture",
      model: `C-${tag}`,
      kind: "mppt",
      battery_voltages_v: [12, 24, 48],
      max_pv_voc_v: 150,
      max_charge_current_a: 60,
      max_pv_power_w: JSON.stringify({ "12": 860, "24": 1720, "48": 3440 }),
      efficiency_pct: 97,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  const battery = await db
    .insertInto("battery")
    .values({
      maker: "Fixture",
      model: `B-${tag}`,
      chemistry: "lifepo4",
      nominal_voltage_v: 12.8,
      capacity_ah: 200,
      capacity_hour_rate_h: 5,
      usable_dod_pct: 90,
      cycle_life: 4000,
      round_trip_efficiency_pct: 95,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  const inverter = await db
    .insertInto("inverter")
    .values({ maker: "Fixture", model: `I-${tag}`, continuous_w: 1500, surge_w: 3000, dc_input_voltage_v: 24, efficiency_pct: 92, idle_draw_w: 12 })
    .returning("id")
    .executeTakeFirstOrThrow();
  return { siteId, loadSheetId, moduleId: module.id, controllerId: controller.id, batteryId: battery.id, inverterId: inverter.id };
}

export function choices(setup: Awaited<ReturnType<typeof planningSetup>>, overrides: Record<string, unknown> = {}, design: Record<string, unknown> = {}) {
  return {
    name: "Hut kit",
    siteId: setup.siteId,
    loadSheetId: setup.loadSheetId,
    systemVoltageV: 24,
    moduleId: setup.moduleId,
    controllerId: setup.controllerId,
    batteryId: setup.batteryId,
    inverterId: setup.inverterId,
    design: {
      autonomyDays: 3,
      designMarginPct: 20,
      powerBasis: "verified",
      voltageDropTargetPct: 3,
      conductorSystem: "mm2",
      arrayToControllerM: 15,
      controllerToBatteryM: 2,
      batteryToInverterM: 1.5,
      lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
      ...design,
    },
    ...overrides,
  };
}
