// The comparison page keeps what it is asked to meet in its URL (?energy=2.4&sun=3&…), so a view can
// be bookmarked and shared. A bad value is named at its field and the default is used meanwhile.
// A ?plan=<id> fills the same fields once from a saved kit plan (sourcing.compare.tsx).
import { DEFAULT_NEED, DEFAULT_QUANTITY, type ComparisonNeed } from "~/domain/sourcing/comparison-need";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";

interface ParamRule {
  label: string;
  min: number;
  max: number;
  integer?: boolean;
}

export const NEED_PARAMS = {
  energy: { label: "Array energy target (kWh/day)", min: 0.01, max: 1000 },
  sun: { label: "Sun hours in the design month (h/day)", min: 0.1, max: 12 },
  losses: { label: "System losses (%)", min: 0, max: 60 },
  qty: { label: "Quantity", min: 1, max: 10000, integer: true },
  bank: { label: "Battery bank (V)", min: 6, max: 120, integer: true },
  store: { label: "Usable energy to store (kWh)", min: 0.01, max: 10000 },
  btemp: { label: "Coldest battery temperature (°C)", min: -40, max: 60 },
  dod: { label: "Depth of discharge limit (%)", min: 5, max: 100 },
  array: { label: "Array power (W at STC)", min: 1, max: 100000 },
  peak: { label: "Peak AC load (W)", min: 1, max: 100000 },
} as const satisfies Record<string, ParamRule>;

export type NeedParam = keyof typeof NEED_PARAMS;

/** Which fields each kind's form shows. */
export const NEED_FIELDS: Record<OfferPartKind, NeedParam[]> = {
  modules: ["energy", "sun", "losses", "qty"],
  batteries: ["store", "bank", "btemp", "dod", "qty"],
  controllers: ["qty", "array", "bank"],
  inverters: ["qty", "peak", "bank"],
};

export function defaultParamValues(kind: OfferPartKind): Record<NeedParam, string> {
  const quantity = DEFAULT_QUANTITY[kind];
  return {
    energy: String(DEFAULT_NEED.arrayEnergyWhPerDay / 1000),
    sun: String(DEFAULT_NEED.sunHoursPerDay),
    losses: String(DEFAULT_NEED.systemLossesPct),
    qty: quantity === null ? "" : String(quantity),
    bank: String(DEFAULT_NEED.batteryVoltageV),
    store: String(DEFAULT_NEED.bankUsableWh / 1000),
    btemp: String(DEFAULT_NEED.batteryTempC),
    dod: DEFAULT_NEED.maxDepthOfDischargePct === null ? "" : String(DEFAULT_NEED.maxDepthOfDischargePct),
    array: String(DEFAULT_NEED.arrayPowerW),
    peak: String(DEFAULT_NEED.peakAcLoadW),
  };
}

export interface NeedFromUrl {
  need: ComparisonNeed;
  /** What the form shows: the typed text, or the default. */
  values: Record<NeedParam, string>;
  errors: Partial<Record<NeedParam, string>>;
}

function readParam(param: NeedParam, text: string | null): { value?: number; error?: string } {
  if (text === null || text.trim() === "") return {};
  const rule: ParamRule = NEED_PARAMS[param];
  // A typed minus sign (U+2212) is read as the hyphen-minus a number needs.
  const typed = text.trim().replace(/^\u2212/, "-");
  const value = Number(typed);
  const pattern = rule.min < 0 ? /^-?\d+(\.\d+)?$/ : /^\d+(\.\d+)?$/;
  if (!pattern.test(typed) || !Number.isFinite(value)) return { error: `${rule.label}: enter a number such as ${rule.integer ? "4" : "2.4"}.` };
  if (rule.integer && !Number.isInteger(value)) return { error: `${rule.label}: enter a whole number.` };
  if (value < rule.min || value > rule.max) return { error: `${rule.label}: from ${rule.min} to ${rule.max}.` };
  return { value };
}

export function needFromSearchParams(kind: OfferPartKind, params: URLSearchParams): NeedFromUrl {
  const values = defaultParamValues(kind);
  const errors: Partial<Record<NeedParam, string>> = {};
  const read: Partial<Record<NeedParam, number>> = {};
  for (const param of Object.keys(NEED_PARAMS) as NeedParam[]) {
    const text = params.get(param);
    const { value, error } = readParam(param, text);
    if (text !== null) values[param] = text;
    if (error) errors[param] = error;
    else if (value !== undefined) read[param] = value;
  }
  const need: ComparisonNeed = {
    quantity: read.qty ?? DEFAULT_QUANTITY[kind],
    arrayEnergyWhPerDay: read.energy !== undefined ? read.energy * 1000 : DEFAULT_NEED.arrayEnergyWhPerDay,
    sunHoursPerDay: read.sun ?? DEFAULT_NEED.sunHoursPerDay,
    systemLossesPct: read.losses ?? DEFAULT_NEED.systemLossesPct,
    batteryVoltageV: read.bank ?? DEFAULT_NEED.batteryVoltageV,
    bankUsableWh: read.store !== undefined ? read.store * 1000 : DEFAULT_NEED.bankUsableWh,
    batteryTempC: read.btemp ?? DEFAULT_NEED.batteryTempC,
    maxDepthOfDischargePct: read.dod ?? DEFAULT_NEED.maxDepthOfDischargePct,
    arrayPowerW: read.array ?? DEFAULT_NEED.arrayPowerW,
    peakAcLoadW: read.peak ?? DEFAULT_NEED.peakAcLoadW,
    source: { kind: "typed" },
  };
  return { need, values, errors };
}
