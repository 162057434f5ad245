// Between database rows (snake_case) and the catalogue's items and form values (camelCase).
import type { Selectable } from "kysely";
import type { BatteryTable, ChargeControllerTable, InverterTable, PvModuleTable } from "../db-schema";
import { batteryEnergyKWh, usableEnergyKWh } from "~/domain/catalogue/derived-figures";
import { BATTERY_BANK_VOLTAGES, type BatteryChemistry, type CellTechnology, type ControllerKind, type PartKind } from "~/domain/catalogue/part-kinds";
import { controllerRatings } from "~/domain/catalogue/part-specs";
import type { BatteryForm, ControllerForm, InverterForm, ModuleForm } from "~/lib/catalogue-forms";
import type { BatteryItem, ControllerItem, InverterItem, ModuleItem } from "~/lib/catalogue-types";

export const PART_TABLES = { modules: "pv_module", batteries: "battery", controllers: "charge_controller", inverters: "inverter" } as const satisfies Record<
  PartKind,
  string
>;

/** The columns a module item needs: no timestamps, whose parsing costs more than the rest of a page. */
export const MODULE_ITEM_COLUMNS = [
  "id",
  "maker",
  "model",
  "cell_technology",
  "cells_in_series",
  "pmax_w",
  "vmp_v",
  "imp_a",
  "voc_v",
  "isc_a",
  "gamma_pmax_pct_per_c",
  "beta_voc_pct_per_c",
  "alpha_isc_pct_per_c",
  "nominal_temp_kind",
  "noct_c",
  "length_mm",
  "width_mm",
  "mass_kg",
  "area_m2",
  "nameplate_density_wm2",
  "measured_density_wm2",
  "verified_ratio",
  "verified_pmax_w",
  "verified_reading_count",
  "verified_spread_pct",
  "merged_into",
] as const satisfies readonly (keyof PvModuleTable)[];

export function moduleItem(r: Pick<Selectable<PvModuleTable>, (typeof MODULE_ITEM_COLUMNS)[number]>): ModuleItem {
  return {
    id: r.id,
    maker: r.maker,
    model: r.model,
    cellTechnology: r.cell_technology as CellTechnology,
    cellsInSeries: r.cells_in_series,
    pmaxW: r.pmax_w,
    vmpV: r.vmp_v,
    impA: r.imp_a,
    vocV: r.voc_v,
    iscA: r.isc_a,
    gammaPmaxPctPerC: r.gamma_pmax_pct_per_c,
    betaVocPctPerC: r.beta_voc_pct_per_c,
    alphaIscPctPerC: r.alpha_isc_pct_per_c,
    nominalTempKind: r.nominal_temp_kind,
    noctC: r.noct_c,
    lengthMm: r.length_mm,
    widthMm: r.width_mm,
    massKg: r.mass_kg,
    areaM2: r.area_m2,
    nameplateDensityWm2: r.nameplate_density_wm2,
    nameplateEfficiencyPct: r.nameplate_density_wm2 / 10,
    verifiedPmaxW: r.verified_pmax_w,
    readingCount: r.verified_reading_count,
    spreadPct: r.verified_spread_pct,
    verifiedRatio: r.verified_ratio,
    measuredDensityWm2: r.measured_density_wm2,
    mergedIntoId: r.merged_into,
  };
}

export function batteryItem(r: Selectable<BatteryTable>): BatteryItem {
  return {
    id: r.id,
    maker: r.maker,
    model: r.model,
    chemistry: r.chemistry as BatteryChemistry,
    nominalVoltageV: r.nominal_voltage_v,
    capacityAh: r.capacity_ah,
    capacityHourRateH: r.capacity_hour_rate_h,
    usableDodPct: r.usable_dod_pct,
    cycleLife: r.cycle_life,
    roundTripEfficiencyPct: r.round_trip_efficiency_pct,
    massKg: r.mass_kg,
    energyKWh: batteryEnergyKWh(r.nominal_voltage_v, r.capacity_ah),
    usableEnergyKWh: usableEnergyKWh(r.nominal_voltage_v, r.capacity_ah, r.usable_dod_pct),
  };
}

