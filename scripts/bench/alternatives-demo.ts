// The demo scenario as the kit-alternatives search sees it, built without a database: a demo site and
// load sheet with the default design, the demo catalogue's parts and the demo offers priced as
// costOffer prices them (invented data; nameplate figures — the field readings live in the database).
import Decimal from "decimal.js";
import { DEMO_BATTERIES, DEMO_CONTROLLERS, DEMO_INVERTERS } from "../../data/demo/parts";
import { DEMO_MODULES } from "../../data/demo/modules";
import { DEMO_SITES } from "../../data/demo/sites";
import { DEMO_OFFERS, DEMO_QUOTING_CURRENCY, DEMO_RATES, DEMO_SUPPLIERS, type DemoOffer } from "../../data/demo/sourcing";
import type { BatteryPart, ControllerPart, InverterPart, ModulePart } from "../../app/domain/sizing/parts";
import type { KitPlanInput } from "../../app/domain/sizing/plan-types";
import type { AlternativesInput, CandidatePart, OfferPrice } from "../../app/domain/sourcing/alternatives/types";
import { costOffer, type TeamPricing } from "../../app/domain/sourcing/offer-costing";
import { DEFAULT_DESIGN } from "../../app/lib/plan-choices";
import { toEngineSite } from "../../app/lib/site-forms";

const TODAY = new Date().toISOString().slice(0, 10);
const PRICING: TeamPricing = {
  quotingCurrency: DEMO_QUOTING_CURRENCY,
  rates: DEMO_RATES.map((r) => ({ from: r.from, to: r.to, rate: new Decimal(r.rate), asOf: TODAY })),
  asOf: TODAY,
};

function offerPrice(o: DemoOffer, copy: number): OfferPrice {
  const s = DEMO_SUPPLIERS.find((x) => x.name === o.supplier)!;
  // Copies of the catalogue are priced 1 % apart so that they rank differently.
  const bump = new Decimal(1).plus(new Decimal(copy).div(100));
  const terms = {
    currency: s.currency,
    unitPrice: new Decimal(o.unitPrice).times(bump).toDecimalPlaces(2),
    breaks: (o.priceBreaks ?? []).map(([q, p]) => ({ minQuantity: q, unitPrice: new Decimal(p).times(bump).toDecimalPlaces(2) })),
    minimumOrder: o.minimumOrder ?? 1,
    shippingPerUnit: new Decimal(o.shippingPerUnit ?? s.defaultShippingPerUnit),
    shippingPerOrder: new Decimal(o.shippingPerOrder ?? s.defaultShippingPerOrder),
  };
  return {
    offerId: `${o.sku}-${copy}`,
    supplierName: o.supplier,
    costMinor: (q) => {
      const c = costOffer(terms, q, PRICING).totalQuoting;
      return c ? c.amount.times(100).toNumber() : null;
    },
  };
}

function withOffers<P>(kind: DemoOffer["kind"], maker: string, model: string, part: P, copies: number): CandidatePart<P>[] {
  const offers = DEMO_OFFERS.filter((o) => o.kind === kind && o.maker === maker && o.model === model && (o.validForDays === null || o.validForDays >= 0));
  if (!offers.length) return [];
  return Array.from({ length: copies }, (_, k) => ({
    id: `${maker} ${model} #${k}`,
    label: `${maker} ${model}`,
    part,
    offers: offers.map((o) => offerPrice(o, k)),
  }));
}

function power(c: (typeof DEMO_CONTROLLERS)[number]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [v, w] of [
    ["12", c.maxPvPower12W],
    ["24", c.maxPvPower24W],
    ["36", c.maxPvPower36W],
    ["48", c.maxPvPower48W],
  ] as const)
    if (w !== null) out[v] = w;
  return out;
}

/** The demo catalogue with each part repeated `copies` times (1 = the demo itself, 10 = ten times as many parts of every kind). */
export function demoAlternativesInput(siteIndex: number, copies = 1): AlternativesInput {
  const demo = DEMO_SITES[siteIndex];
  const d = DEFAULT_DESIGN;
  const base: KitPlanInput = {
    site: {
      ...toEngineSite(demo.site),
      coldestTempC: demo.site.coldestTempC,
      ...(demo.site.hottestTempC !== undefined ? { hottestTempC: demo.site.hottestTempC } : {}),
      shadingDeratePct: demo.site.shadingDeratePct,
    },
    appliances: demo.loadSheet.appliances,
    systemVoltageV: demo.plan.systemVoltageV,
    parts: null as never, // not used by the search: the candidates bring their parts
    design: {
      autonomyDays: d.autonomyDays,
      designMarginPct: d.designMarginPct,
      powerBasis: d.powerBasis,
      voltageDropTargetPct: d.voltageDropTargetPct,
      conductorSystem: d.conductorSystem,
      cableRuns: {
        arrayToController: { oneWayLengthM: d.arrayToControllerM },
        controllerToBattery: { oneWayLengthM: d.controllerToBatteryM },
        batteryToInverter: { oneWayLengthM: d.batteryToInverterM },
      },
      lossesPct: d.lossesPct,
    },
  };
  const modules = DEMO_MODULES.flatMap((m) => withOffers<ModulePart>("modules", m.maker, m.model, { ...m }, copies));
  const controllers = DEMO_CONTROLLERS.flatMap((c) =>
    withOffers<ControllerPart>(
      "controllers",
      c.maker,
      c.model,
      {
        kind: c.kind,
        batteryVoltagesV: Object.keys(power(c)).map(Number),
        maxPvVocV: c.maxPvVocV,
        maxChargeCurrentA: c.maxChargeCurrentA,
        maxPvPowerW: power(c),
        efficiencyPct: c.efficiencyPct,
      },
      copies,
    ),
  );
  const batteries = DEMO_BATTERIES.flatMap((b) => withOffers<BatteryPart>("batteries", b.maker, b.model, { ...b }, copies));
  const inverters = DEMO_INVERTERS.flatMap((i) => withOffers<InverterPart>("inverters", i.maker, i.model, { ...i }, copies));
  return {
    base,
    current: { moduleId: "", controllerId: "", batteryId: "", inverterId: null },
    currency: DEMO_QUOTING_CURRENCY,
    modules,
    controllers,
    batteries,
    inverters,
  };
}
