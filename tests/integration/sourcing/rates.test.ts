// The team's quoting currency and dated exchange rates: set through the page, used by the comparison
// (which names the rate and its date), refused with field messages, and private to the team.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { addOffer, addSupplier, insertModule, offerForm, uniqueMaker } from "./helpers";
import * as rates from "~/routes/sourcing.rates";
import * as compare from "~/routes/sourcing.compare";
import { db } from "~/server/db.server";

describe("quoting currency and rates", () => {
  it("converts offers with the newest rate on or before today and says which", async () => {
    const a = await installerWithTeam("rates-a");
    const b = await installerWithTeam("rates-b");
    const moduleId = await insertModule(uniqueMaker("rates"), "R-100", 100, 95);
    const supplierId = await addSupplier(a.client, "Pound Parts", "GBP");
    await addOffer(a.client, offerForm(supplierId, moduleId, { unitPrice: "40.00", shippingPerUnit: "0", shippingPerOrder: "10.00" }));

    // No rate yet: the row says so and has no euro figures.
    const before = await a.client.loader(compare, "/sourcing/compare/modules?qty=5", { kind: "modules" });
    expect(before.data.comparison.rows[0]).toMatchObject({ landed: null, missingRate: expect.stringMatching(/No GBP → EUR rate/) });

    expect(
      (await a.client.action(rates, "/sourcing/rates", { intent: "add-rate", fromCurrency: "gbp", toCurrency: "EUR", rate: "1.15", asOf: "2026-01-05" }))
        .status,
    ).toBe(302);
    expect(
      (await a.client.action(rates, "/sourcing/rates", { intent: "add-rate", fromCurrency: "GBP", toCurrency: "EUR", rate: "1.1725", asOf: "2026-02-01" }))
        .status,
    ).toBe(302);
    expect(
      (await a.client.action(rates, "/sourcing/rates", { intent: "add-rate", fromCurrency: "GBP", toCurrency: "EUR", rate: "9.99", asOf: "2099-01-01" }))
        .status,
    ).toBe(302);
    // 5 × 40.00 + 10.00 = 210.00 GBP; × 1.1725 = 246.225 → 246.23 EUR (the 2099 rate is not yet in force).
    const after = await a.client.loader(compare, "/sourcing/compare/modules?qty=5", { kind: "modules" });
    expect(after.data.comparison.rows[0]).toMatchObject({
      offerLanded: { amount: "210.00", currency: "GBP" },
      landed: { amount: "246.23", currency: "EUR" },
      rate: { from: "GBP", to: "EUR", rate: "1.1725", asOf: "2026-02-01" },
      missingRate: null,
    });

    // Switch the quoting currency to GBP: no conversion, no rate shown.
    expect((await a.client.action(rates, "/sourcing/rates", { intent: "currency", quotingCurrency: "gbp" })).status).toBe(302);
    const inPounds = await a.client.loader(compare, "/sourcing/compare/modules?qty=5", { kind: "modules" });
    expect(inPounds.data.comparison.rows[0]).toMatchObject({ landed: { amount: "210.00", currency: "GBP" }, rate: null });

    // Team B sees none of it and cannot delete A's rates.
    const pageB = await b.client.loader(rates, "/sourcing/rates");
    expect(pageB.data.rates).toEqual([]);
    expect(pageB.data.quoting).toEqual({ currency: "EUR", chosen: false });
    const rateId = (await a.client.loader(rates, "/sourcing/rates")).data.rates[0].id;
    expect((await b.client.action(rates, "/sourcing/rates", { intent: "delete-rate", rateId })).status).toBe(404);
    expect(await db.selectFrom("exchange_rate").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(3);
  });

  it("names bad rates at their fields", async () => {
    const a = await installerWithTeam("rates-bad");
    const result = await a.client.action(rates, "/sourcing/rates", {
      intent: "add-rate",
      fromCurrency: "EUR",
      toCurrency: "EUR",
      rate: "0",
      asOf: "yesterday",
    });
    expect(result.status).toBe(400);
    expect(result.data.intent).toBe("add-rate");
    const errors = result.data.result.error;
    expect(errors.rate[0]).toMatch(/above 0/);
    expect(errors.asOf[0]).toMatch(/YYYY-MM-DD/);
    expect(errors.toCurrency[0]).toMatch(/two different currencies/);
    expect(await db.selectFrom("exchange_rate").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(0);
  });
});
