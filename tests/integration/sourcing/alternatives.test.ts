// Kit alternatives through the API and the page: team-scoped, built from the team's valid offers, and
// applying one saves a new revision of the plan with a note. Parts and prices are invented fixtures.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { choices, planningSetup } from "../helpers/planning-fixtures";
import { addOffer, addSupplier, callApi, insertModule, offerForm } from "./helpers";
import * as plansNew from "~/routes/plans-new";
import * as planPage from "~/routes/plan";
import * as alternativesPage from "~/routes/plan-alternatives";
import * as alternativesApi from "~/routes/api.v1.plans.$planId.alternatives";

async function teamWithPlanAndOffers(label: string) {
  const a = await installerWithTeam(label);
  const setup = await planningSetup(a.teamId);
  const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
  expect(saved.status, JSON.stringify(saved.data)).toBe(302);
  const planId = saved.location!.split("/").pop()!;
  const supplierId = await addSupplier(a.client, `Alt supplier ${label}`);
  const cheapModuleId = await insertModule(`Altmaker ${label}`, "AM-100", 100);
  await addOffer(a.client, offerForm(supplierId, setup.moduleId, { unitPrice: "140.00" }));
  await addOffer(a.client, offerForm(supplierId, cheapModuleId, { unitPrice: "30.00" }));
  await addOffer(a.client, offerForm(supplierId, setup.controllerId, { partKind: "controllers", unitPrice: "320.00" }));
  await addOffer(a.client, offerForm(supplierId, setup.batteryId, { partKind: "batteries", unitPrice: "610.00" }));
  await addOffer(a.client, offerForm(supplierId, setup.inverterId, { partKind: "inverters", unitPrice: "450.00" }));
  return { ...a, setup, planId, cheapModuleId };
}

describe("kit alternatives", () => {
  it("searches the team's offers, keeps other teams out, and applies a kit as a new revision", async () => {
    const a = await teamWithPlanAndOffers("alt-a");
    const res = await callApi(alternativesApi, "action", `/api/v1/plans/${a.planId}/alternatives`, {
      headers: { Cookie: a.client.cookieHeader() },
      params: { planId: a.planId },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.currency).toBe("EUR");
    expect(res.body.offersUsed).toBe(5);
    expect(res.body.considered).toBeGreaterThan(0);
    expect(res.body.alternatives.length).toBeGreaterThanOrEqual(1);
    const totals = res.body.alternatives.map((x: { totalLandedCost: string }) => Number(x.totalLandedCost));
    expect(totals).toEqual([...totals].sort((p, q) => p - q));
    const first = res.body.alternatives[0];
    expect(first.totalLandedCost).toMatch(/^\d+\.\d{2}$/);
    expect([a.setup.moduleId, a.cheapModuleId]).toContain(first.module.id);

    // Another team sees nothing; nobody signed in gets a 401.
    const b = await installerWithTeam("alt-b");
    const other = await callApi(alternativesApi, "action", `/api/v1/plans/${a.planId}/alternatives`, {
      headers: { Cookie: b.client.cookieHeader() },
      params: { planId: a.planId },
    });
    expect(other.status).toBe(404);
    const anonymous = await callApi(alternativesApi, "action", `/api/v1/plans/${a.planId}/alternatives`, { params: { planId: a.planId } });
    expect(anonymous.status).toBe(401);
    const otherPage = await b.client.loader(alternativesPage, `/plans/${a.planId}/alternatives`, { planId: a.planId });
    expect(otherPage.status).toBe(404);

    // The page lists the same kits; a bad pick is refused at 400, a good one saves revision 2.
    const page = await a.client.loader(alternativesPage, `/plans/${a.planId}/alternatives`, { planId: a.planId });
    expect(page.data.view.alternatives[0].totalLandedCost).toBe(first.totalLandedCost);
    const bad = await a.client.action(
      alternativesPage,
      `/plans/${a.planId}/alternatives`,
      {
        moduleId: "nope",
        controllerId: first.controller.id,
        batteryId: first.battery.id,
        inverterId: "",
        modulesInSeries: "0",
        stringsInParallel: "1",
        batteryStrings: "1",
      },
      { planId: a.planId },
    );
    expect(bad.status).toBe(400);
    const pick = {
      moduleId: first.module.id,
      controllerId: first.controller.id,
      batteryId: first.battery.id,
      inverterId: first.inverter?.id ?? "",
      modulesInSeries: String(first.layout.modulesInSeries),
      stringsInParallel: String(first.layout.stringsInParallel),
      batteryStrings: String(first.batteryStrings),
    };
    const byOther = await b.client.action(alternativesPage, `/plans/${a.planId}/alternatives`, pick, { planId: a.planId });
    expect(byOther.status).toBe(404);
    const applied = await a.client.action(alternativesPage, `/plans/${a.planId}/alternatives`, pick, { planId: a.planId });
    expect(applied.status, JSON.stringify(applied.data)).toBe(302);
    expect(applied.location).toBe(`/plans/${a.planId}`);
    const plan = await a.client.loader(planPage, `/plans/${a.planId}`, { planId: a.planId });
    expect(plan.data.revision.number).toBe(2);
    expect(plan.data.revision.note).toMatch(/^Applied kit alternative: /);
    expect(plan.data.revision.result.array.layout.moduleCount).toBe(first.module.quantity);
    expect(plan.data.revision.result.checks.filter((c: { status: string }) => c.status === "fail")).toEqual([]);
  });
});
