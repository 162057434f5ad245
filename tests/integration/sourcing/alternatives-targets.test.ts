// Kit alternatives against the plan's own targets: an area limit saved with the plan (and its check),
// the search that never lists a kit over it, and the current kit's landed total with what each listed
// kit saves or costs more. Parts and prices are invented fixtures.
import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { choices, planningSetup } from "../helpers/planning-fixtures";
import { addOffer, addSupplier, callApi, insertModule, offerForm } from "./helpers";
import { db } from "~/server/db.server";
import * as plansNew from "~/routes/plans-new";
import * as alternativesPage from "~/routes/plan-alternatives";
import * as alternativesApi from "~/routes/api.v1.plans.$planId.alternatives";

/** "EUR 1,234.50", grouped by hand (en-GB), as every money figure is shown to people. */
function eur(amount: Decimal) {
  const [whole, fraction] = amount.toFixed(2).split(".");
  return `EUR ${whole.replace(/\B(?=(\d{3})+$)/g, ",")}.${fraction}`;
}

type Alt = { totalLandedCost: string; module: { id: string; quantity: number }; againstCurrentKit: { difference: string; words: string } | null };

describe("kit alternatives and the plan's targets", () => {
  it("keeps the area limit with the plan, never lists a kit over it, and sets each kit against the current one", async () => {
    const a = await installerWithTeam("alt-area");
    const setup = await planningSetup(a.teamId); // its module is 1690 × 1000 mm = 1.69 m²
    const limitM2 = 9;
    const saved = await a.client.action(plansNew, "/plans/new", {
      choices: JSON.stringify(choices(setup, {}, { maxArrayAreaM2: limitM2, acceptableUnmetDaysPerYear: 2 })),
    });
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const planId = saved.location!.split("/").pop()!;

    // The snapshot keeps the limit and the module's area; the plan has an array.area check.
    const rev = await db.selectFrom("kit_plan_revision").select(["inputs", "result"]).where("plan_id", "=", planId).executeTakeFirstOrThrow();
    const inputs = rev.inputs as { design: { maxArrayAreaM2?: number }; parts: { module: { areaM2?: number } } };
    expect(inputs.design.maxArrayAreaM2).toBe(limitM2);
    expect(inputs.parts.module.areaM2).toBeCloseTo(1.69, 10);
    const result = rev.result as { checks: { id: string; status: string }[]; array: { layout: { moduleCount: number } }; battery: { batteryCount: number } };
    const areaCheck = result.checks.find((c) => c.id === "array.area");
    // Two modules: 2 × 1.69 = 3.38 m², within the 9 m² the site allows.
    expect([result.array.layout.moduleCount, areaCheck?.status]).toEqual([2, "pass"]);

    // A small cheap module (1480 × 670 mm = 0.9916 m², 100 W) needs more area per watt than the plan's.
    const supplierId = await addSupplier(a.client, "Area supplier");
    const smallId = await insertModule("Areamaker", `AM-100-${Date.now().toString(36)}`, 100);
    await addOffer(a.client, offerForm(supplierId, setup.moduleId, { unitPrice: "140.00" }));
    await addOffer(a.client, offerForm(supplierId, smallId, { unitPrice: "30.00" }));
    await addOffer(a.client, offerForm(supplierId, setup.controllerId, { partKind: "controllers", unitPrice: "320.00" }));
    await addOffer(a.client, offerForm(supplierId, setup.batteryId, { partKind: "batteries", unitPrice: "610.00" }));
    await addOffer(a.client, offerForm(supplierId, setup.inverterId, { partKind: "inverters", unitPrice: "450.00" }));

    const res = await callApi(alternativesApi, "action", `/api/v1/plans/${planId}/alternatives`, {
      headers: { Cookie: a.client.cookieHeader() },
      params: { planId },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body;
    expect(body.acceptedUnmetDays).toBe(2);
    expect(body.pruned.find((p: { reason: string }) => p.reason.startsWith("Layouts whose modules cover more than"))?.count).toBeGreaterThan(0);
    const areaOf = (id: string) => (id === smallId ? 0.9916 : 1.69);
    expect(body.alternatives.length).toBeGreaterThan(0);
    for (const alt of body.alternatives as Alt[]) expect(alt.module.quantity * areaOf(alt.module.id)).toBeLessThanOrEqual(limitM2);

    // The current kit: every part has an offer, so it has a landed total; each row says what it saves.
    const current = body.currentKit.landedCost as string;
    expect(current).toMatch(/^\d+\.\d{2}$/);
    expect(body.currentKit.sentence).toBe(
      `Your current kit: ${eur(new Decimal(current))} at the team's cheapest offers (${result.array.layout.moduleCount} modules, ${result.battery.batteryCount} ${result.battery.batteryCount === 1 ? "battery" : "batteries"}).` +
        (body.currentKit.meetsPlan ? "" : " It does not itself meet every check and the unmet-days target of this plan."),
    );
    for (const alt of body.alternatives as Alt[]) {
      const diff = new Decimal(alt.totalLandedCost).minus(current);
      expect(alt.againstCurrentKit?.difference).toBe(diff.toFixed(2));
      expect(alt.againstCurrentKit?.words).toBe(diff.isNegative() ? `saves ${eur(diff.abs())}` : diff.isZero() ? "same cost" : `costs ${eur(diff)} more`);
    }

    // The page says the same, under a title that is true whether the kits are cheaper or dearer.
    const page = await a.client.loader(alternativesPage, `/plans/${planId}/alternatives`, { planId });
    expect(page.data.view.currentKit.sentence).toBe(body.currentKit.sentence);
    expect(page.data.view.alternatives[0].againstCurrentKit).toEqual(body.alternatives[0].againstCurrentKit);
  });

  it("names the part the current kit has no offer for", async () => {
    const a = await installerWithTeam("alt-nooffer");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const planId = saved.location!.split("/").pop()!;
    const supplierId = await addSupplier(a.client, "Partial supplier");
    await addOffer(a.client, offerForm(supplierId, setup.moduleId, { unitPrice: "140.00" }));
    await addOffer(a.client, offerForm(supplierId, setup.controllerId, { partKind: "controllers", unitPrice: "320.00" }));
    await addOffer(a.client, offerForm(supplierId, setup.inverterId, { partKind: "inverters", unitPrice: "450.00" }));
    const page = await a.client.loader(alternativesPage, `/plans/${planId}/alternatives`, { planId });
    expect(page.status).toBe(200);
    expect(page.data.view.currentKit.landedCost).toBeNull();
    expect(page.data.view.currentKit.sentence).toMatch(/^Your current kit cannot be costed: no valid offer for Fixture B-/);
  });
});
