// Deleting a site: refused while a quote rests on one of its plans (nothing deleted, the quote named);
// otherwise the site goes with its load sheets and plans, and the message says how many.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "./helpers/fixtures";
import { choices, planningSetup } from "./helpers/planning-fixtures";
import { BASE, type RouteClient } from "./helpers/route-client";
import { approvedQuote } from "./quotes/quote-fixtures";
import * as site from "~/routes/site";
import { db } from "~/server/db.server";
import { readFlash } from "~/server/flash.server";
import { planFromChoices } from "~/server/plans/plan-service.server";
import { createPlan } from "~/server/plans/plans.server";

async function flashOf(client: RouteClient) {
  return (await readFlash(new Request(BASE, { headers: { Cookie: client.cookieHeader() } }))).flash;
}

async function rowsOf(siteId: string) {
  const count = async (table: "site" | "kit_plan" | "load_sheet", column: "id" | "site_id") =>
    Number(
      (
        await db
          .selectFrom(table)
          .select((eb) => eb.fn.countAll<string>().as("n"))
          .where(column, "=", siteId)
          .executeTakeFirstOrThrow()
      ).n,
    );
  const revisions = await db
    .selectFrom("kit_plan_revision")
    .innerJoin("kit_plan", "kit_plan.id", "kit_plan_revision.plan_id")
    .select("kit_plan_revision.id")
    .where("kit_plan.site_id", "=", siteId)
    .execute();
  return {
    sites: await count("site", "id"),
    plans: await count("kit_plan", "site_id"),
    sheets: await count("load_sheet", "site_id"),
    revisions: revisions.length,
  };
}

describe("deleting a site", () => {
  it("is refused while a quote was priced from one of its plans, and deletes nothing", async () => {
    const { owner, quoteId } = await approvedQuote("site-del-quoted", { withPayment: false });
    const { siteId } = await db
      .selectFrom("quote")
      .innerJoin("kit_plan", "kit_plan.id", "quote.plan_id")
      .select("kit_plan.site_id as siteId")
      .where("quote.id", "=", quoteId)
      .executeTakeFirstOrThrow();
    const before = await rowsOf(siteId);
    expect(before).toMatchObject({ sites: 1, plans: 1, sheets: 1 });

    const page = await owner.client.loader(site, `/sites/${siteId}`, { siteId });
    expect(page.data.dependents).toEqual({ planCount: 1, loadSheetCount: 1, quoteNumbers: ["Q-0001"] });

    const refused = await owner.client.action(site, `/sites/${siteId}`, { intent: "delete" }, { siteId });
    expect(refused.status).toBe(302);
    expect(refused.location).toBe(`/sites/${siteId}`);
    const flash = await flashOf(owner.client);
    expect(flash?.kind).toBe("error");
    expect(flash?.message).toMatch(/cannot be deleted: quote Q-0001 was priced from its kit plans/);
    expect(await rowsOf(siteId)).toEqual(before);
    expect(await db.selectFrom("quote").select("id").where("id", "=", quoteId).executeTakeFirst()).toBeDefined();
  });

  it("deletes a site whose plan has no quote, with its plans and load sheets, and says how many", async () => {
    const a = await installerWithTeam("site-del-plan");
    const setup = await planningSetup(a.teamId);
    const outcome = await planFromChoices(a.teamId, choices(setup));
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.fields));
    await createPlan(a.teamId, null, outcome.choices, outcome.input, outcome.plan);
    await createPlan(a.teamId, null, { ...outcome.choices, name: "Second kit" }, outcome.input, outcome.plan);
    expect(await rowsOf(setup.siteId)).toEqual({ sites: 1, plans: 2, sheets: 1, revisions: 2 });

    const page = await a.client.loader(site, `/sites/${setup.siteId}`, { siteId: setup.siteId });
    expect(page.data.dependents).toEqual({ planCount: 2, loadSheetCount: 1, quoteNumbers: [] });

    const deleted = await a.client.action(site, `/sites/${setup.siteId}`, { intent: "delete" }, { siteId: setup.siteId });
    expect(deleted.status).toBe(302);
    expect(deleted.location).toBe("/sites");
    const flash = await flashOf(a.client);
    expect(flash?.kind).toBe("info");
    expect(flash?.message).toMatch(/deleted, with its 1 load sheet and 2 saved kit plans \(with every revision\)\.$/);
    expect(await rowsOf(setup.siteId)).toEqual({ sites: 0, plans: 0, sheets: 0, revisions: 0 });
  });

  it("answers 404 to another team, which deletes nothing", async () => {
    const a = await installerWithTeam("site-del-owner");
    const b = await installerWithTeam("site-del-other");
    const setup = await planningSetup(a.teamId);
    expect((await b.client.action(site, `/sites/${setup.siteId}`, { intent: "delete" }, { siteId: setup.siteId })).status).toBe(404);
    expect((await rowsOf(setup.siteId)).sites).toBe(1);
  });
});
