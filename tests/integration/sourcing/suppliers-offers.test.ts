// Suppliers and offers through the pages: saved with exact decimal money, refused with messages at
// the fields, and invisible to every other team (404 on pages, actions and the API; never listed).
import { sql } from "kysely";
import { describe, expect, it } from "vitest";
import { installerWithTeam, userWithRole } from "../helpers/fixtures";
import { addOffer, addSupplier, callApi, insertModule, offerForm, uniqueMaker } from "./helpers";
import * as sourcing from "~/routes/sourcing";
import * as supplierPage from "~/routes/sourcing.supplier";
import * as supplierNew from "~/routes/sourcing.supplier-new";
import * as offerNew from "~/routes/sourcing.offer-new";
import * as offerPage from "~/routes/sourcing.offer";
import * as compare from "~/routes/sourcing.compare";
import * as exportRoute from "~/routes/sourcing.export";
import * as offersApi from "~/routes/api.v1.offers";
import * as offerApi from "~/routes/api.v1.offer";
import * as teamApiKeys from "~/routes/team-api-keys";
import { db } from "~/server/db.server";

describe("suppliers and offers", () => {
  it("saves an offer with price breaks and shows it to the team only", async () => {
    const a = await installerWithTeam("src-a");
    const b = await installerWithTeam("src-b");
    const maker = uniqueMaker("iso");
    const moduleId = await insertModule(maker, "QP-1", 150, 126);
    const supplierId = await addSupplier(a.client, "Valley Wholesale", "EUR", { defaultShippingPerOrder: "25.00", defaultLeadTimeDays: "3" });
    const offerId = await addOffer(
      a.client,
      offerForm(supplierId, moduleId, { "priceBreaks[0].minQuantity": "10", "priceBreaks[0].unitPrice": "55.20", validUntil: "2099-12-31" }),
    );

    const page = await a.client.loader(offerPage, `/sourcing/offers/${offerId}`, { offerId });
    expect(page.status).toBe(200);
    // Blank shipping and lead time took the supplier's defaults; money came back exactly as typed.
    expect(page.data.form).toMatchObject({
      unitPrice: "58.50",
      shippingPerOrder: "25.00",
      shippingPerUnit: "0",
      leadTimeDays: 3,
      priceBreaks: [{ minQuantity: 10, unitPrice: "55.20" }],
    });
    // Landed at 10: 10 × 55.20 + 25.00 = 577.00
    const ten = page.data.preview.find((r: { quantity: number }) => r.quantity === 10);
    expect(ten.total).toEqual({ amount: "577.00", currency: "EUR" });

    // Team B: not listed, 404 on pages and actions, nothing changed.
    const listB = await b.client.loader(sourcing, "/sourcing");
    expect(listB.data.suppliers).toHaveLength(0);
    expect(listB.data.offers).toHaveLength(0);
    expect((await b.client.loader(supplierPage, `/sourcing/suppliers/${supplierId}`, { supplierId })).status).toBe(404);
    expect((await b.client.action(supplierPage, `/sourcing/suppliers/${supplierId}`, { name: "Hijacked", currency: "EUR" }, { supplierId })).status).toBe(404);
    expect((await b.client.action(supplierPage, `/sourcing/suppliers/${supplierId}`, { intent: "delete" }, { supplierId })).status).toBe(404);
    expect((await b.client.loader(offerPage, `/sourcing/offers/${offerId}`, { offerId })).status).toBe(404);
    expect((await b.client.action(offerPage, `/sourcing/offers/${offerId}`, { intent: "delete" }, { offerId })).status).toBe(404);
    expect((await b.client.action(offerPage, `/sourcing/offers/${offerId}`, offerForm(supplierId, moduleId, { unitPrice: "1" }), { offerId })).status).toBe(
      404,
    );
    expect((await b.client.loader(offerPage, "/sourcing/offers/not-a-uuid", { offerId: "not-a-uuid" })).status).toBe(404);
    const compareB = await b.client.loader(compare, "/sourcing/compare/modules", { kind: "modules" });
    expect(compareB.data.comparison.rows).toHaveLength(0);
    expect((await b.client.loader(exportRoute, "/sourcing/export")).data).not.toContain("Valley Wholesale");

    // Team B cannot attach an offer to team A's supplier: the field says so and nothing is written.
    const bSupplier = await addSupplier(b.client, "B's own", "EUR");
    const stolen = await b.client.action(offerNew, "/sourcing/offers/new", offerForm(supplierId, moduleId));
    expect(stolen.status).toBe(400);
    expect(stolen.data.result.error.supplierId[0]).toMatch(/your team's suppliers/);
    expect(await db.selectFrom("offer").select("id").where("team_id", "=", b.teamId).execute()).toHaveLength(0);
    // …and B's offer page for its own supplier works; the offer row still belongs to team A.
    expect((await a.client.loader(supplierPage, `/sourcing/suppliers/${bSupplier}`, { supplierId: bSupplier })).status).toBe(404);
    // The API: B's key gets 404 for A's offer and an empty list; A's key gets the offer with its landed cost.
    const keyA = (await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Team A sync" })).data.created.key;
    const keyB = (await b.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "Team B sync" })).data.created.key;
    expect((await callApi(offerApi, "loader", `/api/v1/offers/${offerId}`, { headers: { Authorization: `Bearer ${keyB}` }, params: { offerId } })).status).toBe(
      404,
    );
    expect(
      (await callApi(offersApi, "loader", `/api/v1/offers?supplierId=${supplierId}`, { headers: { Authorization: `Bearer ${keyB}` } })).body.items,
    ).toEqual([]);
    const mine = await callApi(offerApi, "loader", `/api/v1/offers/${offerId}?quantity=10`, {
      headers: { Authorization: `Bearer ${keyA}` },
      params: { offerId },
    });
    expect(mine.status).toBe(200);
    expect(mine.body).toMatchObject({
      id: offerId,
      unitPrice: "58.50",
      landed: { quantityBought: 10, total: { amount: "577.00", currency: "EUR" }, rate: null },
    });
    const row = await db.selectFrom("offer").select(["team_id", "unit_price"]).where("id", "=", offerId).executeTakeFirstOrThrow();
    expect(row).toEqual({ team_id: a.teamId, unit_price: "58.50" });
  });

  it("names bad money and bad dates at their fields and saves nothing", async () => {
    const a = await installerWithTeam("src-bad");
    const moduleId = await insertModule(uniqueMaker("bad"), "X", 100);
    const supplierId = await addSupplier(a.client, "Bad input supplies");
    const result = await a.client.action(
      offerNew,
      "/sourcing/offers/new",
      offerForm(supplierId, moduleId, {
        unitPrice: "12,50",
        shippingPerUnit: "-1",
        validUntil: "2026-02-30",
        "priceBreaks[0].minQuantity": "10",
        "priceBreaks[0].unitPrice": "11.00",
        "priceBreaks[1].minQuantity": "10",
        "priceBreaks[1].unitPrice": "10.0000001",
      }),
    );
    expect(result.status).toBe(400);
    const errors = result.data.result.error;
    expect(errors.unitPrice[0]).toMatch(/decimal point.*12\.50/);
    expect(errors.shippingPerUnit[0]).toMatch(/cannot be negative/);
    expect(errors.validUntil[0]).toMatch(/real date/);
    expect(errors["priceBreaks[1].unitPrice"][0]).toMatch(/at most 6 digits/);
    expect(await db.selectFrom("offer").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(0);

    const dup = await a.client.action(supplierNew, "/sourcing/suppliers/new", { name: "bad INPUT supplies", currency: "EUR" });
    expect(dup.status).toBe(400);
    expect(dup.data.result.error.name[0]).toMatch(/already has a supplier/);
    const badCurrency = await a.client.action(supplierNew, "/sourcing/suppliers/new", { name: "Other", currency: "EURO" });
    expect(badCurrency.data.result.error.currency[0]).toMatch(/three-letter/);
  });

  it("keeps one offer per supplier and part", async () => {
    const a = await installerWithTeam("src-dup");
    const moduleId = await insertModule(uniqueMaker("dup"), "X", 100);
    const supplierId = await addSupplier(a.client, "Once only");
    await addOffer(a.client, offerForm(supplierId, moduleId));
    const again = await a.client.action(offerNew, "/sourcing/offers/new", offerForm(supplierId, moduleId, { unitPrice: "50" }));
    expect(again.status).toBe(400);
    expect(again.data.result.error.partId[0]).toMatch(/already has an offer/);
  });

  it("keeps an expired offer, flagged, and leaves it out of comparisons and of the API's valid list", async () => {
    const a = await installerWithTeam("src-expired");
    const moduleId = await insertModule(uniqueMaker("expired"), "Old", 100, 99);
    const supplierId = await addSupplier(a.client, "Old prices");
    const offerId = await addOffer(a.client, offerForm(supplierId, moduleId, { validUntil: "2099-01-01" }));
    // The supplier's price ran out yesterday (written directly: the form would take any date too).
    const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
    await db.updateTable("offer").set({ valid_until: yesterday }).where("id", "=", offerId).execute();

    const list = await a.client.loader(sourcing, "/sourcing");
    expect(list.data.offers).toHaveLength(1);
    expect(list.data.offers[0].expired).toBe(true);
    expect(list.data.suppliers[0].expiredCount).toBe(1);
    const comparison = (await a.client.loader(compare, "/sourcing/compare/modules", { kind: "modules" })).data.comparison;
    expect(comparison.rows).toHaveLength(0);
    expect(comparison.expiredCount).toBe(1);
    const key = (await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "expired check" })).data.created.key;
    const all = await callApi(offersApi, "loader", "/api/v1/offers", { headers: { Authorization: `Bearer ${key}` } });
    expect(all.body.items.map((o: { id: string; expired: boolean }) => [o.id, o.expired])).toEqual([[offerId, true]]);
    expect((await callApi(offersApi, "loader", "/api/v1/offers?includeExpired=false", { headers: { Authorization: `Bearer ${key}` } })).body.items).toEqual([]);
  });

  it("is refused to customers", async () => {
    const customer = await userWithRole("customer", "src-customer");
    expect((await customer.client.loader(sourcing, "/sourcing")).status).toBe(403);
    expect((await customer.client.loader(compare, "/sourcing/compare/modules", { kind: "modules" })).status).toBe(403);
  });
});

