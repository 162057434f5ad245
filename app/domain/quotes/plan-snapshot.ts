// What a quote tells the customer about the kit, copied from the plan revision it was priced from.
import { blockingFailures, type CheckOverride } from "../sizing/checks";
import type { KitPlan } from "../sizing/plan-types";
import { skyAssumptionOfMonths } from "../solar/sky-assumption";
import type { QuotePlanSnapshot } from "./quote-types";

export interface SnapshotMeta {
  planName: string;
  planRevision: number;
  siteName: string;
  autonomyDays: number;
  overrides: readonly (CheckOverride & { byName: string })[];
}

export function snapshotFromPlan(plan: KitPlan, meta: SnapshotMeta): QuotePlanSnapshot {
  const overrideOf = new Map(meta.overrides.filter((o) => o.reason.trim()).map((o) => [o.checkId, o]));
  return {
    planName: meta.planName,
    planRevision: meta.planRevision,
    siteName: meta.siteName,
    systemVoltageV: plan.systemVoltageV,
    arrayStcPowerW: plan.array.layout.arrayStcPowerW,
    moduleCount: plan.array.layout.moduleCount,
    batteryUsableKWh: round(plan.battery.bankUsableWh / 1000, 2),
    autonomyDays: meta.autonomyDays,
    months: plan.array.months.map((m) => ({
      month: m.month,
      arrayKWhPerDay: round(m.arrayWhPerDay / 1000, 3),
      loadKWhPerDay: round(m.loadWhPerDay / 1000, 3),
    })),
    // Every check the customer's kit was judged on; a failure stays a failure, with the reason it was accepted.
    checks: plan.checks.map((c) => {
      const o = c.kind === "safety" && c.status === "fail" ? overrideOf.get(c.id) : undefined;
      return { id: c.id, kind: c.kind, status: c.status, title: c.title, sentence: c.sentence, override: o ? { reason: o.reason, byName: o.byName } : null };
    }),
    cautions: [...plan.cautions],
    // The customer reads the expected energy; a sky preset behind it goes with it.
    skyAssumption: skyAssumptionOfMonths(plan.moduleYield?.months),
  };
}

/** The plan may not become a quote while a failing safety check has no accepted reason. */
export function planBlockers(plan: KitPlan, overrides: readonly CheckOverride[]) {
  return blockingFailures(plan.checks, overrides).map((c) => c.title);
}

function round(value: number, digits: number) {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
