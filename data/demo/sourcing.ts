// Invented suppliers and prices for the demo team Tallowmere Power Works (no real company, price or
// product). Two suppliers quote in euros, one in pounds (converted with the team's own rate). Dates
// are relative to the day the demo is seeded, so the offers stay current — except one that expired.
// QP-150P is priced below FM-120M per nameplate watt by every supplier, but it verifies at about
// 84 % of nameplate against about 99 % (data/demo/readings.ts), so per verified watt it is dearer.
import type { OfferPartKind } from "../../app/domain/sourcing/offer-facts";

export interface DemoSupplier {
  name: string;
  contact: string;
  currency: string;
  shippingTerms: string;
  defaultShippingPerUnit: string;
  defaultShippingPerOrder: string;
  defaultLeadTimeDays: number;
  notes: string;
}

export interface DemoOffer {
  supplier: string;
  kind: OfferPartKind;
  maker: string;
  model: string;
  sku: string;
  unitPrice: string;
  /** [from quantity, unit price] */
  priceBreaks?: [number, string][];
  minimumOrder?: number;
  shippingPerUnit?: string;
  shippingPerOrder?: string;
  leadTimeDays?: number;
  stock?: number;
  /** Days from the seeding day to the last valid day; negative = already expired; null = no end date. */
  validForDays: number | null;
  notes?: string;
}

export const DEMO_SOURCING_TEAM = "tallowmere-power-works";
export const DEMO_QUOTING_CURRENCY = "EUR";

/** Units of `to` per unit of `from`, taken `daysAgo` days before seeding. */
export const DEMO_RATES = [{ from: "GBP", to: "EUR", rate: "1.1725", daysAgo: 7 }];

const VVEW = "Vell Valley Electrical Wholesale";
const OBER = "Oberhollow Solar Trading";
const CARRICK = "Carrick & Dunmore Components";

export const DEMO_SUPPLIERS: DemoSupplier[] = [
  {
    name: VVEW,
    contact: "Counter: orders@vvew.example, +00 555 0141",
    currency: "EUR",
    shippingTerms: "Own van, twice a week up the valley; one charge per delivery.",
    defaultShippingPerUnit: "0",
    defaultShippingPerOrder: "25.00",
    defaultLeadTimeDays: 3,
    notes: "Walk-in counter in Vell town. Small stock, quick.",
  },
  {
    name: OBER,
    contact: "Sales desk: sales@oberhollow-solar.example",
    currency: "EUR",
    shippingTerms: "Pallet freight: per-unit handling plus a pallet charge.",
    defaultShippingPerUnit: "2.50",
    defaultShippingPerOrder: "60.00",
    defaultLeadTimeDays: 10,
    notes: "Distributor; price breaks from 10 units.",
  },
  {
    name: CARRICK,
    contact: "Export desk: export@carrick-dunmore.example",
    currency: "GBP",
    shippingTerms: "Courier, customs cleared, per parcel and per unit.",
    defaultShippingPerUnit: "1.80",
    defaultShippingPerOrder: "35.00",
    defaultLeadTimeDays: 14,
    notes: "Quotes in pounds; convert with the team's rate.",
  },
];

const LONG = 120;

