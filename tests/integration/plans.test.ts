// Kit plans: computed from the team's site, loads and catalogue parts, saved with a snapshot, revised,
// overridden only with a reason, and invisible to other teams.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "./helpers/fixtures";
import { choices, planningSetup } from "./helpers/planning-fixtures";
import * as plansNew from "~/routes/plans-new";
import * as plan from "~/routes/plan";
import * as plan_ from "~/routes/plan";
import * as plansApi from "~/routes/api.v1.plans";
import * as planApi from "~/routes/api.v1.plan";
import * as previewApi from "~/routes/api.v1.plans-preview";
import * as quotes from "~/routes/quotes";
import { db } from "~/server/db.server";
import type { KitPlan } from "~/domain/sizing/plan-types";

async function api(
  mod: { loader?: Function; action?: Function },
  kind: "loader" | "action",
  client: { cookieHeader(): string },
  path: string,
  body?: unknown,
  params: Record<string, string> = {},
) {
  const request = new Request(`http://127.0.0.1:3999${path}`, {
    method: kind === "action" ? "POST" : "GET",
    headers: { "Content-Type": "application/json", Cookie: client.cookieHeader() },
    body: kind === "action" ? JSON.stringify(body) : undefined,
  });
  try {
    const res = (await mod[kind]!({ request, params, context: {} })) as Response;
    return { status: res.status, body: await res.json() };
  } catch (thrown) {
    if (!(thrown instanceof Response)) throw thrown;
    return { status: thrown.status, body: await thrown.json().catch(() => null) };
  }
}

