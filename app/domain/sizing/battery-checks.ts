// Checks on the battery bank: arrangement, capacity for the autonomy, depth of discharge, parallel
// strings, cold, discharge rate (Peukert) and charge rate.
import type { BatteryBankSizing } from "./battery-bank";
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { LITHIUM_MIN_CHARGE_TEMP_C, TYPICAL_PEUKERT_EXPONENT } from "./chemistry";
import { fmt } from "./format";
import type { BatteryPart, SystemVoltage } from "./parts";
import { CHEMISTRY_LABELS, isLeadAcid } from "./parts";
import { peukertDeliveredCapacityAh, peukertRuntimeH } from "./peukert";

/** More parallel lead-acid strings than this share current unevenly (common practice, no source). */
export const MAX_LEAD_ACID_PARALLEL_STRINGS = 3;

export function batteryArrangementCheck(bank: BatteryBankSizing, battery: BatteryPart, systemVoltageV: SystemVoltage): PlanCheck {
  return {
    id: "battery.arrangement",
    kind: "safety",
    status: bank.seriesExact ? "pass" : "fail",
    title: "Battery voltage adds up",
    sentence: bank.seriesExact
      ? `${bank.batteriesInSeries} × ${battery.nominalVoltageV} V in series make the ${systemVoltageV} V bank, ${bank.stringsInParallel} string(s) in parallel.`
      : `${battery.nominalVoltageV} V batteries cannot be put in series to make ${systemVoltageV} V: choose batteries whose voltage divides it.`,
    figures: [
      figure("Battery voltage", battery.nominalVoltageV, "V"),
      figure("In series", bank.batteriesInSeries, ""),
      figure("Strings in parallel", bank.stringsInParallel, ""),
      figure("Batteries", bank.batteryCount, ""),
    ],
    basis: "Series voltages add.",
  };
}

export function batteryCapacityCheck(bank: BatteryBankSizing, autonomyDays: number, dailyLoadWh: number): PlanCheck {
  const achieved = bank.autonomyDaysAchieved;
  let status: PlanCheck["status"] = "pass";
  let sentence = `The bank's ${fmt(bank.bankUsableWh / 1000, 2)} kWh of usable energy carries the heaviest month's ${fmt(dailyLoadWh / 1000, 2)} kWh/day for ${achieved === null ? "any number of" : fmt(achieved)} days (target ${fmt(autonomyDays)}).`;
  if (achieved !== null && achieved < autonomyDays - 1e-9) {
    status = achieved >= 1 ? "warn" : "fail";
    sentence = `The bank's ${fmt(bank.bankUsableWh / 1000, 2)} kWh of usable energy lasts ${fmt(achieved)} days without sun, short of the ${fmt(autonomyDays)} days asked for (${Math.ceil(bank.requiredAh / (bank.bankAh / bank.stringsInParallel))} strings are needed).`;
  }
  return {
    id: "battery.capacity",
    kind: "performance",
    status,
    title: "Days without sun",
    sentence,
    figures: [
      figure("Daily load (heaviest month)", dailyLoadWh, "Wh/day"),
      figure("Depth of discharge used", bank.effectiveDodPct, "%"),
      figure("Capacity left in the cold", 100 * bank.temperatureFactor, "%"),
      figure("Required capacity", bank.requiredAh, "Ah"),
      figure("Bank capacity", bank.bankAh, "Ah"),
      figure("Usable energy", bank.bankUsableWh, "Wh"),
    ],
    basis: "Load × autonomy days ÷ (depth of discharge × temperature factor) ÷ system voltage.",
  };
}

export function depthOfDischargeCheck(battery: BatteryPart, maxDepthOfDischargePct: number | undefined): PlanCheck {
  const over = maxDepthOfDischargePct !== undefined && maxDepthOfDischargePct > battery.usableDodPct;
  return {
    id: "battery.depth-of-discharge",
    kind: "advisory",
    status: over ? "warn" : "pass",
    title: "Depth of discharge",
    sentence: over
      ? `The design allows ${fmt(maxDepthOfDischargePct, 0)} % but the battery's usable depth of discharge is ${fmt(battery.usableDodPct, 0)} %: the battery's figure is used.`
      : `The bank is cycled to ${fmt(Math.min(battery.usableDodPct, maxDepthOfDischargePct ?? battery.usableDodPct), 0)} % depth of discharge, within the battery's ${fmt(battery.usableDodPct, 0)} %.`,
    figures: [
      figure("Battery's usable depth", battery.usableDodPct, "%"),
      ...(maxDepthOfDischargePct === undefined ? [] : [figure("Design limit", maxDepthOfDischargePct, "%")]),
    ],
    basis: "Battery datasheet; lead-acid about 50 %, LiFePO4 80–90 % for daily cycling (common practice, no source).",
  };
}

export function parallelStringsCheck(bank: BatteryBankSizing, battery: BatteryPart): PlanCheck {
  const leadAcid = isLeadAcid(battery.chemistry);
  const many = leadAcid && bank.stringsInParallel > MAX_LEAD_ACID_PARALLEL_STRINGS;
  return {
    id: "battery.parallel-strings",
    kind: "advisory",
    status: many ? "warn" : "pass",
    title: "Parallel battery strings",
    sentence: many
      ? `${bank.stringsInParallel} lead-acid strings in parallel share current unevenly and wear out unevenly: prefer fewer, larger cells (for example 2 V cells in one string).`
      : leadAcid
        ? `${bank.stringsInParallel} string(s) in parallel.`
        : `${bank.stringsInParallel} string(s) in parallel; give each lithium string its own fuse and let the battery management systems agree.`,
    figures: [figure("Strings in parallel", bank.stringsInParallel, "")],
    basis: `At most ${MAX_LEAD_ACID_PARALLEL_STRINGS} parallel lead-acid strings (common practice, no source).`,
  };
}

