// A plan as the installer reads it: key figures, the year's energy and charge, the parts, every
// check with its reason, the string layouts considered, and the safety cautions.
import type { ReactNode } from "react";
import { Panel } from "~/components/page-header";
import type { PlanCheck } from "~/domain/sizing/checks";
import type { KitPlan, KitPlanInput } from "~/domain/sizing/plan-types";
import type { PlanSources } from "~/lib/plan-choices";
import { EnergyVsLoadChart } from "~/components/plans/energy-vs-load-chart";
import { LayoutOptions } from "~/components/plans/layout-options";
import { MonthlyArrayTable } from "~/components/plans/monthly-array-table";
import { PartsList } from "~/components/plans/parts-list";
import { PlanAssumptions } from "~/components/plans/plan-assumptions";
import { PlanCautions } from "~/components/plans/plan-cautions";
import { PlanChecks, type PlanCheckOverrideView } from "~/components/plans/plan-checks";
import { PlanKeyFigures } from "~/components/plans/plan-key-figures";
import { StateOfChargeChart } from "~/components/plans/state-of-charge-chart";

export function PlanResultView({
  plan,
  sources,
  parts,
  overrides,
  overrideForm,
  preview,
}: {
  plan: KitPlan;
  sources: PlanSources | null;
  /** The parts' figures from the plan's input (chemistry, reading counts, controller limits). */
  parts?: KitPlanInput["parts"];
  overrides: readonly PlanCheckOverrideView[];
  overrideForm?: (check: PlanCheck) => ReactNode;
  preview?: boolean;
}) {
  const labels = sources?.parts ?? { module: "Module", controller: "Charge controller", battery: "Battery", inverter: plan.inverter ? "Inverter" : null };
  return (
    <div className="space-y-6">
      {preview ? (
        <p className="rounded-md border border-copper bg-copper-wash px-3 py-2 text-sm">✎ Preview — not saved until you save it as a new revision.</p>
      ) : null}
      <PlanCautions cautions={plan.cautions} />
      <PlanKeyFigures plan={plan} parts={parts} />
      <Panel title="Checks">
        <PlanChecks checks={plan.checks} overrides={overrides} overrideForm={overrideForm ? (check) => overrideForm(check) : undefined} />
      </Panel>
      <div className="grid gap-6 xl:grid-cols-2">
        <Panel title="Energy and load, month by month">
          <EnergyVsLoadChart plan={plan} />
        </Panel>
        <Panel title="The battery through a simulated year">
          <StateOfChargeChart simulation={plan.simulation} depthOfDischargePct={plan.battery.effectiveDodPct} />
        </Panel>
      </div>
      <Panel title="Parts">
        <PartsList plan={plan} labels={labels} parts={parts} />
      </Panel>
      <Panel title="Month by month">
        <MonthlyArrayTable plan={plan} verifiedReadingCount={parts?.module.verifiedReadingCount} />
      </Panel>
      <Panel title="String layouts considered">
        <LayoutOptions layouts={plan.array.layouts} chosen={plan.array.layout} forced={plan.array.layoutForced} controller={parts?.controller} />
      </Panel>
      <PlanAssumptions assumptions={plan.assumptions} />
    </div>
  );
}
