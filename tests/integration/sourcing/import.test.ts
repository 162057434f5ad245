// Offer CSV import: the dry run writes nothing and reports every bad row by number; a clean file is
// written whole (new supplier, offers, breaks); one bad row and nothing is written; importing again
// updates instead of duplicating; the API does the same with a team key.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { addSupplier, callApi, insertBattery, insertModule, uniqueMaker } from "./helpers";
import * as importRoute from "~/routes/sourcing.import";
import * as exportRoute from "~/routes/sourcing.export";
import * as importApi from "~/routes/api.v1.offers.import";
import * as offersApi from "~/routes/api.v1.offers";
import * as teamApiKeys from "~/routes/team-api-keys";
import { db } from "~/server/db.server";
import { todayIso } from "~/domain/sourcing/offer-validity";

const HEADER =
  "supplier,kind,maker,model,sku,currency,unit_price,price_breaks,minimum_order,shipping_per_unit,shipping_per_order,lead_time_days,stock,valid_until,notes";

async function counts(teamId: string) {
  const [suppliers, offers] = await Promise.all([
    db.selectFrom("supplier").select("id").where("team_id", "=", teamId).execute(),
    db.selectFrom("offer").select("id").where("team_id", "=", teamId).execute(),
  ]);
  return { suppliers: suppliers.length, offers: offers.length };
}

async function parts(label: string) {
  const maker = uniqueMaker(label);
  return {
    maker,
    qp: await insertModule(maker, "QP-150P", 150, 126),
    fm: await insertModule(maker, "FM-120M", 120, 118.8),
    battery: await insertBattery(maker, "LFP-100"),
  };
}

function cleanCsv(maker: string) {
  return [
    HEADER,
    `Kestrel Row,module,${maker},QP-150P,K-1,EUR,57.45,10:55.90; 40:54.40,2,0.80,35.00,6,60,2099-06-30,Winter list`,
    `Kestrel Row,module,${maker},FM-120M,K-2,,47.90,,,0.80,35.00,6,48,,`,
    `Kestrel Row,battery,${maker},LFP-100,K-3,,415.00,4:405.00,,6.50,35.00,8,10,,`,
  ].join("\n");
}

