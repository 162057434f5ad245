// Per-part comparisons: the team's valid offers of one kind, each priced for the need in the team's
// quoting currency. Expired offers are left out (and counted, so the page can say so).
import type { Executor } from "./executor.server";
import { countExpiredOffers, listValidOffers } from "./offers.server";
import { loadPartFigures } from "./part-figures.server";
import { loadTeamPricing } from "./settings.server";
import type { ComparisonNeed } from "~/domain/sourcing/comparison-need";
import { moduleRow, type ModuleComparisonRow } from "~/domain/sourcing/module-rows";
import type { OfferFacts, OfferPartKind, PartFiguresByKind } from "~/domain/sourcing/offer-facts";
import type { TeamPricing } from "~/domain/sourcing/offer-costing";
import { todayIso } from "~/domain/sourcing/offer-validity";
import {
  batteryRow,
  controllerRow,
  inverterRow,
  type BatteryComparisonRow,
  type ControllerComparisonRow,
  type InverterComparisonRow,
} from "~/domain/sourcing/part-rows";

export interface RowsByKind {
  modules: ModuleComparisonRow;
  batteries: BatteryComparisonRow;
  controllers: ControllerComparisonRow;
  inverters: InverterComparisonRow;
}

type RowBuilder<K extends OfferPartKind> = (offer: OfferFacts, part: PartFiguresByKind[K], need: ComparisonNeed, pricing: TeamPricing) => RowsByKind[K];

const BUILDERS: { [K in OfferPartKind]: RowBuilder<K> } = { modules: moduleRow, batteries: batteryRow, controllers: controllerRow, inverters: inverterRow };

export interface Comparison<K extends OfferPartKind> {
  kind: K;
  need: ComparisonNeed;
  pricing: { quotingCurrency: string; asOf: string };
  rows: RowsByKind[K][];
  /** Offers of this kind left out because their valid-until day has passed. */
  expiredCount: number;
  /** Offers whose part is no longer in the catalogue. */
  missingPartCount: number;
}

/** Rows in no particular order: the page sorts them (and the API returns them as built). */
export async function compareOffers<K extends OfferPartKind>(
  db: Executor,
  teamId: string,
  kind: K,
  need: ComparisonNeed,
  asOf: string = todayIso(),
): Promise<Comparison<K>> {
  const [offers, pricing, expiredCount] = await Promise.all([
    listValidOffers(db, teamId, { partKind: kind, asOf }),
    loadTeamPricing(db, teamId, asOf),
    countExpiredOffers(db, teamId, kind, asOf),
  ]);
  const parts = await loadPartFigures(
    db,
    kind,
    offers.map((o) => o.partId),
  );
  const build = BUILDERS[kind] as RowBuilder<K>;
  const rows: RowsByKind[K][] = [];
  let missingPartCount = 0;
  for (const offer of offers) {
    const part = parts.get(offer.partId);
    if (part) rows.push(build(offer, part, need, pricing));
    else missingPartCount += 1;
  }
  return { kind, need, pricing: { quotingCurrency: pricing.quotingCurrency, asOf }, rows, expiredCount, missingPartCount };
}
