// Catalogue rows in the sizing domain's words. Merged (duplicate) models are not offered.
import { db } from "../db.server";
import { isUuid } from "../modules.server";
import type { BatteryChemistry, BatteryPart, ControllerPart, InverterPart, ModulePart } from "~/domain/sizing/parts";

export interface NamedPart<T> {
  id: string;
  label: string;
  part: T;
}

export async function findModulePart(id: string): Promise<NamedPart<ModulePart> | null> {
  if (!isUuid(id)) return null;
  const m = await db.selectFrom("pv_module").selectAll().where("id", "=", id).where("merged_into", "is", null).executeTakeFirst();
  if (!m) return null;
  return {
    id: m.id,
    label: `${m.maker} ${m.model}`,
    part: {
      pmaxW: m.pmax_w,
      vmpV: m.vmp_v,
      impA: m.imp_a,
      vocV: m.voc_v,
      iscA: m.isc_a,
      gammaPmaxPctPerC: m.gamma_pmax_pct_per_c,
      betaVocPctPerC: m.beta_voc_pct_per_c,
      alphaIscPctPerC: m.alpha_isc_pct_per_c,
      noctC: m.noct_c,
      cellsInSeries: m.cells_in_series,
      verifiedPmaxW: m.verified_pmax_w,
      verifiedReadingCount: m.verified_reading_count,
      areaM2: m.area_m2,
    },
  };
}

export async function findControllerPart(id: string): Promise<NamedPart<ControllerPart> | null> {
  if (!isUuid(id)) return null;
  const c = await db.selectFrom("charge_controller").selectAll().where("id", "=", id).where("merged_into", "is", null).executeTakeFirst();
  if (!c) return null;
  return {
    id: c.id,
    label: `${c.maker} ${c.model}`,
    part: {
      kind: c.kind as ControllerPart["kind"],
      batteryVoltagesV: c.battery_voltages_v,
      maxPvVocV: c.max_pv_voc_v,
      maxChargeCurrentA: c.max_charge_current_a,
      maxPvPowerW: c.max_pv_power_w,
      efficiencyPct: c.efficiency_pct,
    },
  };
}

export async function findBatteryPart(id: string): Promise<NamedPart<BatteryPart> | null> {
  if (!isUuid(id)) return null;
  const b = await db.selectFrom("battery").selectAll().where("id", "=", id).where("merged_into", "is", null).executeTakeFirst();
  if (!b) return null;
  return {
    id: b.id,
    label: `${b.maker} ${b.model}`,
    part: {
      chemistry: b.chemistry as BatteryChemistry,
      nominalVoltageV: b.nominal_voltage_v,
      capacityAh: b.capacity_ah,
      capacityHourRateH: b.capacity_hour_rate_h,
      usableDodPct: b.usable_dod_pct,
      cycleLife: b.cycle_life,
      roundTripEfficiencyPct: b.round_trip_efficiency_pct,
    },
  };
}

export async function findInverterPart(id: string): Promise<NamedPart<InverterPart> | null> {
  if (!isUuid(id)) return null;
  const i = await db.selectFrom("inverter").selectAll().where("id", "=", id).where("merged_into", "is", null).executeTakeFirst();
  if (!i) return null;
  return {
    id: i.id,
    label: `${i.maker} ${i.model}`,
    part: { continuousW: i.continuous_w, surgeW: i.surge_w, dcInputVoltageV: i.dc_input_voltage_v, efficiencyPct: i.efficiency_pct, idleDrawW: i.idle_draw_w },
  };
}

/** Everything a plan form offers to choose from, labelled with the figures that matter. */
export async function partChoices() {
  const [modules, controllers, batteries, inverters] = await Promise.all([
    db
      .selectFrom("pv_module")
      .select(["id", "maker", "model", "pmax_w", "verified_pmax_w", "verified_reading_count"])
      .where("merged_into", "is", null)
      .orderBy("maker")
      .orderBy("model")
      .limit(2000)
      .execute(),
    db
      .selectFrom("charge_controller")
      .select(["id", "maker", "model", "kind", "max_charge_current_a", "max_pv_voc_v"])
      .where("merged_into", "is", null)
      .orderBy("maker")
      .orderBy("model")
      .execute(),
    db
      .selectFrom("battery")
      .select(["id", "maker", "model", "chemistry", "nominal_voltage_v", "capacity_ah"])
      .where("merged_into", "is", null)
      .orderBy("maker")
      .orderBy("model")
      .execute(),
    db
      .selectFrom("inverter")
      .select(["id", "maker", "model", "continuous_w", "dc_input_voltage_v"])
      .where("merged_into", "is", null)
      .orderBy("continuous_w")
      .execute(),
  ]);
  return {
    modules: modules.map((m) => ({
      id: m.id,
      label: `${m.maker} ${m.model} — ${m.pmax_w} W${m.verified_pmax_w ? `, verified ${m.verified_pmax_w.toFixed(0)} W from ${m.verified_reading_count} readings` : ", no readings"}`,
    })),
    controllers: controllers.map((c) => ({
      id: c.id,
      label: `${c.maker} ${c.model} — ${c.kind.toUpperCase()} ${c.max_charge_current_a} A, max ${c.max_pv_voc_v} V`,
    })),
    batteries: batteries.map((b) => ({ id: b.id, label: `${b.maker} ${b.model} — ${b.chemistry}, ${b.nominal_voltage_v} V ${b.capacity_ah} Ah` })),
    inverters: inverters.map((i) => ({ id: i.id, label: `${i.maker} ${i.model} — ${i.continuous_w} W, ${i.dc_input_voltage_v} V DC` })),
  };
}
