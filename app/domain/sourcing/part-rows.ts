// Comparison rows for batteries, charge controllers and inverters: the landed cost for the quantity
// and the figures that decide between them. Unless a quantity is typed, each battery model is landed
// in the number that makes the bank asked for (so a 2 V cell and a 12 V block compare like for like).
import { usableEnergyKWh } from "../catalogue/derived-figures";
import { bankForModel, type BankForModel } from "./battery-need";
import type { ComparisonNeed } from "./comparison-need";
import { moneyText, offerCostRow, type MoneyText, type OfferCostRow } from "./comparison-rows";
import { costOffer, type TeamPricing } from "./offer-costing";
import type { BatteryFigures, ControllerFigures, InverterFigures, OfferFacts } from "./offer-facts";
import { controllerHeadroom, inverterHeadroom, type ControllerHeadroom, type InverterHeadroom } from "./part-headroom";
import { pricePerCycleKWh, pricePerKW, pricePerUsableKWh } from "./unit-costs";

function quantityOf(need: ComparisonNeed) {
  return need.quantity ?? 1;
}

export interface BatteryComparisonRow extends OfferCostRow {
  /** How this model makes the bank asked for; null when a fixed quantity was typed. */
  bank: BankForModel | null;
  chemistry: string;
  nominalVoltageV: number;
  capacityAh: number;
  usableDodPct: number;
  cycleLife: number;
  roundTripEfficiencyPct: number;
  usableKWhPerUnit: number;
  usableKWhTotal: number;
  pricePerUsableKWh: MoneyText | null;
  pricePerCycleKWh: MoneyText | null;
}

export function batteryRow(offer: OfferFacts, battery: BatteryFigures, need: ComparisonNeed, pricing: TeamPricing): BatteryComparisonRow {
  const bank =
    need.quantity === null
      ? bankForModel(battery, {
          bankVoltageV: need.batteryVoltageV,
          usableWh: need.bankUsableWh,
          batteryTempC: need.batteryTempC,
          maxDepthOfDischargePct: need.maxDepthOfDischargePct,
        })
      : null;
  const quantity = bank?.count ?? quantityOf(need);
  const costing = costOffer(offer.terms, quantity, pricing);
  const usableKWhPerUnit = usableEnergyKWh(battery.nominalVoltageV, battery.capacityAh, battery.usableDodPct);
  const unit = costing.unitPriceQuoting;
  const perKWh = unit ? pricePerUsableKWh(unit, usableKWhPerUnit) : null;
  const perCycle = unit ? pricePerCycleKWh(unit, usableKWhPerUnit, battery.cycleLife) : null;
  return {
    ...offerCostRow(offer, battery, costing, pricing.asOf),
    bank,
    chemistry: battery.chemistry,
    nominalVoltageV: battery.nominalVoltageV,
    capacityAh: battery.capacityAh,
    usableDodPct: battery.usableDodPct,
    cycleLife: battery.cycleLife,
    roundTripEfficiencyPct: battery.roundTripEfficiencyPct,
    usableKWhPerUnit,
    usableKWhTotal: usableKWhPerUnit * quantity,
    pricePerUsableKWh: perKWh ? moneyText(perKWh) : null,
    pricePerCycleKWh: perCycle ? moneyText(perCycle) : null,
  };
}

export interface ControllerComparisonRow extends OfferCostRow, ControllerHeadroom {
  kind: string;
  maxPvVocV: number;
  maxChargeCurrentA: number;
  batteryVoltagesV: number[];
}

export function controllerRow(offer: OfferFacts, controller: ControllerFigures, need: ComparisonNeed, pricing: TeamPricing): ControllerComparisonRow {
  const costing = costOffer(offer.terms, quantityOf(need), pricing);
  return {
    ...offerCostRow(offer, controller, costing, pricing.asOf),
    ...controllerHeadroom(controller, need.arrayPowerW, need.batteryVoltageV),
    kind: controller.kind,
    maxPvVocV: controller.maxPvVocV,
    maxChargeCurrentA: controller.maxChargeCurrentA,
    batteryVoltagesV: controller.batteryVoltagesV,
  };
}

export interface InverterComparisonRow extends OfferCostRow, InverterHeadroom {
  continuousW: number;
  surgeW: number;
  dcInputVoltageV: number;
  efficiencyPct: number;
  idleDrawW: number;
  pricePerKW: MoneyText | null;
}

export function inverterRow(offer: OfferFacts, inverter: InverterFigures, need: ComparisonNeed, pricing: TeamPricing): InverterComparisonRow {
  const costing = costOffer(offer.terms, quantityOf(need), pricing);
  const unit = costing.unitPriceQuoting;
  const perKW = unit ? pricePerKW(unit, inverter.continuousW) : null;
  return {
    ...offerCostRow(offer, inverter, costing, pricing.asOf),
    ...inverterHeadroom(inverter, need.peakAcLoadW, need.batteryVoltageV),
    continuousW: inverter.continuousW,
    surgeW: inverter.surgeW,
    dcInputVoltageV: inverter.dcInputVoltageV,
    efficiencyPct: inverter.efficiencyPct,
    idleDrawW: inverter.idleDrawW,
    pricePerKW: perKW ? moneyText(perKW) : null,
  };
}