describe("offer CSV import", () => {
  it("checks without writing, then writes every row with a new supplier", async () => {
    const a = await installerWithTeam("imp-clean");
    const { maker } = await parts("clean");
    const before = await counts(a.teamId);
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: cleanCsv(maker) });
    expect(check.status).toBe(200);
    expect(check.data.report).toMatchObject({
      rowCount: 3,
      readyCount: 3,
      problems: [],
      newSuppliers: [{ name: "Kestrel Row", currency: "EUR" }],
      newOffers: 3,
      updatedOffers: 0,
    });
    expect(await counts(a.teamId)).toEqual(before);

    const done = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: cleanCsv(maker) });
    expect(done.status).toBe(302);
    expect(await counts(a.teamId)).toEqual({ suppliers: 1, offers: 3 });
    const qp = await db
      .selectFrom("offer")
      .innerJoin("pv_module", "pv_module.id", "offer.part_id")
      .select(["offer.id", "offer.unit_price", "offer.minimum_order", "offer.shipping_per_order", "offer.currency"])
      .where("offer.team_id", "=", a.teamId)
      .where("pv_module.model", "=", "QP-150P")
      .executeTakeFirstOrThrow();
    expect(qp).toMatchObject({ unit_price: "57.45", minimum_order: 2, shipping_per_order: "35.00", currency: "EUR" });
    const breaks = await db
      .selectFrom("offer_price_break")
      .select(["min_quantity", "unit_price"])
      .where("offer_id", "=", qp.id)
      .orderBy("min_quantity")
      .execute();
    expect(breaks).toEqual([
      { min_quantity: 10, unit_price: "55.90" },
      { min_quantity: 40, unit_price: "54.40" },
    ]);

    // The same file again replaces the terms instead of adding copies.
    const again = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: cleanCsv(maker).replace("57.45", "56.00") });
    expect(again.data.report).toMatchObject({ newSuppliers: [], newOffers: 0, updatedOffers: 3 });
    await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: cleanCsv(maker).replace("57.45", "56.00") });
    expect(await counts(a.teamId)).toEqual({ suppliers: 1, offers: 3 });
    expect((await db.selectFrom("offer").select("unit_price").where("id", "=", qp.id).executeTakeFirstOrThrow()).unit_price).toBe("56.00");

    // Export → import round trip: every offer reads back unchanged.
    const exported = await a.client.loader(exportRoute, "/sourcing/export");
    expect(exported.headers.get("Content-Type")).toContain("text/csv");
    const reimport = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: exported.data });
    expect(reimport.data.report).toMatchObject({ readyCount: 3, problems: [], updatedOffers: 3, newOffers: 0 });
  });

  it("reports each bad row by number, and one bad row writes nothing", async () => {
    const a = await installerWithTeam("imp-bad");
    const { maker } = await parts("bad");
    const lines = cleanCsv(maker).split("\n");
    const bad = [
      ...lines,
      `Kestrel Row,module,${maker},QP-999,K-4,,12.00,,,,,,,,`, // row 5: unknown part
      `Kestrel Row,module,${maker},FM-120M,K-5,,12.5.0,,,,,,,,`, // row 6: bad price (and a repeat of row 3)
      `Kestrel Row,battery,${maker},LFP-100,K-6,,99,,,,,,,2020-01-31,`, // row 7: expired (and a repeat of row 4)
    ].join("\n");
    const check = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: bad });
    const report = check.data.report;
    expect(report.rowCount).toBe(6);
    expect(report.problems.map((p: { row: number }) => p.row)).toEqual([5, 6, 7]);
    const messages = (row: number) =>
      report.problems
        .find((p: { row: number }) => p.row === row)
        .errors.map((e: { column: string; message: string }) => `${e.column}: ${e.message}`)
        .join(" | ");
    expect(messages(5)).toMatch(/model: No module ".* QP-999" in the catalogue/);
    expect(messages(6)).toMatch(/unit_price: The unit price must be a plain number/);
    expect(messages(7)).toMatch(new RegExp(`valid_until: The offer expired on 2020-01-31 \\(today is ${todayIso()}\\)`));

    const refused = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: bad });
    expect(refused.status).toBe(400);
    expect(refused.data.report.problems).toHaveLength(3);
    expect(await counts(a.teamId)).toEqual({ suppliers: 0, offers: 0 });

    // A repeated supplier and part inside one file is a problem too.
    const repeated = [...lines, `kestrel row,module,${maker},QP-150P,K-7,,50,,,,,,,,`].join("\n");
    const rep = await a.client.action(importRoute, "/sourcing/import", { intent: "check", csvText: repeated });
    expect(rep.data.report.problems[0]).toMatchObject({
      row: 5,
      errors: [{ column: "model", message: expect.stringMatching(/Row 2 already has an offer from kestrel row/) }],
    });
  });

  it("asks for a new supplier's currency, and warns when no rate converts it", async () => {
    const a = await installerWithTeam("imp-cur");
    const { maker } = await parts("cur");
    const noCurrency = await a.client.action(importRoute, "/sourcing/import", {
      intent: "check",
      csvText: `${HEADER}\nNew Co,module,${maker},QP-150P,,,10,,,,,,,,`,
    });
    expect(noCurrency.data.report.problems[0].errors[0]).toMatchObject({ column: "currency", message: expect.stringMatching(/new supplier/) });
    const gbp = await a.client.action(importRoute, "/sourcing/import", {
      intent: "check",
      csvText: `${HEADER}\nNew Co,module,${maker},QP-150P,,GBP,10,,,,,,,,`,
    });
    expect(gbp.data.report.problems).toEqual([]);
    expect(gbp.data.report.warnings[0]).toMatch(/No GBP → EUR exchange rate/);
    // An existing supplier's currency is used when the row gives none.
    await addSupplier(a.client, "Old Co", "CHF");
    const old = await a.client.action(importRoute, "/sourcing/import", { intent: "import", csvText: `${HEADER}\nold co,module,${maker},FM-120M,,,10,,,,,,,,` });
    expect(old.status).toBe(302);
    expect((await db.selectFrom("offer").select("currency").where("team_id", "=", a.teamId).executeTakeFirstOrThrow()).currency).toBe("CHF");
    expect(await counts(a.teamId)).toEqual({ suppliers: 1, offers: 1 });
  });
});

