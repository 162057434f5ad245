// Quotes end to end through the route modules: drafted from a plan at the team's offer prices, edited,
// sent by e-mail to a new customer account, opened, revised, approved; and who may see what.
import { describe, expect, it } from "vitest";
import { firstLink, installerWithTeam, latestMailTo, userWithRole } from "../helpers/fixtures";
import { RouteClient, uniqueEmail } from "../helpers/route-client";
import { editorForm, teamWithPlan } from "./quote-helpers";
import * as quotes from "~/routes/quotes";
import * as quotePage from "~/routes/quote";
import * as quotePrint from "~/routes/quote-print";
import * as quoteAccess from "~/routes/quote-access";
import * as myQuote from "~/routes/my-quote";
import * as myQuotes from "~/routes/my-quotes";
import * as quotesApi from "~/routes/api.v1.quotes";
import * as quoteApi from "~/routes/api.v1.quote";
import * as modulesApi from "~/routes/api.v1.modules";
import * as catalogue from "~/routes/catalogue";
import * as meApi from "~/routes/api.v1.me";
import { db } from "~/server/db.server";
import type { QuoteEditorForm } from "~/lib/quote-forms";

async function draftQuote(team: Awaited<ReturnType<typeof teamWithPlan>>) {
  const created = await team.client.action(quotes, "/quotes", { planId: team.planId });
  expect(created.status, JSON.stringify(created.data)).toBe(302);
  const quoteId = created.location!.split("/").pop()!;
  const page = await team.client.loader(quotePage, `/quotes/${quoteId}`, { quoteId });
  expect(page.status).toBe(200);
  return { quoteId, page };
}

/** Net 860.00, tax 124.00 (20 % on 540.00, 5 % on 320.00), gross 984.00, deposit 30 % 295.20 — by hand below. */
function pricedLines(values: QuoteEditorForm, customerEmail: string): QuoteEditorForm {
  const module = values.lines.find((l) => l.partKind === "modules")!;
  return {
    ...values,
    customerName: "Ilse Warden",
    customerEmail,
    marginPct: "20",
    discountPct: "0",
    taxRatePct: "20",
    depositPct: "30",
    validUntil: "2099-06-30",
    lines: [
      // 4 × (100.00 × 1.20 = 120.00) = 480.00 at 20 %
      { ...module, quantity: "4", unitCost: "100.00" },
      // 8 h × 40.00, no margin, reduced tax 5 %: 320.00
      { kind: "labour", description: "Installation labour (hours)", quantity: "8", unitCost: "40.00", marginPct: "0", taxRatePct: "5" },
      // 50.00 × 1.20 = 60.00 at 20 %
      { kind: "freight", description: "Freight to site", quantity: "1", unitCost: "50.00" },
    ],
  };
}

