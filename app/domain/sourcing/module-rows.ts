// One row of the module comparison: an offer priced per nameplate watt and per verified watt (the
// median of the catalogue's approved field readings), and the modules and roof area the energy
// target needs with that module's power — the verified power where readings exist, else nameplate.
import { arrayAreaM2, modulesNeeded, requiredArrayPowerW } from "./array-need";
import type { ComparisonNeed } from "./comparison-need";
import { moneyText, offerCostRow, type MoneyText, type OfferCostRow } from "./comparison-rows";
import { costOffer, type TeamPricing } from "./offer-costing";
import type { ModuleFigures, OfferFacts } from "./offer-facts";
import { pricePerWatt } from "./unit-costs";

export interface ModuleComparisonRow extends OfferCostRow {
  nameplateW: number;
  verifiedW: number | null;
  readingCount: number;
  verifiedRatio: number | null;
  nameplateDensityWm2: number;
  measuredDensityWm2: number | null;
  moduleAreaM2: number;
  /** Which power counted the modules: verified where readings exist, otherwise nameplate. */
  powerBasis: "verified" | "nameplate";
  /** STC array power the energy target asks for, W (null when a fixed quantity was given). */
  requiredArrayW: number | null;
  areaNeededM2: number;
  pricePerNameplateW: MoneyText | null;
  pricePerVerifiedW: MoneyText | null;
}

export function hasVerifiedPower(module: Pick<ModuleFigures, "verifiedPmaxW" | "verifiedReadingCount">): module is ModuleFigures & { verifiedPmaxW: number } {
  return module.verifiedReadingCount > 0 && module.verifiedPmaxW !== null && module.verifiedPmaxW > 0;
}

export function moduleRow(offer: OfferFacts, module: ModuleFigures, need: ComparisonNeed, pricing: TeamPricing): ModuleComparisonRow {
  const verified = hasVerifiedPower(module) ? module.verifiedPmaxW : null;
  const powerUsedW = verified ?? module.pmaxW;
  const requiredArrayW = need.quantity === null ? requiredArrayPowerW(need.arrayEnergyWhPerDay, need.sunHoursPerDay, need.systemLossesPct) : null;
  const quantity = need.quantity ?? modulesNeeded(requiredArrayW!, powerUsedW);
  const costing = costOffer(offer.terms, quantity, pricing);
  const unit = costing.unitPriceQuoting;
  const perNameplate = unit ? pricePerWatt(unit, module.pmaxW) : null;
  const perVerified = unit && verified !== null ? pricePerWatt(unit, verified) : null;
  return {
    ...offerCostRow(offer, module, costing, pricing.asOf),
    nameplateW: module.pmaxW,
    verifiedW: verified,
    readingCount: module.verifiedReadingCount,
    verifiedRatio: verified !== null ? module.verifiedRatio : null,
    nameplateDensityWm2: module.nameplateDensityWm2,
    measuredDensityWm2: verified !== null ? module.measuredDensityWm2 : null,
    moduleAreaM2: module.areaM2,
    powerBasis: verified !== null ? "verified" : "nameplate",
    requiredArrayW,
    areaNeededM2: arrayAreaM2(quantity, module.areaM2),
    pricePerNameplateW: perNameplate ? moneyText(perNameplate) : null,
    pricePerVerifiedW: perVerified ? moneyText(perVerified) : null,
  };
}
