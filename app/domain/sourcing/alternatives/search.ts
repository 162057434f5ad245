// Kit alternatives: every combination of the team's offered parts, string layout and battery bank that
// could meet the plan's checks, ranked by total landed cost. Work done once (per site and part) lives
// in precompute.ts; the inner loop is twelve divisions for the module count, a few multiplications for
// the controller's current and power limits and the array's area, and four integer additions for the
// cost. Per string length it tries the fewest strings the worst month needs and a few more, since a
// bigger array is what brings the simulated year's unmet-load days within the plan's target. The
// cheapest candidates are then re-planned in full with planKit and a kit that fails a check or misses
// the target is dropped (meets-plan.ts). Pruning skips only what cannot be a cheaper valid kit: dearer
// offers of the same part at the same quantity, and parts or layouts that fail a check whatever else is
// chosen.
import { preparePlanSite, type PreparedPlanSite } from "../../sizing/kit-plan";
import { arrayAreaM2, knownModuleAreaM2 } from "../../sizing/area-check";
import { PV_MAX_CURRENT_FACTOR } from "../../sizing/fuses";
import { bankOptions, chargeVoltageV, loadOptions, modulePair, usableControllers, voltageValidSeries } from "./precompute";
import { PartPrices } from "./price-table";
import { buildAlternatives, DEFAULT_MAX_FULL_CHECKS } from "./report";
import { TopList, type Candidate } from "./top-list";
import type { AlternativesInput, AlternativesResult } from "./types";

export const DEFAULT_EXTRA_BATTERY_STRINGS = 2;
/** Parallel strings tried beyond the fewest the worst month needs, per string length. */
export const DEFAULT_EXTRA_ARRAY_STRINGS = 2;
/** The plan form's limits (app/lib/plan-choices.ts): a kit beyond them could not be applied. */
export const MAX_STRINGS_IN_PARALLEL = 100;

const NO_PRICE = "Candidates with no price in the quoting currency (an exchange rate is missing)";
const OVER_LIMIT = "Layouts over the controller's charge current or rated PV power";
const NO_STRING = "Module–controller pairs with no string length inside the voltage limits";
const TOO_MANY_STRINGS = "Layouts with more than 100 strings in parallel (beyond what a plan takes)";
const BANK_FAILS = "Battery banks that fail a battery check (arrangement, cold, discharge rate…)";
const OVER_AREA = "Layouts whose modules cover more than the largest array area the site allows";