describe("quotes", () => {
  it("drafts from the plan at the cheapest offer, refuses to send unpriced lines, then sends to a new customer", async () => {
    const team = await teamWithPlan("q-flow");
    const { quoteId, page } = await draftQuote(team);
    const values = page.data.editor as QuoteEditorForm;
    const moduleLine = values.lines.find((l) => l.partKind === "modules")!;
    expect(moduleLine.unitCost).toBe("100");
    expect(moduleLine.offerId).toBeTruthy();
    expect(values.lines.map((l) => l.kind)).toEqual(expect.arrayContaining(["part", "labour", "mounting", "freight"]));
    expect(values.customerName).toBe("Warden");

    const unpriced = await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId });
    expect(unpriced.status).toBe(400);

    const customerEmail = uniqueEmail("q-customer");
    const saved = await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm(pricedLines(values, customerEmail)), { quoteId });
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const rev = await db.selectFrom("quote_revision").selectAll().where("quote_id", "=", quoteId).executeTakeFirstOrThrow();
    expect([rev.net, rev.tax, rev.gross, rev.deposit]).toEqual(["860.00", "124.00", "984.00", "295.20"]);
    expect(rev.tax_bands).toEqual([
      { ratePct: "20", net: "540.00", tax: "108.00" },
      { ratePct: "5", net: "320.00", tax: "16.00" },
    ]);

    const sent = await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId });
    expect(sent.status, JSON.stringify(sent.data)).toBe(302);
    const account = await db.selectFrom("user").select(["id", "role"]).where("email", "=", customerEmail).executeTakeFirstOrThrow();
    expect(account.role).toBe("customer");
    const mail = await latestMailTo(customerEmail);
    expect(mail.subject).toMatch(/Q-0001/);
    expect(mail.text).toContain("EUR 984.00");
    const link = firstLink(mail.text, "/quote-access/");

    // The customer chooses a first password from the e-mail's link and lands on the quote, signed in.
    const customer = new RouteClient();
    const token = link.pathname.split("/").pop()!;
    const access = await customer.loader(quoteAccess, link.pathname, { token });
    expect(access.data.state).toBe("choose-password");
    const chosen = await customer.action(quoteAccess, link.pathname, { password: "a-long-password-1", confirmPassword: "a-long-password-1" }, { token });
    expect(chosen.status).toBe(302);
    expect(chosen.location).toBe(`/my-quotes/${quoteId}`);
    const view = await customer.loader(myQuote, `/my-quotes/${quoteId}`, { quoteId });
    expect(view.status).toBe(200);
    expect(view.data.status).toBe("viewed");
    expect(view.data.doc.totals.gross).toBe("984.00");
    // Costs and margins never reach the customer's page.
    for (const word of ["unit_cost", "unitCost", "margin_pct", "marginPct", "100.00"]) expect(JSON.stringify(view.data)).not.toContain(word);

    // A second visit to the link sends the customer to sign in rather than set a password again.
    const again = await new RouteClient().loader(quoteAccess, link.pathname, { token });
    expect(again.location).toBe(`/sign-in?redirectTo=${encodeURIComponent(`/my-quotes/${quoteId}`)}`);

    // Editing a sent quote makes revision 2; the customer keeps reading revision 1 until it is sent.
    const edited = pricedLines(values, customerEmail);
    edited.lines[2] = { ...edited.lines[2], unitCost: "75.00" };
    const revised = await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm({ ...edited, note: "Freight by the valley carrier" }), { quoteId });
    expect(revised.status).toBe(302);
    expect((await customer.loader(myQuote, `/my-quotes/${quoteId}`, { quoteId })).data.doc.revision).toBe(1);
    const old = await team.client.loader(quotePrint, `/quotes/${quoteId}/print?revision=1`, { quoteId });
    expect(old.data.doc.totals.gross).toBe("984.00");
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId })).status).toBe(302);
    const latest = await customer.loader(myQuote, `/my-quotes/${quoteId}`, { quoteId });
    // Freight 75.00 × 1.20 = 90.00: net 890.00, tax 114.00 + 16.00 = 130.00, gross 1020.00
    expect(latest.data.doc.revision).toBe(2);
    expect(latest.data.doc.totals.gross).toBe("1020.00");

    const approved = await customer.action(myQuote, `/my-quotes/${quoteId}`, { intent: "approve", acceptedName: "Ilse Warden", confirm: "on" }, { quoteId });
    expect(approved.status, JSON.stringify(approved.data)).toBe(302);
    const teamMail = await latestMailTo(team.email);
    expect(teamMail.subject).toMatch(/approved quote Q-0001/);
    const timeline = (await team.client.loader(quotePage, `/quotes/${quoteId}`, { quoteId })).data.events.map((e: { kind: string }) => e.kind);
    expect(timeline).toEqual(["created", "sent", "viewed", "revised", "sent", "viewed", "approved"]);
    // Approved quotes are settled: no more edits.
    const late = await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm(edited), { quoteId });
    expect(late.status).toBe(409);
  });

  it("keeps quotes to their team and their customer", async () => {
    const team = await teamWithPlan("q-access");
    const { quoteId, page } = await draftQuote(team);
    const customerEmail = uniqueEmail("q-access-customer");
    await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm(pricedLines(page.data.editor, customerEmail)), { quoteId });
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId })).status).toBe(302);

    const otherTeam = await installerWithTeam("q-access-other");
    expect((await otherTeam.client.loader(quotePage, `/quotes/${quoteId}`, { quoteId })).status).toBe(404);
    expect((await otherTeam.client.loader(quotePrint, `/quotes/${quoteId}/print`, { quoteId })).status).toBe(404);
    expect((await otherTeam.client.action(quotePage, `/quotes/${quoteId}`, { intent: "withdraw" }, { quoteId })).status).toBe(404);
    expect((await otherTeam.client.loader(quotes, "/quotes")).data.quotes).toEqual([]);

    // The API: the team reads its quote with costs; another team gets 404; anonymous 401.
    const own = await team.client.loader(quoteApi, `/api/v1/quotes/${quoteId}`, { quoteId });
    expect(own.status).toBe(200);
    expect(own.data.revision.totals.gross).toBe("984.00");
    expect(own.data.revision.lines[0].unitCost).toBe("100.00");
    expect((await team.client.loader(quotesApi, "/api/v1/quotes?status=sent")).data.items.map((q: { id: string }) => q.id)).toContain(quoteId);
    expect((await team.client.loader(quotesApi, "/api/v1/quotes?status=bogus")).status).toBe(400);
    expect((await otherTeam.client.loader(quoteApi, `/api/v1/quotes/${quoteId}`, { quoteId })).status).toBe(404);
    expect((await new RouteClient().loader(quoteApi, `/api/v1/quotes/${quoteId}`, { quoteId })).status).toBe(401);

    const otherCustomer = await userWithRole("customer", "q-access-cust2");
    expect((await otherCustomer.client.loader(myQuote, `/my-quotes/${quoteId}`, { quoteId })).status).toBe(404);
    expect(
      (await otherCustomer.client.action(myQuote, `/my-quotes/${quoteId}`, { intent: "approve", acceptedName: "X Y", confirm: "on" }, { quoteId })).status,
    ).toBe(404);
    expect((await otherCustomer.client.loader(myQuotes, "/my-quotes")).data.quotes).toEqual([]);
    // A customer sees nothing but what was sent to them: no catalogue, no planner API; /me still answers.
    expect((await otherCustomer.client.loader(catalogue, "/catalogue")).status).toBe(403);
    expect((await otherCustomer.client.loader(modulesApi, "/api/v1/modules")).status).toBe(403);
    expect((await otherCustomer.client.loader(meApi, "/api/v1/me")).status).toBe(200);
    // A customer has no team pages.
    expect((await otherCustomer.client.loader(quotes, "/quotes")).status).toBe(403);
    expect((await otherCustomer.client.loader(quotePage, `/quotes/${quoteId}`, { quoteId })).status).toBe(403);

    // Withdrawn: the customer's link and page stop working.
    const link = firstLink((await latestMailTo(customerEmail)).text, "/quote-access/");
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "withdraw", reason: "Wrong site" }, { quoteId })).status).toBe(302);
    const token = link.pathname.split("/").pop()!;
    expect((await new RouteClient().loader(quoteAccess, link.pathname, { token })).data.state).toBe("stale");
  });

  it("takes a decline with its comment, and refuses a plan with an unaccepted failing safety check", async () => {
    const team = await teamWithPlan("q-decline");
    const { quoteId, page } = await draftQuote(team);
    const customer = await userWithRole("customer", "q-decline-cust");
    await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm(pricedLines(page.data.editor, customer.email)), { quoteId });
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId })).status).toBe(302);
    const empty = await customer.client.action(myQuote, `/my-quotes/${quoteId}`, { intent: "decline", comment: "" }, { quoteId });
    expect(empty.status).toBe(400);
    const declined = await customer.client.action(myQuote, `/my-quotes/${quoteId}`, { intent: "decline", comment: "Too dear for this summer" }, { quoteId });
    expect(declined.status).toBe(302);
    const q = await db.selectFrom("quote").select(["status", "decision_comment"]).where("id", "=", quoteId).executeTakeFirstOrThrow();
    expect(q).toEqual({ status: "declined", decision_comment: "Too dear for this summer" });
    expect((await customer.client.action(myQuote, `/my-quotes/${quoteId}`, { intent: "pay" }, { quoteId })).status).toBe(409);

    // Make the plan's latest revision fail a safety check with no reason recorded.
    const rev = await db.selectFrom("kit_plan_revision").select(["id", "result"]).where("plan_id", "=", team.planId).executeTakeFirstOrThrow();
    const result = rev.result;
    const check = result.checks.find((c) => c.kind === "safety")!;
    check.status = "fail";
    await db
      .updateTable("kit_plan_revision")
      .set({ result: JSON.stringify(result) })
      .where("id", "=", rev.id)
      .execute();
    const refused = await team.client.action(quotes, "/quotes", { planId: team.planId });
    expect(refused.status).toBe(409);
    expect(refused.data.message).toContain(check.title);
  });

  it("expires a sent quote after its last valid day: the customer can no longer approve it, the team can send a new date", async () => {
    const team = await teamWithPlan("q-expiry");
    const { quoteId, page } = await draftQuote(team);
    const customer = await userWithRole("customer", "q-expiry-cust");
    await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm(pricedLines(page.data.editor, customer.email)), { quoteId });
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId })).status).toBe(302);
    await db.updateTable("quote_revision").set({ valid_until: "2020-01-31" }).where("quote_id", "=", quoteId).execute();

    const view = await customer.client.loader(myQuote, `/my-quotes/${quoteId}`, { quoteId });
    expect(view.data.status).toBe("expired");
    const late = await customer.client.action(
      myQuote,
      `/my-quotes/${quoteId}`,
      { intent: "approve", acceptedName: "Late Customer", confirm: "on" },
      { quoteId },
    );
    expect(late.status).toBe(409);
    const events = await db.selectFrom("quote_event").select("kind").where("quote_id", "=", quoteId).where("kind", "=", "expired").execute();
    expect(events).toHaveLength(1);

    // A new revision with a later date, sent again, can be approved.
    const values = (await team.client.loader(quotePage, `/quotes/${quoteId}`, { quoteId })).data.editor as QuoteEditorForm;
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm({ ...values, validUntil: "2099-01-31" }), { quoteId })).status).toBe(302);
    expect((await team.client.action(quotePage, `/quotes/${quoteId}`, { intent: "send" }, { quoteId })).status).toBe(302);
    const ok = await customer.client.action(myQuote, `/my-quotes/${quoteId}`, { intent: "approve", acceptedName: "On Time", confirm: "on" }, { quoteId });
    expect(ok.status).toBe(302);
  });

  it("offers each part line the team's valid offers, cheapest first, and refuses another team's offer", async () => {
    const team = await teamWithPlan("q-offers", { moduleUnitPrice: "100.00" });
    const dearer = await db
      .insertInto("supplier")
      .values({ team_id: team.teamId, name: "Dearer supplies", currency: "EUR" })
      .returning("id")
      .executeTakeFirstOrThrow();
    await db
      .insertInto("offer")
      .values({
        team_id: team.teamId,
        supplier_id: dearer.id,
        part_kind: "modules",
        part_id: team.setup.moduleId,
        currency: "EUR",
        unit_price: "95.00",
        shipping_per_order: "40.00",
      })
      .execute();
    const { quoteId, page } = await draftQuote(team);
    const values = page.data.editor as QuoteEditorForm;
    const module = values.lines.find((l) => l.partKind === "modules")!;
    const n = Number(module.quantity);
    const choices = page.data.offerChoices[`modules:${team.setup.moduleId}`] as { supplierName: string; unitCost: string }[];
    // 100.00 a unit, or 95.00 a unit plus 40.00 an order: cheaper per unit only from 9 modules up.
    const dearerUnit = ((95 * n + 40) / n).toFixed(4).replace(/\.?0+$/, "");
    expect(choices.map((c) => c.supplierName)).toEqual(n >= 9 ? ["Dearer supplies", "Supplier q-offers"] : ["Supplier q-offers", "Dearer supplies"]);
    expect(choices.find((c) => c.supplierName === "Dearer supplies")!.unitCost).toBe(dearerUnit);
    expect(module.unitCost).toBe(choices[0].unitCost);

    const other = await teamWithPlan("q-offers-other");
    const foreign = await db.selectFrom("offer").select("id").where("team_id", "=", other.teamId).executeTakeFirstOrThrow();
    const lines = values.lines.map((l) => (l === module ? { ...l, offerId: foreign.id } : l.unitCost === "0" ? { ...l, unitCost: "10" } : l));
    const refused = await team.client.action(quotePage, `/quotes/${quoteId}`, editorForm({ ...values, customerEmail: "buyer@example.org", lines }), { quoteId });
    expect(refused.status).toBe(400);
    expect(JSON.stringify(refused.data)).toMatch(/not one of your team's/);
  });
});