export function controllerItem(r: Selectable<ChargeControllerTable>): ControllerItem {
  return {
    id: r.id,
    maker: r.maker,
    model: r.model,
    kind: r.kind as ControllerKind,
    batteryVoltagesV: r.battery_voltages_v,
    maxPvPowerW: r.max_pv_power_w,
    maxPvVocV: r.max_pv_voc_v,
    maxChargeCurrentA: r.max_charge_current_a,
    efficiencyPct: r.efficiency_pct,
  };
}

export function inverterItem(r: Selectable<InverterTable>): InverterItem {
  return {
    id: r.id,
    maker: r.maker,
    model: r.model,
    continuousW: r.continuous_w,
    surgeW: r.surge_w,
    dcInputVoltageV: r.dc_input_voltage_v,
    efficiencyPct: r.efficiency_pct,
    idleDrawW: r.idle_draw_w,
  };
}

export function moduleRow(f: ModuleForm) {
  return {
    maker: f.maker,
    model: f.model,
    cell_technology: f.cellTechnology,
    cells_in_series: f.cellsInSeries,
    pmax_w: f.pmaxW,
    vmp_v: f.vmpV,
    imp_a: f.impA,
    voc_v: f.vocV,
    isc_a: f.iscA,
    gamma_pmax_pct_per_c: f.gammaPmaxPctPerC,
    beta_voc_pct_per_c: f.betaVocPctPerC,
    alpha_isc_pct_per_c: f.alphaIscPctPerC,
    nominal_temp_kind: f.nominalTempKind,
    noct_c: f.noctC,
    length_mm: f.lengthMm,
    width_mm: f.widthMm,
    mass_kg: f.massKg,
  };
}

export function batteryRow(f: BatteryForm) {
  return {
    maker: f.maker,
    model: f.model,
    chemistry: f.chemistry,
    nominal_voltage_v: f.nominalVoltageV,
    capacity_ah: f.capacityAh,
    capacity_hour_rate_h: f.capacityHourRateH,
    usable_dod_pct: f.usableDodPct,
    cycle_life: f.cycleLife,
    round_trip_efficiency_pct: f.roundTripEfficiencyPct,
    mass_kg: f.massKg,
  };
}

export function controllerRow(f: ControllerForm) {
  const ratings = controllerRatings(f);
  return {
    maker: f.maker,
    model: f.model,
    kind: f.kind,
    battery_voltages_v: ratings.map((r) => r.batteryVoltageV),
    max_pv_power_w: JSON.stringify(Object.fromEntries(ratings.map((r) => [String(r.batteryVoltageV), r.maxPvPowerW]))),
    max_pv_voc_v: f.maxPvVocV,
    max_charge_current_a: f.maxChargeCurrentA,
    efficiency_pct: f.efficiencyPct,
  };
}

export function inverterRow(f: InverterForm) {
  return {
    maker: f.maker,
    model: f.model,
    continuous_w: f.continuousW,
    surge_w: f.surgeW,
    dc_input_voltage_v: f.dcInputVoltageV,
    efficiency_pct: f.efficiencyPct,
    idle_draw_w: f.idleDrawW,
  };
}

/** A stored part as the edit form's starting values (strings, as a form holds them). */
export function formDefaults(kind: PartKind, item: ModuleItem | BatteryItem | ControllerItem | InverterItem): Record<string, string> {
  const values: Record<string, unknown> = { ...item };
  if (kind === "controllers") {
    const c = item as ControllerItem;
    for (const v of BATTERY_BANK_VOLTAGES) values[`maxPvPower${v}W`] = c.maxPvPowerW[String(v)] ?? "";
  }
  return Object.fromEntries(Object.entries(values).map(([k, v]) => [k, v === null || v === undefined ? "" : typeof v === "object" ? "" : String(v)]));
}
