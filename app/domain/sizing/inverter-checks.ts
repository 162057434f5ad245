// Checks on the inverter: present when there are AC loads, DC input matching the battery, continuous
// rating over the peak simultaneous AC load with a margin, surge rating over the largest surge.
import type { LoadSummary } from "../load/load-sheet-types";
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt } from "./format";
import type { InverterPart, SystemVoltage } from "./parts";

export const DEFAULT_INVERTER_MARGIN_PCT = 25;

export function inverterChecks(inverter: InverterPart | null, load: LoadSummary, systemVoltageV: SystemVoltage, marginPct: number): PlanCheck[] {
  if (!inverter) {
    return [
      {
        id: "inverter.present",
        kind: "performance",
        status: load.hasAcLoad ? "fail" : "pass",
        title: "Inverter",
        sentence: load.hasAcLoad
          ? `The load sheet has AC appliances (${fmt(load.peakAcW, 0)} W at once) but no inverter was chosen.`
          : "All loads are DC: no inverter is needed.",
        figures: [figure("Peak AC load", load.peakAcW, "W")],
        basis: "Load sheet.",
      },
    ];
  }
  const checks: PlanCheck[] = [];
  const voltageOk = inverter.dcInputVoltageV === systemVoltageV;
  checks.push({
    id: "inverter.dc-voltage",
    kind: "safety",
    status: voltageOk ? "pass" : "fail",
    title: "Inverter DC input",
    sentence: voltageOk
      ? `The inverter takes ${systemVoltageV} V DC, the bank's voltage.`
      : `The inverter takes ${inverter.dcInputVoltageV} V DC but the bank is ${systemVoltageV} V: connecting it can destroy the inverter. Choose a ${systemVoltageV} V inverter.`,
    figures: [figure("Inverter DC input", inverter.dcInputVoltageV, "V"), figure("System voltage", systemVoltageV, "V")],
    basis: "Inverter datasheet.",
  });
  const neededW = load.peakAcW * (1 + marginPct / 100);
  let status: PlanCheck["status"] = "pass";
  let sentence = `${inverter.continuousW} W continuous covers the ${fmt(load.peakAcW, 0)} W of AC loads that may run at once, with ${fmt(marginPct, 0)} % in hand.`;
  if (inverter.continuousW < load.peakAcW) {
    status = "fail";
    sentence = `${inverter.continuousW} W continuous is less than the ${fmt(load.peakAcW, 0)} W of AC loads that may run at once: it will shut down. Choose at least ${fmt(neededW, 0)} W or stagger the loads.`;
  } else if (inverter.continuousW < neededW) {
    status = "warn";
    sentence = `${inverter.continuousW} W continuous covers the ${fmt(load.peakAcW, 0)} W peak, but without the ${fmt(marginPct, 0)} % margin (${fmt(neededW, 0)} W): it will run hot and near its limit.`;
  }
  if (!load.hasAcLoad) sentence = "There are no AC loads; the inverter only adds its idle draw.";
  checks.push({
    id: "inverter.continuous",
    kind: "performance",
    status: load.hasAcLoad ? status : "pass",
    title: "Inverter continuous power",
    sentence,
    figures: [figure("Peak AC load", load.peakAcW, "W"), figure("Needed with margin", neededW, "W"), figure("Inverter continuous", inverter.continuousW, "W")],
    basis: `Continuous rating ≥ peak simultaneous AC load × ${fmt(1 + marginPct / 100, 2)} (common practice, no source).`,
  });
  const surge = load.largestSurge;
  if (surge) {
    let surgeStatus: PlanCheck["status"] = "pass";
    let surgeSentence = `${inverter.surgeW} W of surge starts the ${surge.appliance} (${fmt(surge.surgeW, 0)} W) even with everything else running (${fmt(surge.startingDemandW, 0)} W).`;
    if (inverter.surgeW < surge.surgeW) {
      surgeStatus = "fail";
      surgeSentence = `${inverter.surgeW} W of surge cannot start the ${surge.appliance}, which needs ${fmt(surge.surgeW, 0)} W for a moment: choose an inverter with more surge power or a soft starter.`;
    } else if (inverter.surgeW < surge.startingDemandW) {
      surgeStatus = "warn";
      surgeSentence = `${inverter.surgeW} W of surge starts the ${surge.appliance} (${fmt(surge.surgeW, 0)} W) alone, but not with every other AC load running (${fmt(surge.startingDemandW, 0)} W).`;
    }
    checks.push({
      id: "inverter.surge",
      kind: "performance",
      status: surgeStatus,
      title: "Inverter surge power",
      sentence: surgeSentence,
      figures: [
        figure("Largest surge", surge.surgeW, "W"),
        figure("Surge with other loads running", surge.startingDemandW, "W"),
        figure("Inverter surge", inverter.surgeW, "W"),
      ],
      basis: "Surge rating ≥ the largest starting surge (load sheet).",
    });
  }
  return checks;
}
