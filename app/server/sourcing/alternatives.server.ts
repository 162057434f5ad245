// Kit alternatives for a saved plan: the team's valid offers become candidate parts with exact prices
// in minor units of the quoting currency, the pure search (app/domain/sourcing/alternatives) ranks
// them, and applying one re-plans the plan with those parts and layout as a new revision.
import Decimal from "decimal.js";
import { performance } from "node:perf_hooks";
import { db } from "../db.server";
import { findBatteryPart, findControllerPart, findInverterPart, findModulePart, type NamedPart } from "../plans/catalogue-parts.server";
import { buildPlanInput } from "../plans/plan-inputs.server";
import { planFromChoices } from "../plans/plan-service.server";
import { addRevision, findPlan } from "../plans/plans.server";
import { listValidOffers, type OfferListItem } from "./offers.server";
import { loadTeamPricing } from "./settings.server";
import { minorDigits } from "~/domain/money/money";
import { missedChecks } from "~/domain/sourcing/alternatives/meets-plan";
import { searchAlternatives } from "~/domain/sourcing/alternatives/search";
import type { AlternativesResult, CandidatePart, OfferPrice } from "~/domain/sourcing/alternatives/types";
import { costOffer, type TeamPricing } from "~/domain/sourcing/offer-costing";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";
import { planChoicesSchema, type PlanChoices } from "~/lib/plan-choices";
import type { AlternativePick } from "~/lib/alternative-forms";

export interface RateUsed {
  from: string;
  to: string;
  rate: string;
  asOf: string;
}

export interface AlternativesOutcome {
  planId: string;
  planName: string;
  revision: number;
  result: AlternativesResult | null;
  /** Set when the plan cannot be searched (its saved choices no longer resolve). */
  problem: string | null;
  offerCount: number;
  ratesUsed: RateUsed[];
  searchMs: number;
  loadMs: number;
}

function offerPrice(offer: OfferListItem, pricing: TeamPricing, rates: Map<string, RateUsed>): OfferPrice {
  const scale = new Decimal(10).pow(minorDigits(pricing.quotingCurrency));
  return {
    offerId: offer.id,
    supplierName: offer.supplierName,
    costMinor(quantity) {
      const costing = costOffer(offer.terms, quantity, pricing);
      if (!costing.totalQuoting) return null;
      if (costing.rate) {
        const r = costing.rate;
        rates.set(`${r.from}>${r.to}@${r.asOf}`, { from: r.from, to: r.to, rate: r.rate.toFixed(), asOf: r.asOf });
      }
      const minor = costing.totalQuoting.amount.times(scale);
      // Rounded to the minor unit by costOffer, so this is an exact integer; refuse anything else.
      return minor.isInteger() && minor.abs().lte(Number.MAX_SAFE_INTEGER) ? minor.toNumber() : null;
    },
  };
}

async function candidates<P>(
  kind: OfferPartKind,
  teamId: string,
  find: (id: string) => Promise<NamedPart<P> | null>,
  pricing: TeamPricing,
  rates: Map<string, RateUsed>,
) {
  const offers = await listValidOffers(db, teamId, { partKind: kind, asOf: pricing.asOf });
  const byPart = new Map<string, OfferListItem[]>();
  for (const o of offers) byPart.set(o.partId, [...(byPart.get(o.partId) ?? []), o]);
  const parts = await Promise.all([...byPart.keys()].map(find));
  const out: CandidatePart<P>[] = [];
  for (const named of parts) {
    if (named) out.push({ id: named.id, label: named.label, part: named.part, offers: byPart.get(named.id)!.map((o) => offerPrice(o, pricing, rates)) });
  }
  return { parts: out, offerCount: offers.length };
}

