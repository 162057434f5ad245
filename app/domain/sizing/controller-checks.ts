// Checks on the charge controller: battery voltage, current and PV power within its ratings.
import type { PlanCheck } from "./checks";
import { figure } from "./checks";
import { fmt } from "./format";
import type { ControllerPart, SystemVoltage } from "./parts";
import type { LayoutEvaluation } from "./string-layout";

export function controllerVoltageCheck(controller: ControllerPart, systemVoltageV: SystemVoltage): PlanCheck {
  const ok = controller.batteryVoltagesV.includes(systemVoltageV);
  return {
    id: "controller.battery-voltage",
    kind: "safety",
    status: ok ? "pass" : "fail",
    title: "Controller suits the battery voltage",
    sentence: ok
      ? `The controller is made for ${systemVoltageV} V batteries.`
      : `The controller is made for ${controller.batteryVoltagesV.join(" / ")} V batteries, not ${systemVoltageV} V: choose another controller or system voltage.`,
    figures: [figure("System voltage", systemVoltageV, "V")],
    basis: "Controller datasheet battery voltages.",
  };
}

export function controllerCurrentCheck(controller: ControllerPart, layout: LayoutEvaluation, systemVoltageV: SystemVoltage): PlanCheck {
  const isMppt = controller.kind === "mppt";
  const currentA = layout.controllerOutputCurrentA;
  const rating = controller.maxChargeCurrentA;
  let sentence: string;
  if (isMppt) {
    sentence =
      layout.currentStatus === "pass"
        ? `At full sun the array pushes about ${fmt(currentA)} A into the ${systemVoltageV} V battery; with 25 % in hand for cold bright days that is within the controller's ${rating} A.`
        : layout.currentStatus === "warn"
          ? `At full sun the array pushes about ${fmt(currentA)} A, within the controller's ${rating} A, but not with 25 % in hand: it will clip on cold bright days.`
          : `At full sun the array could push ${fmt(currentA)} A, more than the controller's ${rating} A: it will clip the power every sunny day. Use a larger controller or a smaller array.`;
  } else {
    sentence =
      layout.currentStatus === "pass"
        ? `The PWM controller passes the array's current straight through: 1.25 × Isc × ${layout.stringsInParallel} string(s) = ${fmt(currentA)} A, within its ${rating} A.`
        : `The PWM controller passes the array's current straight through: 1.25 × Isc × ${layout.stringsInParallel} string(s) = ${fmt(currentA)} A, more than its ${rating} A. It can overheat: use a larger controller or fewer strings on it.`;
  }
  return {
    id: "controller.current",
    // A tracker limits its own output; a PWM switch does not and overheats.
    kind: isMppt ? "performance" : "safety",
    status: layout.currentStatus,
    title: "Controller current",
    sentence,
    figures: [
      figure(isMppt ? "Output current at the array's STC power" : "1.25 × Isc × strings", currentA, "A"),
      ...(isMppt ? [figure("With 25 % in hand", 1.25 * currentA, "A")] : []),
      figure("Controller rating", rating, "A"),
    ],
    basis: isMppt
      ? "Array STC power × controller efficiency ÷ system voltage, with a 1.25 factor for cold bright days (common practice, no source)."
      : "1.25 × Isc per string (NEC 690.8(A)(1)).",
  };
}

/** MPPT only: the array's STC power within the controller's rated PV power at this battery voltage. */
export function controllerPowerCheck(controller: ControllerPart, layout: LayoutEvaluation, systemVoltageV: SystemVoltage): PlanCheck {
  const ratedW = controller.maxPvPowerW[String(systemVoltageV)];
  const sentence =
    ratedW === undefined
      ? `The controller gives no PV power rating for ${systemVoltageV} V batteries.`
      : layout.powerOk
        ? `${fmt(layout.arrayStcPowerW, 0)} W of modules is within the controller's rated ${ratedW} W at ${systemVoltageV} V.`
        : `${fmt(layout.arrayStcPowerW, 0)} W of modules is more than the controller's rated ${ratedW} W at ${systemVoltageV} V: use a larger controller or split the array between two.`;
  return {
    id: "controller.pv-power",
    kind: "performance",
    status: layout.powerOk ? "pass" : "fail",
    title: "PV power on the controller",
    sentence,
    figures: [figure("Array power at STC", layout.arrayStcPowerW, "W"), ...(ratedW === undefined ? [] : [figure("Controller's rated PV power", ratedW, "W")])],
    basis: "Controller datasheet PV power rating for the battery voltage.",
  };
}
