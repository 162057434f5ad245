// Sourcing figures: checking a supplier's CSV price list (the dry run's cell checks, before the
// database lookups), and pricing offers into comparison rows (landed cost with breaks, conversion,
// price per nameplate and verified watt) as the module comparison does on every load. Invented data.
import { performance } from "node:perf_hooks";
import Decimal from "decimal.js";
import { checkOfferCsv } from "../../app/lib/sourcing-csv";
import { moduleRow } from "../../app/domain/sourcing/module-rows";
import { DEFAULT_NEED } from "../../app/domain/sourcing/comparison-need";
import type { ModuleFigures, OfferFacts } from "../../app/domain/sourcing/offer-facts";

const HEADER =
  "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";

function priceList(rows: number) {
  const lines = Array.from(
    { length: rows },
    (_, i) =>
      `Bench Supply ${i % 7},module,Bench Maker,BM-${i},SKU-${i},${i % 3 ? "EUR" : "GBP"},${(40 + (i % 50) / 10).toFixed(2)},10:${(38 + (i % 50) / 10).toFixed(2)}; 40:${(36 + (i % 50) / 10).toFixed(2)},2,0.80,35.00,6,${i % 90},2099-06-30,`,
  );
  return [HEADER, ...lines].join("\n");
}

function offers(count: number) {
  const module: ModuleFigures = {
    id: "m",
    maker: "Bench Maker",
    model: "BM",
    pmaxW: 150,
    verifiedPmaxW: 126,
    verifiedReadingCount: 4,
    verifiedRatio: 0.84,
    areaM2: 0.9916,
    nameplateDensityWm2: 151.3,
    measuredDensityWm2: 127.1,
  };
  const list: OfferFacts[] = Array.from({ length: count }, (_, i) => ({
    id: `o${i}`,
    supplierId: "s",
    supplierName: "Bench Supply",
    partKind: "modules",
    partId: "m",
    sku: "",
    terms: {
      currency: i % 3 ? "EUR" : "GBP",
      unitPrice: new Decimal(585 + (i % 40)).dividedBy(10),
      breaks: [
        { minQuantity: 10, unitPrice: new Decimal("55.20") },
        { minQuantity: 40, unitPrice: new Decimal("53.90") },
      ],
      minimumOrder: 2,
      shippingPerUnit: new Decimal("0.80"),
      shippingPerOrder: new Decimal("35.00"),
    },
    leadTimeDays: 6,
    stock: 10,
    validUntil: null,
    notes: "",
  }));
  return { module, list };
}

export function printSourcingBench() {
  for (const rows of [100, 5000]) {
    const csv = priceList(rows);
    checkOfferCsv(csv, "2026-12-01");
    const runs = rows > 1000 ? 5 : 50;
    const started = performance.now();
    for (let i = 0; i < runs; i++) checkOfferCsv(csv, "2026-12-01");
    console.log(
      `  CSV price list of ${String(rows).padStart(4)} rows (${(csv.length / 1024).toFixed(0).padStart(4)} KB): ${((performance.now() - started) / runs).toFixed(1)} ms to read and check every cell`,
    );
  }
  const pricing = { quotingCurrency: "EUR", rates: [{ from: "GBP", to: "EUR", rate: new Decimal("1.1725"), asOf: "2026-11-24" }], asOf: "2026-12-01" };
  const need = { ...DEFAULT_NEED, quantity: null, source: { kind: "typed" as const } };
  for (const count of [50, 2000]) {
    const { module, list } = offers(count);
    for (const o of list) moduleRow(o, module, need, pricing);
    const runs = count > 1000 ? 5 : 100;
    const started = performance.now();
    for (let i = 0; i < runs; i++) for (const o of list) moduleRow(o, module, need, pricing);
    console.log(
      `  module comparison of ${String(count).padStart(4)} offers: ${((performance.now() - started) / runs).toFixed(2)} ms to price every row (breaks, shipping, conversion, per-watt figures)`,
    );
  }
}

if (process.argv[1]?.endsWith("sourcing.ts")) printSourcingBench();
