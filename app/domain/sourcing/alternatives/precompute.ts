// What the search computes once per site and part, before any combination is tried: each inverter
// option's load, each module-on-controller pair's monthly energy (the yield engine, on the plan's power
// basis) and the string lengths the voltages allow, each battery bank that passes the battery checks.
// The formulas are planKit's own (kit-plan.ts, array-sizing.ts, string-layout.ts, battery-bank.ts).
import { summarizeLoadSheet } from "../../load/load-sheet";
import type { LoadSummary } from "../../load/load-sheet-types";
import { moduleYieldFromProfile } from "../../solar/module-yield";
import { moduleForEnergy } from "../../sizing/array-sizing";
import { sizeBatteryBank, type BatteryBankSizing } from "../../sizing/battery-bank";
import {
  batteryArrangementCheck,
  batteryCapacityCheck,
  batteryColdCheck,
  depthOfDischargeCheck,
  dischargeRateCheck,
  parallelStringsCheck,
} from "../../sizing/battery-checks";
import { bankChargeVoltageV } from "../../sizing/chemistry";
import { controllerVoltageCheck } from "../../sizing/controller-checks";
import { DEFAULT_INVERTER_MARGIN_PCT, inverterChecks } from "../../sizing/inverter-checks";
import type { PreparedPlanSite } from "../../sizing/kit-plan";
import type { BatteryPart, ControllerPart, InverterPart, ModulePart } from "../../sizing/parts";
import type { KitPlanInput } from "../../sizing/plan-types";
import { DEFAULT_MPPT_HEADROOM_V, evaluateLayout, type LayoutContext } from "../../sizing/string-layout";
import { designHotAirC, hotCellTemperatureC } from "../../sizing/string-voltage";
import type { CandidatePart } from "./types";

export interface LoadOption {
  inverter: CandidatePart<InverterPart> | null;
  load: LoadSummary;
}

/** Inverter options: none for a DC-only load; otherwise each inverter that passes the inverter checks. */
export function loadOptions(base: KitPlanInput, inverters: readonly CandidatePart<InverterPart>[], prune: (reason: string) => void): LoadOption[] {
  const design = base.design;
  const dcOnly = summarizeLoadSheet(base.appliances, null);
  if (!dcOnly.hasAcLoad) return [{ inverter: null, load: dcOnly }];
  const options: LoadOption[] = [];
  for (const inv of inverters) {
    const p = inv.part;
    const load = summarizeLoadSheet(base.appliances, { efficiencyPct: p.efficiencyPct, idleDrawW: p.idleDrawW, onHoursPerDay: design.inverterOnHoursPerDay });
    const checks = inverterChecks(p, load, base.systemVoltageV, design.inverterMarginPct ?? DEFAULT_INVERTER_MARGIN_PCT);
    if (checks.some((c) => c.status === "fail")) prune("Inverters that fail an inverter check (DC voltage, continuous or surge power)");
    else options.push({ inverter: inv, load });
  }
  return options;
}

export function usableControllers(base: KitPlanInput, controllers: readonly CandidatePart<ControllerPart>[], prune: (reason: string) => void) {
  return controllers.filter((c) => {
    const ok = controllerVoltageCheck(c.part, base.systemVoltageV).status !== "fail";
    if (!ok) prune(`Charge controllers that do not take a ${base.systemVoltageV} V bank`);
    return ok;
  });
}

/** A module on a controller: energy per module each month (after shading) and, per charging voltage, the string lengths whose voltages pass. */
export interface ModulePair {
  module: CandidatePart<ModulePart>;
  controller: CandidatePart<ControllerPart>;
  energyWhPerDay: Float64Array;
  ratingPowerW: number;
  seriesByChargeVoltage: Map<number, number[]>;
}

export function modulePair(
  prepared: PreparedPlanSite,
  base: KitPlanInput,
  module: CandidatePart<ModulePart>,
  controller: CandidatePart<ControllerPart>,
): ModulePair {
  const energyModule = moduleForEnergy(module.part, base.design.powerBasis);
  const c = controller.part;
  const yieldResult = moduleYieldFromProfile(
    prepared.profile,
    energyModule.spec,
    { kind: c.kind, batteryVoltageV: base.systemVoltageV, efficiencyPct: c.efficiencyPct },
    base.design.lossesPct,
  );
  const shadingFactor = 1 - (base.site.shadingDeratePct ?? 0) / 100;
  return {
    module,
    controller,
    energyWhPerDay: Float64Array.from(yieldResult.months.map((m) => m.energyWhPerDay * shadingFactor)),
    ratingPowerW: Math.max(module.part.pmaxW, energyModule.spec.pmaxW),
    seriesByChargeVoltage: new Map(),
  };
}