export function batteryColdCheck(battery: BatteryPart, bank: BatteryBankSizing, coldestBatteryC: number): PlanCheck {
  const label = CHEMISTRY_LABELS[battery.chemistry];
  if (!isLeadAcid(battery.chemistry)) {
    const cold = coldestBatteryC <= LITHIUM_MIN_CHARGE_TEMP_C;
    return {
      id: "battery.cold",
      kind: "safety",
      status: cold ? "warn" : "pass",
      title: "Charging in the cold",
      sentence: cold
        ? `${label} must not be charged below 0 °C and the battery may reach ${fmt(coldestBatteryC, 0)} °C: use a battery management system with a low-temperature charge cut-off, or a heated enclosure.`
        : `The battery stays above 0 °C (coldest ${fmt(coldestBatteryC, 0)} °C), so it can be charged all year.`,
      figures: [
        figure("Coldest battery temperature", coldestBatteryC, "°C"),
        figure("Capacity left at the design temperature", 100 * bank.temperatureFactor, "%"),
      ],
      basis: "No charging of lithium cells below 0 °C (common practice, no source).",
    };
  }
  return {
    id: "battery.cold",
    kind: "advisory",
    status: "pass",
    title: "Capacity in the cold",
    sentence: `At ${fmt(bank.batteryTempC, 0)} °C a ${label} battery gives about ${fmt(100 * bank.temperatureFactor, 0)} % of its rated capacity; the bank was sized for that. Keep it charged in frost: a flat lead-acid battery can freeze.`,
    figures: [figure("Design battery temperature", bank.batteryTempC, "°C"), figure("Capacity left", 100 * bank.temperatureFactor, "%")],
    basis: "About 0.9 % of capacity lost per °C below 25 °C (from memory, common practice).",
  };
}

/** Peukert-aware note on the heaviest draw. */
export function dischargeRateCheck(battery: BatteryPart, bank: BatteryBankSizing, peakCurrentA: number): PlanCheck {
  const k = battery.peukertExponent ?? TYPICAL_PEUKERT_EXPONENT[battery.chemistry];
  const ratedCurrentA = bank.bankAh / battery.capacityHourRateH;
  const runtimeH = peukertRuntimeH(bank.bankAh, battery.capacityHourRateH, peakCurrentA, k);
  const deliveredAh = peukertDeliveredCapacityAh(bank.bankAh, battery.capacityHourRateH, peakCurrentA, k);
  const deliveredPct = (100 * deliveredAh) / bank.bankAh;
  const leadAcid = isLeadAcid(battery.chemistry);
  let status: PlanCheck["status"] = "pass";
  let sentence: string;
  if (peakCurrentA <= ratedCurrentA) {
    sentence = `The heaviest draw, ${fmt(peakCurrentA)} A, is gentler than the rated ${battery.capacityHourRateH} h rate (${fmt(ratedCurrentA)} A): the full rated capacity is available.`;
  } else {
    sentence = `At the heaviest draw, ${fmt(peakCurrentA)} A, the bank would empty in ${fmt(runtimeH)} h by Peukert's law (k = ${k}), giving about ${fmt(deliveredPct, 0)} % of its rated ${fmt(bank.bankAh, 0)} Ah.`;
    const tooFast = leadAcid ? deliveredPct < 80 : peakCurrentA > bank.bankAh;
    if (tooFast) {
      status = "warn";
      sentence += leadAcid
        ? " Heavy loads take a large bite out of a lead-acid bank: a larger bank, or running them in sunshine, helps."
        : " That is more than 1 C: check the battery's maximum discharge current.";
    }
  }
  return {
    id: "battery.discharge-rate",
    kind: "advisory",
    status,
    title: "Heavy discharge",
    sentence,
    figures: [
      figure("Heaviest draw", peakCurrentA, "A"),
      figure("Current at the rated hour rate", ratedCurrentA, "A"),
      figure("Peukert exponent", k, ""),
      figure("Hours to empty at the heaviest draw", runtimeH, "h"),
      figure("Capacity delivered at that draw", deliveredAh, "Ah"),
    ],
    basis: "Peukert: t = H·(C/(I·H))^k; k from the datasheet or typical for the chemistry (from memory).",
  };
}

/** Charge current against the bank's size (common practice, no source: lead-acid C/20…C/4, lithium ≤ 0.5 C). */
export function chargeRateCheck(battery: BatteryPart, bank: BatteryBankSizing, chargeCurrentA: number): PlanCheck {
  const rate = chargeCurrentA / bank.bankAh;
  const leadAcid = isLeadAcid(battery.chemistry);
  let status: PlanCheck["status"] = "pass";
  let sentence = `The array charges at up to ${fmt(chargeCurrentA)} A, C/${fmt(1 / rate, 0)} for this ${fmt(bank.bankAh, 0)} Ah bank.`;
  if (leadAcid && rate < 1 / 20) {
    status = "warn";
    sentence += " That is gentle for lead-acid: it may rarely reach full charge and sulphate. A larger array helps.";
  } else if (leadAcid && rate > 1 / 4) {
    status = "warn";
    sentence += " That is fast for lead-acid: check the maker's maximum charge current.";
  } else if (!leadAcid && rate > 0.5) {
    status = "warn";
    sentence += " That is above 0.5 C: check the maker's maximum charge current.";
  }
  return {
    id: "battery.charge-rate",
    kind: "advisory",
    status,
    title: "Charge rate",
    sentence,
    figures: [figure("Charge current", chargeCurrentA, "A"), figure("Bank capacity", bank.bankAh, "Ah")],
    basis: "Lead-acid C/20…C/4, lithium up to 0.5 C (common practice, no source).",
  };
}
