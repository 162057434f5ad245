// Plain-words assumptions of a kit plan and the cautions every plan shows.
import { DEFAULT_MPPT_HEADROOM_V } from "./string-layout";
import { fmt } from "./format";
import type { DesignChoices, PlanSite } from "./plan-types";
import type { ControllerPart } from "./parts";

export const PLAN_CAUTIONS: readonly string[] = [
  "This plan is an aid to design, not a design approval: the installation must follow the local electrical code and be designed, installed and signed off by a licensed person.",
  "DC arcs do not go out by themselves: use DC-rated switches, breakers and fuses for every DC circuit, and never open a DC connector under load.",
  "On a cold, bright morning the array's voltage rises above its rating: keep strings within the controller's maximum input voltage (checked above) and label the array's maximum voltage.",
  "Batteries store a lot of energy: fuse the battery cables close to the battery, with fuses whose DC breaking capacity suits the bank's short-circuit current (lithium banks can deliver very large currents).",
  "Lead-acid batteries give off hydrogen while charging: ventilate their enclosure and keep sparks away. Lithium batteries need a battery management system and must not be charged below 0 °C.",
  "PV modules produce voltage whenever light falls on them: cover them or isolate them before working on the array.",
];

export function planAssumptions(site: PlanSite, design: DesignChoices, controller: ControllerPart, hottestAirC: number, batteryTempNote: string): string[] {
  const notes: string[] = [];
  notes.push(
    `Sizing month by month: each month's load at the battery bus ÷ the battery's round-trip efficiency × (1 + ${fmt(design.designMarginPct, 0)} % margin) ÷ one module's energy; the month needing most modules sets the count.`,
  );
  if (site.shadingDeratePct)
    notes.push(`Shade: the site's shading loss of ${fmt(site.shadingDeratePct, 0)} % is taken off the unshaded figures above in every month.`);
  notes.push(`String voltage on the coldest morning at ${fmt(site.coldestTempC, 0)} °C air (cells taken at air temperature at first light).`);
  notes.push(
    `String voltage on a hot afternoon: cells at ${fmt(hottestAirC, 0)} °C air ` +
      (site.hottestTempC !== undefined ? "(the site's hottest expected temperature)" : "(the hottest month's mean daily maximum)") +
      " plus the NOCT rise at 1000 W/m²" +
      (controller.kind === "mppt" ? `; the tracker needs ${fmt(design.mpptHeadroomV ?? DEFAULT_MPPT_HEADROOM_V, 1)} V above the charging voltage.` : "."),
  );
  notes.push(batteryTempNote);
  notes.push(
    "Simulated year: daily clearness index drawn from the Bendt, Collares-Pereira & Rabl (1981) distribution for each month's mean, with a seeded generator " +
      "and day-to-day persistence; each day's array energy scales the month's average-day energy by that day's irradiation on the array " +
      "(beam and diffuse split by the Erbs et al. 1982 daily correlation). Cell temperature differences between clear and dull days are not modelled.",
  );
  notes.push(
    "Battery in the simulation: the same weather year is first run from a full battery, and again from where it ended, until a year ends where it began (at most five runs); the reported year starts from that charge " +
      "(so a winter-worst site does not start its worst months with a free full charge); one energy balance per day; all array energy passes through the battery with the round-trip loss; " +
      "energy not taken when full is dumped; load beyond the depth-of-discharge floor goes unmet. Charge-current limits within the day are not modelled.",
  );
  notes.push(
    `Cables: copper, resistance at 75 °C; voltage-drop target ${fmt(design.voltageDropTargetPct, 1)} %; ampacities before derating for heat and bundling.`,
  );
  return notes;
}