export const DEMO_OFFERS: DemoOffer[] = [
  // Modules
  {
    supplier: VVEW,
    kind: "modules",
    maker: "Quillon Photonics",
    model: "QP-150P",
    sku: "VV-QP150",
    unitPrice: "58.50",
    leadTimeDays: 2,
    stock: 24,
    validForDays: LONG,
  },
  {
    supplier: VVEW,
    kind: "modules",
    maker: "Fellmark Solar",
    model: "FM-120M",
    sku: "VV-FM120",
    unitPrice: "48.00",
    leadTimeDays: 2,
    stock: 16,
    validForDays: LONG,
  },
  { supplier: VVEW, kind: "modules", maker: "Harrowgate Cells", model: "HG-100M36", sku: "VV-HG100", unitPrice: "46.00", stock: 30, validForDays: LONG },
  { supplier: VVEW, kind: "modules", maker: "Quillon Photonics", model: "QP-60P", sku: "VV-QP60", unitPrice: "29.90", stock: 12, validForDays: LONG },
  { supplier: VVEW, kind: "modules", maker: "Cinderbrook", model: "CB-90F", sku: "VV-CB90", unitPrice: "41.50", stock: 6, validForDays: 60 },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Quillon Photonics",
    model: "QP-150P",
    sku: "OST-150P",
    unitPrice: "56.90",
    priceBreaks: [
      [10, "55.20"],
      [40, "53.90"],
    ],
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Fellmark Solar",
    model: "FM-120M",
    sku: "OST-120M",
    unitPrice: "47.40",
    priceBreaks: [[10, "46.20"]],
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Harrowgate Cells",
    model: "HG-200M36",
    sku: "OST-HG200",
    unitPrice: "74.50",
    priceBreaks: [[10, "71.00"]],
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Harrowgate Cells",
    model: "HG-415T108",
    sku: "OST-HG415",
    unitPrice: "139.00",
    priceBreaks: [[20, "131.00"]],
    minimumOrder: 2,
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Quillon Photonics",
    model: "QP-330P60",
    sku: "OST-330P",
    unitPrice: "105.60",
    priceBreaks: [[10, "101.90"]],
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "modules",
    maker: "Fellmark Solar",
    model: "FM-380H",
    sku: "OST-380H",
    unitPrice: "152.00",
    priceBreaks: [[10, "147.00"]],
    validForDays: 90,
  },
  { supplier: CARRICK, kind: "modules", maker: "Fellmark Solar", model: "FM-120M", sku: "CD-FM-120", unitPrice: "41.20", stock: 40, validForDays: 45 },
  { supplier: CARRICK, kind: "modules", maker: "Fellmark Solar", model: "FM-380H", sku: "CD-FM-380", unitPrice: "128.50", validForDays: 45 },
  // The one expired offer: cheapest of all per nameplate watt, and left out of the comparisons.
  {
    supplier: CARRICK,
    kind: "modules",
    maker: "Quillon Photonics",
    model: "QP-150P",
    sku: "CD-QP-150",
    unitPrice: "45.00",
    validForDays: -20,
    notes: "Autumn clearance price; ask for a new quote.",
  },
  // Batteries
  { supplier: VVEW, kind: "batteries", maker: "Korrowdale Storage", model: "KS-100AGM", sku: "VV-KS100", unitPrice: "189.00", stock: 8, validForDays: LONG },
  { supplier: VVEW, kind: "batteries", maker: "Korrowdale Storage", model: "KS-225F6", sku: "VV-KS225", unitPrice: "165.00", stock: 8, validForDays: LONG },
  { supplier: VVEW, kind: "batteries", maker: "Wickfold Power", model: "WP-LFP12-100", sku: "VV-WP12", unitPrice: "429.00", stock: 4, validForDays: LONG },
  {
    supplier: OBER,
    kind: "batteries",
    maker: "Korrowdale Storage",
    model: "KS-200GEL",
    sku: "OST-KS200",
    unitPrice: "420.00",
    shippingPerUnit: "9.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "batteries",
    maker: "Korrowdale Storage",
    model: "KS-1000F2",
    sku: "OST-KS1000",
    unitPrice: "310.00",
    minimumOrder: 12,
    shippingPerUnit: "12.00",
    validForDays: 90,
    notes: "Sold as sets of 12 cells (one 24 V string).",
  },
  {
    supplier: OBER,
    kind: "batteries",
    maker: "Wickfold Power",
    model: "WP-LFP24-200",
    sku: "OST-WP24",
    unitPrice: "1590.00",
    shippingPerUnit: "15.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "batteries",
    maker: "Wickfold Power",
    model: "WP-LFP48-100",
    sku: "OST-WP48",
    unitPrice: "1620.00",
    shippingPerUnit: "15.00",
    validForDays: 90,
  },
  {
    supplier: CARRICK,
    kind: "batteries",
    maker: "Wickfold Power",
    model: "WP-LFP24-200",
    sku: "CD-WP-24200",
    unitPrice: "1340.00",
    shippingPerUnit: "22.00",
    validForDays: 45,
  },
  // Charge controllers
  { supplier: VVEW, kind: "controllers", maker: "Tollbridge Controls", model: "TC-P10", sku: "VV-TCP10", unitPrice: "24.50", validForDays: LONG },
  { supplier: VVEW, kind: "controllers", maker: "Tollbridge Controls", model: "TC-P20D", sku: "VV-TCP20", unitPrice: "39.00", validForDays: LONG },
  { supplier: VVEW, kind: "controllers", maker: "Tollbridge Controls", model: "TC-M20-100", sku: "VV-TCM20", unitPrice: "118.00", validForDays: LONG },
  {
    supplier: OBER,
    kind: "controllers",
    maker: "Tollbridge Controls",
    model: "TC-M20-100",
    sku: "OST-TCM20",
    unitPrice: "112.00",
    shippingPerUnit: "0",
    shippingPerOrder: "18.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "controllers",
    maker: "Tollbridge Controls",
    model: "TC-M40-150",
    sku: "OST-TCM40",
    unitPrice: "289.00",
    shippingPerUnit: "0",
    shippingPerOrder: "18.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "controllers",
    maker: "Amberlow Electric",
    model: "AE-MPPT60",
    sku: "OST-AE60",
    unitPrice: "455.00",
    shippingPerUnit: "0",
    shippingPerOrder: "18.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "controllers",
    maker: "Amberlow Electric",
    model: "AE-MPPT100-250",
    sku: "OST-AE100",
    unitPrice: "910.00",
    shippingPerUnit: "0",
    shippingPerOrder: "18.00",
    validForDays: 90,
  },
  { supplier: CARRICK, kind: "controllers", maker: "Tollbridge Controls", model: "TC-M40-150", sku: "CD-TC-M40", unitPrice: "238.00", validForDays: 45 },
  // Inverters
  { supplier: VVEW, kind: "inverters", maker: "Amberlow Electric", model: "AE-SW300-12", sku: "VV-AE300", unitPrice: "119.00", validForDays: LONG },
  { supplier: VVEW, kind: "inverters", maker: "Amberlow Electric", model: "AE-SW1000-12", sku: "VV-AE1000", unitPrice: "329.00", validForDays: LONG },
  {
    supplier: OBER,
    kind: "inverters",
    maker: "Amberlow Electric",
    model: "AE-SW2000-24",
    sku: "OST-AE2000",
    unitPrice: "589.00",
    shippingPerUnit: "8.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "inverters",
    maker: "Hesketh Lane Electric",
    model: "HL-3000-24",
    sku: "OST-HL3000",
    unitPrice: "845.00",
    shippingPerUnit: "8.00",
    validForDays: 90,
  },
  {
    supplier: OBER,
    kind: "inverters",
    maker: "Hesketh Lane Electric",
    model: "HL-5000-48",
    sku: "OST-HL5000",
    unitPrice: "1390.00",
    shippingPerUnit: "8.00",
    validForDays: 90,
  },
  { supplier: CARRICK, kind: "inverters", maker: "Amberlow Electric", model: "AE-SW2000-24", sku: "CD-AE-2000", unitPrice: "495.00", validForDays: 45 },
];