export function searchAlternatives(
  input: AlternativesInput,
  prepared: PreparedPlanSite = preparePlanSite(input.base.site, input.base.yieldOptions),
): AlternativesResult {
  const { base } = input;
  const { design, systemVoltageV } = base;
  const pruned = new Map<string, number>();
  const prune = (reason: string, count = 1) => pruned.set(reason, (pruned.get(reason) ?? 0) + count);

  const options = loadOptions(base, input.inverters, prune);
  const controllers = usableControllers(base, input.controllers, prune);
  const pairs = controllers.map((c) => input.modules.map((m) => modulePair(prepared, base, m, c)));
  const modulePrices = input.modules.map((m) => new PartPrices(m.offers));
  const controllerCosts = controllers.map((c) => new PartPrices(c.offers).costAt(1));
  const batteryPrices = input.batteries.map((b) => new PartPrices(b.offers));
  const top = new TopList(input.maxFullChecks ?? DEFAULT_MAX_FULL_CHECKS);
  const marginFactor = 1 + design.designMarginPct / 100;
  const extraStrings = input.extraArrayStrings ?? DEFAULT_EXTRA_ARRAY_STRINGS;
  const maxAreaM2 = design.maxArrayAreaM2;
  const moduleAreas = input.modules.map((m) => (maxAreaM2 === undefined ? null : knownModuleAreaM2(m.part)));
  const required = new Float64Array(12);
  let considered = 0;
  let dominated = 0;

  options.forEach((option) => {
    const ii = option.inverter ? input.inverters.indexOf(option.inverter) : -1;
    const inverterCost = option.inverter ? new PartPrices(option.inverter.offers).costAt(1) : 0;
    const inverterOffers = option.inverter ? option.inverter.offers.length : 1;
    const loadWh = option.load.months.map((m) => m.totalWhPerDay);
    input.batteries.forEach((battery, bi) => {
      const rt = battery.part.roundTripEfficiencyPct / 100;
      for (let m = 0; m < 12; m++) required[m] = (loadWh[m] / rt) * marginFactor;
      const banks = bankOptions(base, battery.part, option.load, option.inverter?.part ?? null, input.extraBatteryStrings ?? DEFAULT_EXTRA_BATTERY_STRINGS);
      if (banks.failed > 0) prune(BANK_FAILS, banks.failed);
      const bankCosts = banks.options.map((o) => batteryPrices[bi].costAt(o.bank.batteryCount));
      const cv = chargeVoltageV(base, battery.part);
      controllers.forEach((controller, ci) => {
        const c = controller.part;
        const isMppt = c.kind === "mppt";
        const ratedPowerW = c.maxPvPowerW[String(systemVoltageV)];
        const fixedCost = inverterCost + controllerCosts[ci];
        pairs[ci].forEach((pair, mi) => {
          const series = voltageValidSeries(pair, base, cv);
          if (series.length === 0) return prune(NO_STRING);
          // Modules the worst month needs (array-sizing.ts), then planKit's rounding (string-layout.ts).
          let most = 0;
          for (let m = 0; m < 12; m++) {
            const energy = pair.energyWhPerDay[m];
            const need = loadWh[m] <= 0 ? 0 : energy > 0 ? required[m] / energy : -1;
            if (need > most) most = need;
          }
          const needed = Math.max(1, Math.ceil(most - 1e-9));
          const offerCombos = pair.module.offers.length * controller.offers.length * battery.offers.length * inverterOffers;
          const iscA = pair.module.part.iscA;
          const overRating = Math.max(1, pair.ratingPowerW / pair.module.part.pmaxW);
          const moduleAreaM2 = moduleAreas[mi];
          for (const ns of series) {
            const fewest = Math.ceil(needed / ns);
            for (let np = fewest; np <= fewest + extraStrings; np++) {
              if (np > MAX_STRINGS_IN_PARALLEL) {
                prune(TOO_MANY_STRINGS);
                continue;
              }
              const moduleCount = ns * np;
              considered += bankCosts.length;
              dominated += (offerCombos - 1) * bankCosts.length;
              const powerW = moduleCount * pair.ratingPowerW;
              // The same arithmetic, in the same order, as evaluateLayout (string-layout.ts).
              const overLimit = isMppt
                ? (powerW * c.efficiencyPct) / 100 / systemVoltageV > c.maxChargeCurrentA || ratedPowerW === undefined || powerW > ratedPowerW
                : PV_MAX_CURRENT_FACTOR * np * iscA * overRating > c.maxChargeCurrentA;
              if (overLimit) {
                prune(OVER_LIMIT, bankCosts.length);
                continue;
              }
              // The same test as the plan's array.area check (area-check.ts).
              if (moduleAreaM2 !== null && maxAreaM2 !== undefined && arrayAreaM2(moduleCount, moduleAreaM2) > maxAreaM2) {
                prune(OVER_AREA, bankCosts.length);
                continue;
              }
              const moduleCost = modulePrices[mi].costAt(moduleCount);
              for (let k = 0; k < bankCosts.length; k++) {
                const total = fixedCost + moduleCost + bankCosts[k];
                if (Number.isNaN(total)) {
                  prune(NO_PRICE);
                  continue;
                }
                if (!top.admits(total)) continue;
                const bank = banks.options[k].bank;
                const candidate: Candidate = {
                  totalMinor: total,
                  moduleCount,
                  modulesInSeries: ns,
                  stringsInParallel: np,
                  batteryStrings: banks.options[k].strings,
                  mi,
                  ci: input.controllers.indexOf(controller),
                  bi,
                  ii,
                  moduleCostMinor: moduleCost,
                  batteryCount: bank.batteryCount,
                  batteryCostMinor: bankCosts[k],
                };
                top.add(candidate);
              }
            }
          }
        });
      });
    });
  });

  const report = buildAlternatives(input, prepared, top.items);
  return {
    ...report,
    currency: input.currency,
    considered,
    dominatedOfferCombinations: dominated,
    pruned: [...pruned].map(([reason, count]) => ({ reason, count })),
  };
}
