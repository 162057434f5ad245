// The battery comparison opened from a saved plan: the plan's bank (voltage, usable energy, battery
// temperature, depth-of-discharge limit) goes into the page address, and each battery model is landed
// in the count that makes that bank — the plan's own battery in the plan's own count, a 2 V cell in
// twelve-cell strings — instead of the plan battery's count for every model.
import { describe, expect, it } from "vitest";
import { installerWithTeam } from "../helpers/fixtures";
import { choices, planningSetup } from "../helpers/planning-fixtures";
import { addOffer, addSupplier, offerForm } from "./helpers";
import * as plansNew from "~/routes/plans-new";
import * as compare from "~/routes/sourcing.compare";
import { db } from "~/server/db.server";
import { findPlan } from "~/server/plans/plans.server";
import type { BatteryComparisonRow } from "~/domain/sourcing/part-rows";

async function insertCell() {
  const row = await db
    .insertInto("battery")
    .values({
      maker: "Cellmaker",
      model: `OP2-1000-${Date.now().toString(36)}`,
      chemistry: "lead-acid-flooded",
      nominal_voltage_v: 2,
      capacity_ah: 1000,
      capacity_hour_rate_h: 10,
      usable_dod_pct: 50,
      cycle_life: 2500,
      round_trip_efficiency_pct: 80,
    })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

describe("battery comparison for a plan", () => {
  it("counts each battery model for the plan's bank and lands it at that count", async () => {
    const a = await installerWithTeam("bat-cmp");
    const setup = await planningSetup(a.teamId);
    const saved = await a.client.action(plansNew, "/plans/new", { choices: JSON.stringify(choices(setup, {}, { maxDepthOfDischargePct: 80 })) });
    expect(saved.status, JSON.stringify(saved.data)).toBe(302);
    const planId = saved.location!.split("/").pop()!;
    const plan = (await findPlan(a.teamId, planId))!.revision.result;
    const cellId = await insertCell();
    const supplierId = await addSupplier(a.client, "Bank Supply", "EUR", { defaultShippingPerUnit: "0", defaultShippingPerOrder: "0" });
    await addOffer(a.client, offerForm(supplierId, setup.batteryId, { partKind: "batteries", unitPrice: "610.00" }));
    await addOffer(a.client, offerForm(supplierId, cellId, { partKind: "batteries", unitPrice: "150.00" }));

    const opened = await a.client.loader(compare, `/sourcing/compare/batteries?plan=${planId}`, { kind: "batteries" });
    expect(opened.status).toBe(302);
    const next = new URL(opened.location!, "http://x");
    expect(next.searchParams.get("bank")).toBe("24");
    expect(Number(next.searchParams.get("store"))).toBeCloseTo(plan.battery.requiredUsableWh / 1000, 3);
    expect(Number(next.searchParams.get("btemp"))).toBeCloseTo(plan.battery.batteryTempC, 1);
    expect(next.searchParams.get("dod")).toBe("80");
    expect(next.searchParams.has("qty")).toBe(false);

    const page = await a.client.loader(compare, `${next.pathname}${next.search}`, { kind: "batteries" });
    expect(page.status).toBe(200);
    const rows = page.data.comparison.rows as BatteryComparisonRow[];
    const own = rows.find((r) => r.partId === setup.batteryId)!;
    const cell = rows.find((r) => r.partId === cellId)!;
    // The plan's own 12.8 V battery: the plan's own count (2 in series × its strings).
    expect(own.bank).toMatchObject({ batteriesInSeries: 2, count: plan.battery.batteryCount });
    expect(own.quantityNeeded).toBe(plan.battery.batteryCount);
    // The 2 V cell makes 24 V with 12 in series; each cell holds 1000 Ah × 2 V × 50 % = 1 kWh usable
    // (less in the cold), so it needs its own number of strings.
    expect(cell.bank).toMatchObject({ batteriesInSeries: 12, seriesExact: true });
    expect(cell.bank!.count % 12).toBe(0);
    expect(cell.bank!.bankUsableWh).toBeGreaterThanOrEqual(plan.battery.requiredUsableWh);
    expect(cell.quantityNeeded).toBe(cell.bank!.count);
    // Landed at that count: no shipping, so the unit price times the count.
    expect(cell.landed).toEqual({ amount: (150 * cell.bank!.count).toFixed(2), currency: "EUR" });
    expect(own.landed).toEqual({ amount: (610 * plan.battery.batteryCount).toFixed(2), currency: "EUR" });

    // A typed quantity still lands every model at that quantity.
    const typed = await a.client.loader(compare, `/sourcing/compare/batteries?filled=1&qty=4`, { kind: "batteries" });
    for (const r of typed.data.comparison.rows as BatteryComparisonRow[]) {
      expect(r.bank).toBeNull();
      expect(r.quantityNeeded).toBe(4);
    }
  });
});