describe("kit plans", () => {
  it("previews, saves with a snapshot, and reads back through the page and the API", async () => {
    const a = await installerWithTeam("plan-a");
    const setup = await planningSetup(a.teamId);
    const preview = await api(previewApi, "action", a.client, "/api/v1/plans/preview", choices(setup));
    expect(preview.status, JSON.stringify(preview.body)).toBe(200);
    const previewPlan = preview.body.plan as KitPlan;
    expect(previewPlan.array.layout.moduleCount).toBeGreaterThan(0);
    expect(previewPlan.simulation.days.stateOfChargePct).toHaveLength(365);
    expect(previewPlan.cautions.join(" ")).toMatch(/licensed/i);

    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const planId = saved.location!.split("/").pop()!;
    const page = await a.client.loader(plan, `/plans/${planId}`, { planId });
    expect(page.data.revision.number).toBe(1);
    expect(page.data.changes, page.data.changes.join(" | ")).toEqual([]);
    expect(page.data.revision.result.array.layout.moduleCount).toBe(previewPlan.array.layout.moduleCount);

    const read = await api(planApi, "loader", a.client, `/api/v1/plans/${planId}`, undefined, { planId });
    expect(read.body.inputs.parts.module.pmaxW).toBe(330);
    expect(read.body.history).toHaveLength(1);
  });

  it("keeps the saved snapshot when the catalogue changes, says what changed, and re-plans on request", async () => {
    const a = await installerWithTeam("plan-snap");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    const planId = saved.location!.split("/").pop()!;
    const before = (await a.client.loader(plan, `/plans/${planId}`, { planId })).data.revision.result as KitPlan;

    // Field readings verify the module at 85 % of nameplate.
    await db.updateTable("pv_module").set({ verified_pmax_w: 280.5, verified_reading_count: 5 }).where("id", "=", setup.moduleId).execute();
    const page = await a.client.loader(plan, `/plans/${planId}`, { planId });
    expect(page.data.revision.result).toEqual(before);
    expect(page.data.changes.join(" ")).toMatch(/verified power: none from 0 readings → 280\.5 W from 5 readings/);

    const replanned = await a.client.action(plan, `/plans/${planId}`, { intent: "replan-current" }, { planId });
    expect(replanned.status).toBe(302);
    const after = await a.client.loader(plan, `/plans/${planId}`, { planId });
    expect(after.data.revision.number).toBe(2);
    expect(after.data.revision.note).toMatch(/current/);
    expect(after.data.changes).toEqual([]);
    expect(after.data.revision.result.array.modulePmaxUsedW).toBeCloseTo(280.5, 5);
    const old = await a.client.loader(plan, `/plans/${planId}?revision=1`, { planId });
    expect(old.data.revision.result).toEqual(before);
  });

  it("tells a change in the data from a change in how plans are worked out", async () => {
    const a = await installerWithTeam("plan-method");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    const planId = saved.location!.split("/").pop()!;
    expect((await a.client.loader(plan, `/plans/${planId}`, { planId })).data.changedBy).toBeNull();
    // The stored result as an older version of the planner might have left it: same inputs, one day more unmet.
    const revision = await db.selectFrom("kit_plan_revision").select(["id", "result"]).where("plan_id", "=", planId).executeTakeFirstOrThrow();
    const older = structuredClone(revision.result) as KitPlan;
    older.simulation.unmetDays += 1;
    await db
      .updateTable("kit_plan_revision")
      .set({ result: JSON.stringify(older) })
      .where("id", "=", revision.id)
      .execute();
    const byMethod = await a.client.loader(plan, `/plans/${planId}`, { planId });
    expect(byMethod.data.changedBy).toBe("method");
    expect(byMethod.data.changes.join(" ")).toMatch(/Days with unmet load a year: \d+ → \d+/);

    await db.updateTable("pv_module").set({ verified_pmax_w: 280.5, verified_reading_count: 5 }).where("id", "=", setup.moduleId).execute();
    const byData = await a.client.loader(plan, `/plans/${planId}`, { planId });
    expect(byData.data.changedBy).toBe("data");
  });

  it("accepts a failing safety check only with a reason, and never a passing one", async () => {
    const a = await installerWithTeam("plan-override");
    const setup = await planningSetup(a.teamId);
    // Six 40.6 V modules in series: about 270 V on a cold morning on a 150 V controller.
    const forced = choices(setup, {}, { modulesInSeries: 6, stringsInParallel: 1 });
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(forced) });
    const planId = saved.location!.split("/").pop()!;
    const page = await a.client.loader(plan, `/plans/${planId}`, { planId });
    const result = page.data.revision.result as KitPlan;
    const failing = result.checks.filter((c) => c.kind === "safety" && c.status === "fail");
    expect(failing.map((c) => c.id)).toContain("array.voc-cold");
    const row = await db.selectFrom("kit_plan_revision").select("failing_safety_checks").where("plan_id", "=", planId).executeTakeFirstOrThrow();
    expect(row.failing_safety_checks).toBe(failing.length);

    // While a safety check fails with no accepted reason, no quote can be drafted from the plan.
    const blocked = await a.client.action(quotes, "/quotes", { planId });
    expect(blocked.status).toBe(409);
    expect(blocked.data.message).toMatch(/cold morning|Voc|voltage/i);
    expect(await db.selectFrom("quote").select("id").where("plan_id", "=", planId).execute()).toEqual([]);

    expect((await a.client.action(plan, `/plans/${planId}`, { intent: "override", checkId: "array.voc-cold", reason: "ok" }, { planId })).status).toBe(400);
    const passing = result.checks.find((c) => c.status === "pass")!;
    expect(
      (await a.client.action(plan, `/plans/${planId}`, { intent: "override", checkId: passing.id, reason: "A long enough reason here." }, { planId })).status,
    ).toBe(400);
    const ok = await a.client.action(
      plan,
      `/plans/${planId}`,
      { intent: "override", checkId: "array.voc-cold", reason: "Site never below −5 °C: heated plant room, checked by the engineer." },
      { planId },
    );
    expect(ok.status).toBe(302);
    const overrides = (await a.client.loader(plan, `/plans/${planId}`, { planId })).data.revision.overrides;
    expect(overrides).toEqual([expect.objectContaining({ checkId: "array.voc-cold", byName: "Test plan-override" })]);
    // Once every failing safety check is accepted with a reason, the plan can become a quote.
    const stillFailing = failing.filter((c) => c.id !== "array.voc-cold");
    for (const check of stillFailing) {
      const accepted = await a.client.action(
        plan,
        `/plans/${planId}`,
        { intent: "override", checkId: check.id, reason: "Accepted by the engineer after a site visit." },
        { planId },
      );
      expect(accepted.status).toBe(302);
    }
    const drafted = await a.client.action(quotes, "/quotes", { planId });
    expect(drafted.status, JSON.stringify(drafted.data)).toBe(302);
    expect(await db.selectFrom("quote").select("id").where("plan_id", "=", planId).execute()).toHaveLength(1);

    // A layout of 3 in series turns the failing check green in a new revision.
    const fixed = await a.client.action(
      plan,
      `/plans/${planId}`,
      { intent: "save-revision", note: "Shorter strings", choices: JSON.stringify(choices(setup, {}, { modulesInSeries: 3, stringsInParallel: 2 })) },
      { planId },
    );
    expect(fixed.status, JSON.stringify(fixed.data)).toBe(302);
    const green = (await a.client.loader(plan, `/plans/${planId}`, { planId })).data.revision.result as KitPlan;
    expect(green.checks.find((c) => c.id === "array.voc-cold")!.status).toBe("pass");
  });

  it("refuses bad choices at the field and saves nothing", async () => {
    const a = await installerWithTeam("plan-bad");
    const setup = await planningSetup(a.teamId);
    const other = await planningSetup(a.teamId);
    const result = await a.client.action(plansNew, "/plans/new", {
      choices: JSON.stringify(choices(setup, { loadSheetId: other.loadSheetId, moduleId: "00000000-0000-0000-0000-000000000000" })),
    });
    expect(result.status).toBe(400);
    expect(result.data.errors).toMatchObject({ loadSheetId: expect.stringMatching(/this site/), moduleId: expect.stringMatching(/No such module/) });
    const typo = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup, {}, { autonomyDays: 0, arrayToControllerM: "far" })) });
    expect(typo.data.errors).toMatchObject({
      "design.autonomyDays": expect.stringMatching(/at least 0.5/),
      "design.arrayToControllerM": expect.stringMatching(/number/),
    });
    expect((await a.client.action(plansNew, "/plans/new", { choices: "{broken" })).status).toBe(400);
    expect(await db.selectFrom("kit_plan").select("id").where("team_id", "=", a.teamId).execute()).toHaveLength(0);
  });

  it("is invisible to another team in pages and the API", async () => {
    const a = await installerWithTeam("plan-own");
    const b = await installerWithTeam("plan-other");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    const planId = saved.location!.split("/").pop()!;
    expect((await b.client.loader(plan, `/plans/${planId}`, { planId })).status).toBe(404);
    expect((await b.client.action(plan, `/plans/${planId}`, { intent: "replan-current" }, { planId })).status).toBe(404);
    expect((await api(planApi, "loader", b.client, `/api/v1/plans/${planId}`, undefined, { planId })).status).toBe(404);
    expect((await api(plansApi, "loader", b.client, "/api/v1/plans")).body.total).toBe(0);
    // Team B cannot plan on team A's site either.
    const sneaky = await api(previewApi, "action", b.client, "/api/v1/plans/preview", choices(setup));
    expect(sneaky.status).toBe(400);
    expect(sneaky.body.error.fields.siteId).toMatch(/No such site/);
  });
});

