// Inputs and outputs of a kit plan (planKit in kit-plan.ts).
import type { Appliance, LoadSummary } from "../load/load-sheet-types";
import type { LossesPct } from "../solar/losses";
import type { SiteInput, YieldOptions, YieldResult } from "../solar/yield-types";
import type { BatteryBankSizing } from "./battery-bank";
import type { CableRunSizing } from "./cables";
import type { PlanCheck } from "./checks";
import type { ConductorSystem } from "./conductors";
import type { BatteryPart, ControllerPart, InverterPart, ModulePart, SystemVoltage } from "./parts";
import type { LayoutEvaluation, StringLayout } from "./string-layout";
import type { YearSimulation } from "./year-simulation";

export interface PlanSite extends SiteInput {
  /** Coldest air temperature expected at the site (a record-low morning), °C: sets the string's Voc. */
  coldestTempC: number;
  /** Hottest air temperature expected, °C; the hottest month's mean daily maximum when absent. */
  hottestTempC?: number;
  /** Share of the array's energy lost to shade, % (0 when unshaded). */
  shadingDeratePct?: number;
}

export interface CableRunInput {
  oneWayLengthM: number;
  /** Overrides the plan's voltage-drop target for this run, %. */
  voltageDropTargetPct?: number;
}

export interface DesignChoices {
  autonomyDays: number;
  /** Upper limit on depth of discharge, %; the battery's usable depth applies when lower. */
  maxDepthOfDischargePct?: number;
  /** Extra array energy over the worst month's need, % (e.g. 20). */
  designMarginPct: number;
  /** Size the array on the module's nameplate power or on its verified (field-read) power. */
  powerBasis: "nameplate" | "verified";
  /** Voltage-drop target for every run unless a run says otherwise, % (3 is usual for PV). */
  voltageDropTargetPct: number;
  conductorSystem: ConductorSystem;
  cableRuns: {
    arrayToController: CableRunInput;
    controllerToBattery: CableRunInput;
    /** Needed when there is an inverter. */
    batteryToInverter?: CableRunInput;
  };
  lossesPct: LossesPct;
  /** Inverter continuous rating over the peak AC load, % (default 25). */
  inverterMarginPct?: number;
  /** Volts an MPPT string must keep above the battery's charging voltage (default 5). */
  mpptHeadroomV?: number;
  /** Use this string layout instead of the one the plan picks. */
  forcedLayout?: StringLayout;
  /** Use this many parallel battery strings instead of the computed number. */
  forcedBatteryStrings?: number;
  /** The battery never gets colder than this (a heated room), °C; otherwise it follows the air. */
  batteryMinTempC?: number;
  /** Hours a day the inverter is on in months with AC loads (default 24). */
  inverterOnHoursPerDay?: number;
  /** Unmet-load days a year the customer accepts (default 0). */
  acceptableUnmetDaysPerYear?: number;
  /** Largest array area the site allows (roof, yard), m²; no limit when absent. */
  maxArrayAreaM2?: number;
  simulation?: { seed?: number; dayToDayCorrelation?: number };
}

export interface KitPlanInput {
  site: PlanSite;
  appliances: readonly Appliance[];
  systemVoltageV: SystemVoltage;
  parts: {
    module: ModulePart;
    controller: ControllerPart;
    battery: BatteryPart;
    inverter: InverterPart | null;
  };
  design: DesignChoices;
  yieldOptions?: YieldOptions;
}

export interface ArrayMonth {
  month: number;
  /** One module's energy to the battery bus on the month's average day, after shading, Wh. */
  energyPerModuleWhPerDay: number;
  loadWhPerDay: number;
  /** What the array must deliver: load ÷ battery round-trip efficiency × (1 + margin), Wh/day. */
  requiredArrayWhPerDay: number;
  /**
   * Share of the engine's energy the chosen string's voltage lets through this month (1 = all; below 1
   * when the string is too short to charge well, string-voltage-harvest.ts). Absent in plans saved before.
   */
  voltageFactor?: number;
  /** Modules this month alone would need (fractional; null when there is no usable energy and some load). */
  modulesNeeded: number | null;
  /** Energy of the chosen array, Wh/day. */
  arrayWhPerDay: number;
  /** Chosen array's energy ÷ what is required (1 = exactly enough with the margin). */
  coverage: number | null;
}

export interface ArrayPlan {
  powerBasisUsed: "nameplate" | "verified";
  /** Module power the energy was computed with, W at STC. */
  modulePmaxUsedW: number;
  months: ArrayMonth[];
  /** Month (1–12) that sets the module count; null with no load. */
  designMonth: number | null;
  modulesRequired: number;
  layouts: LayoutEvaluation[];
  layout: LayoutEvaluation;
  layoutForced: boolean;
  coldestAirC: number;
  hotCellC: number;
  chargeVoltageV: number;
}

export interface InverterPlan {
  continuousW: number;
  surgeW: number;
  /** Peak simultaneous AC load × (1 + margin), W. */
  continuousNeededW: number;
  peakAcW: number;
  largestSurgeW: number;
  startingDemandW: number;
  /** Highest DC current the inverter can draw (continuous rating at the cut-out voltage), A. */
  maxDcCurrentA: number;
}

export interface ProtectionItem {
  id: string;
  where: string;
  ratingA: number | null;
  count: number;
  basis: string;
}

export interface KitPlan {
  systemVoltageV: SystemVoltage;
  load: LoadSummary;
  /** The engine's monthly figures for one module (before shading), for charts. */
  moduleYield: YieldResult;
  array: ArrayPlan;
  battery: BatteryBankSizing & { monthlyTempC: number[]; monthlyUsableWh: number[] };
  inverter: InverterPlan | null;
  cables: CableRunSizing[];
  protection: ProtectionItem[];
  simulation: YearSimulation;
  checks: PlanCheck[];
  assumptions: string[];
  cautions: string[];
}
