// Kit alternatives as the page and the API show them: totals as exact decimal texts in the quoting
// currency (from integer minor units), never JavaScript floats.
import Decimal from "decimal.js";
import { formatMoney, minorDigits, money } from "~/domain/money/money";
import type { AlternativesResult, ChosenPart, CurrentKitCost } from "~/domain/sourcing/alternatives/types";

export function minorToText(minor: number, currency: string): string {
  const digits = minorDigits(currency);
  return new Decimal(minor).div(new Decimal(10).pow(digits)).toFixed(digits);
}

/** For people, as every money figure is shown: "EUR 1,234.50". */
export function minorForPeople(minor: number, currency: string): string {
  return formatMoney(money(minorToText(minor, currency), currency));
}

function partJson(p: ChosenPart, currency: string) {
  return { id: p.id, label: p.label, quantity: p.quantity, offerId: p.offerId, supplierName: p.supplierName, landedCost: minorToText(p.costMinor, currency) };
}

/** The current kit's landed total, or why it has none, in one sentence. */
export function currentKitSentence(current: CurrentKitCost, currency: string): string {
  const meets = current.meetsPlan === false ? " It does not itself meet every check and the unmet-days target of this plan." : "";
  if (current.totalMinor === null) return `Your current kit cannot be costed: ${current.problems.join("; ")}.${meets}`;
  const counts = `${current.moduleCount} modules, ${current.batteryCount} ${current.batteryCount === 1 ? "battery" : "batteries"}`;
  return `Your current kit: ${minorForPeople(current.totalMinor, currency)} at the team's cheapest offers (${counts}).${meets}`;
}

/** What a kit saves or costs more than the current kit; null when the current kit cannot be costed. */
export function againstCurrent(totalMinor: number, current: CurrentKitCost, currency: string) {
  if (current.totalMinor === null) return null;
  const diff = totalMinor - current.totalMinor;
  const amount = minorForPeople(Math.abs(diff), currency);
  return { difference: minorToText(diff, currency), words: diff < 0 ? `saves ${amount}` : diff > 0 ? `costs ${amount} more` : "same cost" };
}

export function alternativesJson(found: {
  planId: string;
  revision: number;
  result: AlternativesResult | null;
  offerCount: number;
  ratesUsed: { from: string; to: string; rate: string; asOf: string }[];
  searchMs: number;
}) {
  const r = found.result;
  if (!r) return null;
  const c = r.currency;
  return {
    planId: found.planId,
    revision: found.revision,
    currency: c,
    offersUsed: found.offerCount,
    ratesUsed: found.ratesUsed,
    considered: r.considered,
    dominatedOfferCombinations: r.dominatedOfferCombinations,
    pruned: r.pruned,
    fullChecks: r.fullChecks,
    fullCheckFailures: r.fullCheckFailures,
    overUnmetDays: r.overUnmetDays,
    acceptedUnmetDays: r.acceptedUnmetDays,
    targetNote: r.targetNote,
    currentKit: {
      landedCost: r.current.totalMinor === null ? null : minorToText(r.current.totalMinor, c),
      problems: r.current.problems,
      meetsPlan: r.current.meetsPlan,
      sentence: currentKitSentence(r.current, c),
    },
    exhausted: r.exhausted,
    searchMs: Math.round(found.searchMs * 10) / 10,
    lifetimeNote: r.lifetimeNote,
    alternatives: r.alternatives.map((a, i) => ({
      rank: i + 1,
      totalLandedCost: minorToText(a.totalMinor, c),
      againstCurrentKit: againstCurrent(a.totalMinor, r.current, c),
      costPerDeliveredKWh: a.costPerKWh,
      lifetimeYears: Math.round(a.lifetimeYears * 100) / 100,
      deliveredKWhPerYear: Math.round(a.deliveredKWhPerYear * 10) / 10,
      module: partJson(a.module, c),
      controller: partJson(a.controller, c),
      battery: partJson(a.battery, c),
      inverter: a.inverter ? partJson(a.inverter, c) : null,
      layout: a.layout,
      batteryStrings: a.batteryStrings,
      warnings: a.warnings,
      differences: a.differences,
      sameParts: a.isCurrentParts,
    })),
  };
}