describe("money round trip", () => {
  it("stores 0.1 and 0.2 as numeric, reads them back exactly, and lands them at 0.30 and 3.00", async () => {
    const a = await installerWithTeam("src-money");
    const moduleId = await insertModule(uniqueMaker("money"), "Penny", 1, 1);
    const supplierId = await addSupplier(a.client, "Penny parts");
    const offerId = await addOffer(a.client, offerForm(supplierId, moduleId, { unitPrice: "0.1", shippingPerUnit: "0.2", shippingPerOrder: "0" }));

    // PostgreSQL adds the stored numerics exactly; a float column would give 0.30000000000000004.
    const stored = await db
      .selectFrom("offer")
      .select(["unit_price", "shipping_per_unit", sql<string>`unit_price + shipping_per_unit`.as("sum"), sql<string>`pg_typeof(unit_price)::text`.as("type")])
      .where("id", "=", offerId)
      .executeTakeFirstOrThrow();
    expect(stored).toEqual({ unit_price: "0.1", shipping_per_unit: "0.2", sum: "0.3", type: "numeric" });

    // The comparison: 1 module lands at 0.1 + 0.2 = 0.30 EUR; 10 at 1.00 + 2.00 = 3.00 EUR.
    const one = await a.client.loader(compare, "/sourcing/compare/modules?qty=1", { kind: "modules" });
    expect(one.data.comparison.rows[0].landed).toEqual({ amount: "0.30", currency: "EUR" });
    expect(one.data.comparison.rows[0].pricePerNameplateW).toEqual({ amount: "0.1", currency: "EUR" });
    const ten = await a.client.loader(compare, "/sourcing/compare/modules?qty=10", { kind: "modules" });
    expect(ten.data.comparison.rows[0].landed).toEqual({ amount: "3.00", currency: "EUR" });

    // The API sends money as decimal text, never as a JSON number.
    const keyA = (await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "money" })).data.created.key;
    const api = await callApi(offersApi, "loader", "/api/v1/offers?quantity=10", { headers: { Authorization: `Bearer ${keyA}` } });
    expect(api.status).toBe(200);
    expect(api.body.items[0]).toMatchObject({ unitPrice: "0.1", shippingPerUnit: "0.2", landed: { total: { amount: "3.00", currency: "EUR" } } });
  });
});
