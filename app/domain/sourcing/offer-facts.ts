// An offer and the catalogue figures a comparison needs, as the domain sees them (the server maps
// table rows onto these). Money is decimal inside OfferTerms; dates are ISO text.
import type { OfferTerms } from "../money/price-breaks";

export const OFFER_PART_KINDS = ["modules", "batteries", "controllers", "inverters"] as const;
export type OfferPartKind = (typeof OFFER_PART_KINDS)[number];

export function isOfferPartKind(value: unknown): value is OfferPartKind {
  return typeof value === "string" && (OFFER_PART_KINDS as readonly string[]).includes(value);
}

export interface OfferFacts {
  id: string;
  supplierId: string;
  supplierName: string;
  partKind: OfferPartKind;
  partId: string;
  sku: string;
  terms: OfferTerms;
  leadTimeDays: number | null;
  stock: number | null;
  /** Last day the price holds (inclusive); null when the supplier gave no end date. */
  validUntil: string | null;
  notes: string;
}

interface PartIdentity {
  id: string;
  maker: string;
  model: string;
}

export interface ModuleFigures extends PartIdentity {
  pmaxW: number;
  /** Median STC power of the approved field readings; null without readings. */
  verifiedPmaxW: number | null;
  verifiedReadingCount: number;
  verifiedRatio: number | null;
  areaM2: number;
  nameplateDensityWm2: number;
  measuredDensityWm2: number | null;
}

export interface BatteryFigures extends PartIdentity {
  chemistry: string;
  nominalVoltageV: number;
  capacityAh: number;
  capacityHourRateH: number;
  usableDodPct: number;
  cycleLife: number;
  roundTripEfficiencyPct: number;
}

export interface ControllerFigures extends PartIdentity {
  kind: string;
  batteryVoltagesV: number[];
  maxPvVocV: number;
  maxChargeCurrentA: number;
  maxPvPowerW: Record<string, number>;
}

export interface InverterFigures extends PartIdentity {
  continuousW: number;
  surgeW: number;
  dcInputVoltageV: number;
  efficiencyPct: number;
  idleDrawW: number;
}

export interface PartFiguresByKind {
  modules: ModuleFigures;
  batteries: BatteryFigures;
  controllers: ControllerFigures;
  inverters: InverterFigures;
}