describe("comparing offers for a plan", () => {
  it("fills the comparison from the plan's design month, and refuses another team's plan", async () => {
    const compare = await import("~/routes/sourcing.compare");
    const a = await installerWithTeam("plan-compare");
    const b = await installerWithTeam("plan-compare-other");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup)) });
    const planId = saved.location!.split("/").pop()!;
    const first = await a.client.loader(compare, `/sourcing/compare/modules?plan=${planId}`, { kind: "modules" });
    expect(first.status).toBe(302);
    const filled = new URL(first.location!, "http://x");
    const plan = (await a.client.loader(plan_, `/plans/${planId}`, { planId })).data.revision.result as KitPlan;
    const design = plan.array.months[plan.array.designMonth! - 1];
    expect(Number(filled.searchParams.get("energy"))).toBeCloseTo(design.requiredArrayWhPerDay / 1000, 3);
    expect(filled.searchParams.get("bank")).toBe("24");
    const page = await a.client.loader(compare, `${filled.pathname}${filled.search}`, { kind: "modules" });
    expect(page.status).toBe(200);
    expect(page.data.plan.name).toBe("Hut kit");
    expect((await b.client.loader(compare, `/sourcing/compare/modules?plan=${planId}`, { kind: "modules" })).status).toBe(404);
  });
});
