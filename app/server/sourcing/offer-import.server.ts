// Importing offers from CSV. The check (dry run) reads every row, resolves suppliers and catalogue
// parts, and reports each row's problems with its row number; it writes nothing. The import runs the
// same check inside one transaction and writes every row (adding new suppliers, replacing the terms
// of offers that already exist) or, when any row has a problem, nothing at all. An expired row is a
// problem, except when it is the team's own stored offer read back (same supplier, part and
// valid-until day, as an export writes it): that offer is left as it is and the report says so.
import Decimal from "decimal.js";
import { sql } from "kysely";
import type { Executor } from "./executor.server";
import { inTransaction, upsertOffer, type OfferValues } from "./offer-write.server";
import { PART_TABLE } from "./part-figures.server";
import { isDuplicateName } from "./suppliers.server";
import { convertMoney, MissingRateError } from "~/domain/money/currency-conversion";
import { money } from "~/domain/money/money";
import type { OfferPartKind } from "~/domain/sourcing/offer-facts";
import type { TeamPricing } from "~/domain/sourcing/offer-costing";
import { byColumnOrder, checkOfferCsv, KIND_CSV_WORD, type OfferCsvIdentity, type RowProblem } from "~/lib/sourcing-csv";
import { loadTeamPricing } from "./settings.server";
import type { OfferImportReport } from "~/lib/sourcing-types";

export type { OfferImportReport };

interface ResolvedRow {
  row: number;
  supplierName: string;
  values: Omit<OfferValues, "supplierId">;
}

interface Resolution {
  report: OfferImportReport;
  rows: ResolvedRow[];
  /** Lower-cased name → existing supplier id. */
  supplierIds: Map<string, string>;
}

const key = (...parts: string[]) => parts.map((p) => p.trim().toLowerCase()).join("\u0000");

async function partIndex(db: Executor, kind: OfferPartKind, makers: string[]) {
  const rows = await db
    .selectFrom(PART_TABLE[kind] as "battery")
    .select(["id", "maker", "model", "merged_into"])
    .where(sql<string>`lower(maker)`, "in", makers)
    .execute();
  // A model merged into another is found under its old name and points at the one that stayed.
  return new Map(rows.map((r) => [key(r.maker, r.model), r.merged_into ?? r.id]));
}