export async function findAlternatives(teamId: string, planId: string): Promise<AlternativesOutcome | null> {
  const found = await findPlan(teamId, planId);
  if (!found) return null;
  const head = { planId: found.plan.id, planName: found.plan.name, revision: found.revision.revision };
  const empty = { ...head, result: null, offerCount: 0, ratesUsed: [], searchMs: 0, loadMs: 0 };
  const parsed = planChoicesSchema.safeParse(found.revision.choices);
  if (!parsed.success) return { ...empty, problem: "The plan's saved choices no longer read as a plan." };
  const choices = parsed.data;
  const built = await buildPlanInput(teamId, choices);
  if (!built.ok) return { ...empty, problem: Object.values(built.fields).join(" ") };
  const started = performance.now();
  const pricing = await loadTeamPricing(db, teamId);
  const rates = new Map<string, RateUsed>();
  const [modules, controllers, batteries, inverters] = await Promise.all([
    candidates("modules", teamId, findModulePart, pricing, rates),
    candidates("controllers", teamId, findControllerPart, pricing, rates),
    candidates("batteries", teamId, findBatteryPart, pricing, rates),
    candidates("inverters", teamId, findInverterPart, pricing, rates),
  ]);
  const loadMs = performance.now() - started;
  const base = built.input;
  // Every candidate may bring an inverter, so the battery-to-inverter run is always known.
  base.design.cableRuns = { ...base.design.cableRuns, batteryToInverter: { oneWayLengthM: choices.design.batteryToInverterM } };
  const searchStart = performance.now();
  const result = searchAlternatives({
    base,
    current: { moduleId: choices.moduleId, controllerId: choices.controllerId, batteryId: choices.batteryId, inverterId: choices.inverterId },
    currentLabels: built.sources.parts,
    currency: pricing.quotingCurrency,
    modules: modules.parts,
    controllers: controllers.parts,
    batteries: batteries.parts,
    inverters: inverters.parts,
  });
  const searchMs = performance.now() - searchStart;
  return {
    ...head,
    result,
    problem: null,
    offerCount: modules.offerCount + controllers.offerCount + batteries.offerCount + inverters.offerCount,
    ratesUsed: [...rates.values()],
    searchMs,
    loadMs,
  };
}

export type ApplyOutcome = { ok: true; revision: number } | { ok: false; status: number; message: string; fields: Record<string, string> };

/** Re-plans the plan with the picked parts, string layout and battery strings, kept as a new revision. */
export async function applyAlternative(teamId: string, userId: string, planId: string, pick: AlternativePick): Promise<ApplyOutcome | null> {
  const found = await findPlan(teamId, planId);
  if (!found) return null;
  const parsed = planChoicesSchema.safeParse(found.revision.choices);
  if (!parsed.success) return { ok: false, status: 409, message: "The plan's saved choices no longer read as a plan.", fields: {} };
  const choices: PlanChoices = {
    ...parsed.data,
    moduleId: pick.moduleId,
    controllerId: pick.controllerId,
    batteryId: pick.batteryId,
    inverterId: pick.inverterId,
    design: { ...parsed.data.design, modulesInSeries: pick.modulesInSeries, stringsInParallel: pick.stringsInParallel, batteryStrings: pick.batteryStrings },
  };
  const outcome = await planFromChoices(teamId, choices);
  if (!outcome.ok) return { ok: false, status: 400, message: outcome.message, fields: outcome.fields };
  // The same rule the search listed the kit by: no failing check, unmet days within the plan's target.
  const missed = missedChecks(outcome.plan);
  if (missed.length) {
    return {
      ok: false,
      status: 409,
      message: `This kit no longer meets every check and target of the plan (${missed.map((c) => c.title).join(", ")}): search again.`,
      fields: {},
    };
  }
  const p = outcome.sources.parts;
  const layout = outcome.plan.array.layout;
  const note =
    `Applied kit alternative: ${layout.moduleCount} × ${p.module} (${layout.modulesInSeries} in series × ${layout.stringsInParallel}), ${p.controller}, ` +
    `${outcome.plan.battery.batteryCount} × ${p.battery}${p.inverter ? `, ${p.inverter}` : ""}.`;
  const revision = await addRevision(teamId, planId, userId, outcome.choices, outcome.input, outcome.plan, note);
  return revision === null ? null : { ok: true, revision };
}