/** String lengths (1…40) whose cold-morning Voc, hot-afternoon Vmp and PWM match pass for this charging voltage. */
export function voltageValidSeries(pair: ModulePair, base: KitPlanInput, chargeVoltageV: number): number[] {
  const known = pair.seriesByChargeVoltage.get(chargeVoltageV);
  if (known) return known;
  const site = base.site;
  const hottestAirC = designHotAirC(site);
  const ctx: LayoutContext = {
    module: pair.module.part,
    controller: pair.controller.part,
    systemVoltageV: base.systemVoltageV,
    chargeVoltageV,
    coldestAirC: site.coldestTempC,
    hotCellC: hotCellTemperatureC(hottestAirC, pair.module.part.noctC),
    mpptHeadroomV: base.design.mpptHeadroomV ?? DEFAULT_MPPT_HEADROOM_V,
    ratingPowerW: pair.ratingPowerW,
  };
  const series: number[] = [];
  for (let ns = 1; ns <= 40; ns++) {
    const e = evaluateLayout({ modulesInSeries: ns, stringsInParallel: 1 }, ctx);
    if (e.vocOk && e.vmpStatus !== "fail" && e.matchesPwm) series.push(ns);
  }
  pair.seriesByChargeVoltage.set(chargeVoltageV, series);
  return series;
}

export function chargeVoltageV(base: KitPlanInput, battery: BatteryPart): number {
  return bankChargeVoltageV(base.systemVoltageV, battery.chemistry);
}

/** The plan form's limit on parallel battery strings (app/lib/plan-choices.ts). */
export const MAX_BATTERY_STRINGS = 20;

export interface BankOption {
  strings: number;
  bank: BatteryBankSizing;
}

/** The autonomy-sized bank and up to `extra` more strings, each kept only when every battery check that does not depend on the array passes. */
export function bankOptions(
  base: KitPlanInput,
  battery: BatteryPart,
  load: LoadSummary,
  inverter: InverterPart | null,
  extra: number,
): { options: BankOption[]; failed: number } {
  const { site, design, systemVoltageV } = base;
  const floorC = design.batteryMinTempC ?? -Infinity;
  const batteryTempC = Math.min(...site.months.map((m) => Math.max((m.tMinC + m.tMaxC) / 2, floorC)));
  const coldestBatteryC = Math.max(Math.min(...site.months.map((m) => m.tMinC)), floorC);
  const sizing = {
    battery,
    systemVoltageV,
    dailyLoadWh: load.maxDailyWh,
    autonomyDays: design.autonomyDays,
    maxDepthOfDischargePct: design.maxDepthOfDischargePct,
    batteryTempC,
  };
  const first = sizeBatteryBank(sizing).stringsInParallel;
  const inverterEfficiency = inverter ? inverter.efficiencyPct / 100 : 1;
  const peakDischargeA = (load.peakAcW / inverterEfficiency + load.peakDcW) / systemVoltageV;
  const options: BankOption[] = [];
  let failed = 0;
  for (let strings = first; strings <= Math.min(first + extra, MAX_BATTERY_STRINGS); strings++) {
    const bank = sizeBatteryBank({ ...sizing, stringsInParallel: strings });
    const checks = [
      batteryArrangementCheck(bank, battery, systemVoltageV),
      batteryCapacityCheck(bank, design.autonomyDays, load.maxDailyWh),
      depthOfDischargeCheck(battery, design.maxDepthOfDischargePct),
      parallelStringsCheck(bank, battery),
      batteryColdCheck(battery, bank, coldestBatteryC),
      dischargeRateCheck(battery, bank, peakDischargeA),
    ];
    if (checks.some((c) => c.status === "fail")) failed += 1;
    else options.push({ strings, bank });
  }
  return { options, failed };
}
