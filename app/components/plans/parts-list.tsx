// The kit as a list of parts: how many, which catalogue item, and the figures that matter for each;
// then the cable runs and the fuses and breakers.
import { useId, type ReactNode } from "react";
import { CHEMISTRY_LABELS } from "~/domain/sizing/parts";
import type { KitPlan } from "~/domain/sizing/plan-types";
import { formatNumber, layoutWords, plural } from "~/lib/plan-format";
import { CableRunsTable } from "./cable-runs-table";
import { powerBasisWords, type PlanPartFacts } from "./plan-parts";
import { ProtectionTable } from "./protection-table";

export interface PartLabels {
  module: string;
  controller: string;
  battery: string;
  /** Null when the kit has no inverter. */
  inverter: string | null;
}

export function PartsList({ plan, labels, parts }: { plan: KitPlan; labels: PartLabels; parts?: PlanPartFacts }) {
  const { array, battery, inverter } = plan;
  const { layout } = array;
  const pmaxDigits = array.modulePmaxUsedW % 1 === 0 ? 0 : 1;
  const id = useId();
  return (
    <div className="space-y-5">
      <div className="overflow-x-auto">
        <table className="figures w-full min-w-[36rem] text-sm">
          <caption className="sr-only">Parts</caption>
          <thead className="border-b border-rule text-xs text-ink-faint">
            <tr>
              <th scope="col" className="w-14 py-2 text-right font-medium">
                Qty
              </th>
              <th scope="col" className="px-3 text-left font-medium">
                Part
              </th>
              <th scope="col" className="text-left font-medium">
                Figures that matter
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            <Row qty={layout.moduleCount} kind="PV modules" name={labels.module} testId="part-module">
              <li>
                {formatNumber(array.modulePmaxUsedW, pmaxDigits)} W at STC each ({powerBasisWords(array.powerBasisUsed, parts?.module?.verifiedReadingCount)})
                {parts?.module && array.powerBasisUsed === "verified" ? `; nameplate ${formatNumber(parts.module.pmaxW)} W` : ""}
              </li>
              <li>
                {layoutWords(layout.modulesInSeries, layout.stringsInParallel)}, {formatNumber(layout.arrayStcPowerW)} W at STC
              </li>
            </Row>
            <Row qty={1} kind="Charge controller" name={labels.controller} testId="part-controller">
              {parts?.controller ? (
                <li>
                  {parts.controller.kind === "mppt" ? "MPPT" : "PWM"}, up to {formatNumber(parts.controller.maxPvVocV)} V in,{" "}
                  {formatNumber(parts.controller.maxChargeCurrentA)} A out
                </li>
              ) : null}
              <li>
                String Voc on the coldest morning {formatNumber(layout.stringVocColdV, 1)} V; {formatNumber(layout.controllerOutputCurrentA, 1)} A at the
                array's STC power
              </li>
            </Row>
            <Row qty={battery.batteryCount} kind={plural(battery.batteryCount, "Battery", "Batteries")} name={labels.battery} testId="part-battery">
              {parts?.battery ? (
                <li>
                  {CHEMISTRY_LABELS[parts.battery.chemistry]}, {formatNumber(parts.battery.nominalVoltageV)} V, {formatNumber(parts.battery.capacityAh)} Ah
                  {parts.battery.capacityHourRateH ? ` (${formatNumber(parts.battery.capacityHourRateH)} h rate)` : ""} each
                </li>
              ) : null}
              <li>
                {layoutWords(battery.batteriesInSeries, battery.stringsInParallel)}: {formatNumber(battery.bankAh)} Ah at {plan.systemVoltageV} V,{" "}
                {formatNumber(battery.bankNominalWh / 1000, 1)} kWh nominal, {formatNumber(battery.bankUsableWh / 1000, 1)} kWh usable
              </li>
            </Row>
            {inverter ? (
              <Row qty={1} kind="Inverter" name={labels.inverter ?? "Inverter"} testId="part-inverter">
                <li>
                  {formatNumber(inverter.continuousW)} W continuous, {formatNumber(inverter.surgeW)} W surge; the load needs{" "}
                  {formatNumber(inverter.continuousNeededW)} W continuous
                </li>
                <li>Draws up to {formatNumber(inverter.maxDcCurrentA, 1)} A from the battery</li>
              </Row>
            ) : (
              <tr data-testid="part-inverter">
                <td className="py-2 text-right text-ink-faint">—</td>
                <td className="px-3">
                  <span className="block text-xs uppercase tracking-wide text-ink-faint">Inverter</span>
                  No inverter: DC only
                </td>
                <td className="text-ink-soft">{plan.load.hasAcLoad ? "⚠ The load sheet has AC appliances: see the checks." : "Every load runs on DC."}</td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <section aria-labelledby={`${id}-cables`}>
        <h3 id={`${id}-cables`} className="mb-1 text-sm font-semibold">
          Cable runs
        </h3>
        <CableRunsTable cables={plan.cables} />
      </section>
      <section aria-labelledby={`${id}-protection`}>
        <h3 id={`${id}-protection`} className="mb-1 text-sm font-semibold">
          Fuses and breakers
        </h3>
        <ProtectionTable items={plan.protection} />
      </section>
    </div>
  );
}

function Row({ qty, kind, name, testId, children }: { qty: number; kind: string; name: string; testId: string; children: ReactNode }) {
  return (
    <tr className="align-top" data-testid={testId}>
      <td className="py-2 text-right text-base font-semibold">{formatNumber(qty)}</td>
      <td className="px-3 py-2">
        <span className="block text-xs uppercase tracking-wide text-ink-faint">{kind}</span>
        <span className="font-medium">{name}</span>
      </td>
      <td className="py-2">
        <ul className="space-y-0.5 text-ink-soft">{children}</ul>
      </td>
    </tr>
  );
}