describe("offer import API", () => {
  it("dry-runs by default, writes with dryRun=false, refuses a bad file whole, and keeps teams apart", async () => {
    const a = await installerWithTeam("imp-api-a");
    const b = await installerWithTeam("imp-api-b");
    const { maker } = await parts("api");
    const keyA = (await a.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "A import" })).data.created.key;
    const keyB = (await b.client.action(teamApiKeys, "/team/api-keys", { intent: "create", name: "B import" })).data.created.key;
    const auth = (key: string) => ({ Authorization: `Bearer ${key}` });

    expect((await callApi(importApi, "action", "/api/v1/offers/import", { body: cleanCsv(maker), contentType: "text/csv" })).status).toBe(401);
    const dry = await callApi(importApi, "action", "/api/v1/offers/import", { body: cleanCsv(maker), contentType: "text/csv", headers: auth(keyA) });
    expect(dry.status).toBe(200);
    expect(dry.body).toMatchObject({ dryRun: true, written: false, report: { readyCount: 3 } });
    expect(await counts(a.teamId)).toEqual({ suppliers: 0, offers: 0 });

    const badBody = JSON.stringify({ csv: `${cleanCsv(maker)}\nKestrel Row,module,${maker},NOPE,,,1,,,,,,,,` });
    const bad = await callApi(importApi, "action", "/api/v1/offers/import?dryRun=false", {
      body: badBody,
      contentType: "application/json",
      headers: auth(keyA),
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields["rows.5.model"]).toMatch(/No module/);
    expect(await counts(a.teamId)).toEqual({ suppliers: 0, offers: 0 });

    const written = await callApi(importApi, "action", "/api/v1/offers/import?dryRun=false", {
      body: cleanCsv(maker),
      contentType: "text/csv",
      headers: auth(keyA),
    });
    expect(written.status).toBe(201);
    expect(await counts(a.teamId)).toEqual({ suppliers: 1, offers: 3 });

    const listA = await callApi(offersApi, "loader", "/api/v1/offers?kind=modules", { headers: auth(keyA) });
    expect(listA.body.items.map((o: { part: { model: string } }) => o.part.model).sort()).toEqual(["FM-120M", "QP-150P"]);
    const listB = await callApi(offersApi, "loader", "/api/v1/offers", { headers: auth(keyB) });
    expect(listB.body.items).toEqual([]);
    const supplierA = listA.body.items[0].supplier.id;
    expect((await callApi(offersApi, "loader", `/api/v1/offers?supplierId=${supplierA}`, { headers: auth(keyB) })).body.items).toEqual([]);
    expect((await callApi(offersApi, "loader", "/api/v1/offers?kind=panels&quantity=0", { headers: auth(keyA) })).body.error.fields).toMatchObject({
      kind: expect.any(String),
      quantity: expect.any(String),
    });
    expect((await callApi(importApi, "action", "/api/v1/offers/import?dryRun=maybe", { body: "x", contentType: "text/csv", headers: auth(keyA) })).status).toBe(
      400,
    );
    expect((await callApi(importApi, "action", "/api/v1/offers/import", { body: "x", contentType: "application/xml", headers: auth(keyA) })).status).toBe(415);
  });
});