async function resolve(db: Executor, teamId: string, text: string, pricing: TeamPricing): Promise<Resolution> {
  const check = checkOfferCsv(text, pricing.asOf);
  const report: OfferImportReport = {
    rowCount: check.rowCount,
    readyCount: 0,
    fileErrors: check.fileErrors,
    problems: check.problems,
    newSuppliers: [],
    newOffers: 0,
    updatedOffers: 0,
    expiredKept: [],
    warnings: [],
  };
  const resolution: Resolution = { report, rows: [], supplierIds: new Map() };
  if (check.fileErrors.length) return resolution;

  // Rows with cell problems are looked up too, so that each row's problems are listed at once.
  const named: OfferCsvIdentity[] = [...check.rows, ...check.problemRows].sort((a, b) => a.row - b.row);
  const cleanRows = new Map(check.rows.map((r) => [r.row, r]));
  const suppliers = await db
    .selectFrom("supplier")
    .select(["id", "name", "currency", "default_shipping_per_unit", "default_shipping_per_order", "default_lead_time_days"])
    .where("team_id", "=", teamId)
    .execute();
  const existingSupplier = new Map(suppliers.map((s) => [key(s.name), s]));
  const newSupplierCurrency = new Map<string, { name: string; currency: string | null }>();
  for (const r of named) {
    if (existingSupplier.has(key(r.supplier))) continue;
    const entry = newSupplierCurrency.get(key(r.supplier)) ?? { name: r.supplier, currency: null };
    entry.currency ??= r.currency;
    newSupplierCurrency.set(key(r.supplier), entry);
  }

  const parts = new Map<OfferPartKind, Map<string, string>>();
  for (const kind of new Set(named.map((r) => r.kind))) {
    parts.set(kind, await partIndex(db, kind, [...new Set(named.filter((r) => r.kind === kind).map((r) => r.maker.toLowerCase()))]));
  }
  // Supplier, part → the stored offer's valid-until day ("" when open-ended) and its price.
  const existingOffers = new Map(
    (
      await db
        .selectFrom("offer")
        .select(["supplier_id", "part_kind", "part_id", "unit_price", "currency", sql<string | null>`valid_until::text`.as("valid_until")])
        .where("team_id", "=", teamId)
        .execute()
    ).map((o) => [key(o.supplier_id, o.part_kind, o.part_id), { validUntil: o.valid_until ?? "", unitPrice: o.unit_price, currency: o.currency }]),
  );

  const firstRowOf = new Map<string, number>();
  const problems = new Map<number, RowProblem>(check.problems.map((p) => [p.row, { ...p, errors: [...p.errors] }]));
  const problem = (r: OfferCsvIdentity, column: string, message: string) => {
    const entry = problems.get(r.row) ?? { row: r.row, label: `${r.supplier} · ${r.maker} ${r.model}`, errors: [] };
    entry.errors.push({ column, message });
    problems.set(r.row, entry);
  };
  for (const r of named) {
    const supplier = existingSupplier.get(key(r.supplier));
    const fresh = newSupplierCurrency.get(key(r.supplier));
    const currencyFlagged = problems.get(r.row)?.errors.some((e) => e.column === "currency");
    if (!supplier && !fresh?.currency && !currencyFlagged)
      problem(r, "currency", `"${r.supplier}" is a new supplier: give its currency on at least one of its rows.`);
    const partId = parts.get(r.kind)?.get(key(r.maker, r.model));
    if (!partId)
      problem(r, "model", `No ${KIND_CSV_WORD[r.kind]} "${r.maker} ${r.model}" in the catalogue: check the spelling and the kind, or ask a curator to add it.`);
    else {
      const identity = key(r.supplier, r.kind, partId);
      const first = firstRowOf.get(identity);
      if (first !== undefined) problem(r, "model", `Row ${first} already has an offer from ${r.supplier} for this ${KIND_CSV_WORD[r.kind]}: keep one of them.`);
      else firstRowOf.set(identity, r.row);
    }
    // An expired row may only stand for the offer already stored with the same valid-until day (an
    // exported file read back): it is left as it is. Any other expired row would bring in a stale price.
    const stored = supplier && partId ? existingOffers.get(key(supplier.id, r.kind, partId)) : undefined;
    const row = cleanRows.get(r.row);
    const sameDay = r.expired && stored?.validUntil === r.validUntil;
    // An edited price on an expired row is a stale price coming in, not the stored offer read back.
    const priceEdited =
      sameDay && row !== undefined && (!new Decimal(row.unitPrice).equals(stored!.unitPrice) || (row.currency ?? supplier!.currency) !== stored!.currency);
    const keepsStored = sameDay && !priceEdited;
    if (priceEdited)
      problem(
        r,
        "unit_price",
        `This row changes the price of an offer that expired on ${r.validUntil}: ask the supplier for a current price and date, or leave the row as exported.`,
      );
    else if (r.expired && !keepsStored)
      problem(r, "valid_until", `The offer expired on ${r.validUntil} (today is ${pricing.asOf}): ask the supplier for a current price, or leave the row out.`);
    if (problems.has(r.row) || !partId || !row) continue;
    if (keepsStored) {
      report.expiredKept.push({ row: r.row, label: `${r.supplier} · ${r.maker} ${r.model}`, validUntil: r.validUntil! });
      continue;
    }
    const currency = row.currency ?? supplier?.currency ?? fresh!.currency!;
    resolution.rows.push({
      row: r.row,
      supplierName: supplier?.name ?? fresh!.name,
      values: {
        partKind: row.kind,
        partId,
        sku: row.sku,
        currency,
        unitPrice: row.unitPrice,
        priceBreaks: row.priceBreaks,
        minimumOrder: row.minimumOrder,
        shippingPerUnit: row.shippingPerUnit ?? supplier?.default_shipping_per_unit ?? "0",
        shippingPerOrder: row.shippingPerOrder ?? supplier?.default_shipping_per_order ?? "0",
        leadTimeDays: row.leadTimeDays ?? supplier?.default_lead_time_days ?? null,
        stock: row.stock,
        validUntil: row.validUntil,
        notes: row.notes,
      },
    });
    if (stored !== undefined) report.updatedOffers += 1;
    else report.newOffers += 1;
  }
  report.problems = [...problems.values()].map((p) => ({ ...p, errors: byColumnOrder(p.errors) })).sort((a, b) => a.row - b.row);
  report.readyCount = resolution.rows.length;
  report.newSuppliers = [...newSupplierCurrency.values()].filter((s) => s.currency).map((s) => ({ name: s.name, currency: s.currency! }));
  for (const s of existingSupplier.values()) resolution.supplierIds.set(key(s.name), s.id);

  const currencies = new Set(resolution.rows.map((r) => r.values.currency));
  for (const currency of currencies) {
    try {
      convertMoney(money(1, currency), pricing.quotingCurrency, pricing.rates, pricing.asOf);
    } catch (error) {
      if (!(error instanceof MissingRateError)) throw error;
      report.warnings.push(
        `No ${currency} → ${pricing.quotingCurrency} exchange rate yet: the comparisons cannot convert these offers until you add one under Rates.`,
      );
    }
  }
  return resolution;
}

/** The dry run: the report, and nothing written. */
export async function checkOfferImport(db: Executor, teamId: string, text: string, asOf?: string): Promise<OfferImportReport> {
  const pricing = await loadTeamPricing(db, teamId, asOf);
  return (await resolve(db, teamId, text, pricing)).report;
}

export type OfferImportOutcome = { ok: true; report: OfferImportReport } | { ok: false; report: OfferImportReport };

class RefusedImport extends Error {
  constructor(readonly report: OfferImportReport) {
    super("The import was refused.");
  }
}

function refused(report: OfferImportReport) {
  return report.fileErrors.length > 0 || report.problems.length > 0;
}

/** Writes every row in one transaction, or nothing when any row has a problem. */
export async function importOffers(db: Executor, teamId: string, userId: string | null, text: string, asOf?: string): Promise<OfferImportOutcome> {
  try {
    const report = await inTransaction(db, async (trx) => {
      const pricing = await loadTeamPricing(trx, teamId, asOf);
      const { report, rows, supplierIds } = await resolve(trx, teamId, text, pricing);
      if (refused(report)) throw new RefusedImport(report);
      for (const s of report.newSuppliers) {
        const created = await trx
          .insertInto("supplier")
          .values({ team_id: teamId, name: s.name, currency: s.currency, created_by: userId })
          .returning("id")
          .executeTakeFirstOrThrow();
        supplierIds.set(key(s.name), created.id);
      }
      for (const r of rows) await upsertOffer(trx, teamId, userId, { ...r.values, supplierId: supplierIds.get(key(r.supplierName))! });
      return report;
    });
    return { ok: true, report };
  } catch (error) {
    if (error instanceof RefusedImport) return { ok: false, report: error.report };
    if (isDuplicateName(error)) {
      const report = await checkOfferImport(db, teamId, text, asOf);
      report.fileErrors.push("A supplier in this file was added by someone else while you imported; nothing was written. Check the file again.");
      return { ok: false, report };
    }
    throw error;
  }
}
