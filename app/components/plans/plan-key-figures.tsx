// The plan's headline figures: array, battery bank, inverter, load, design month and the simulated
// year — large tabular numbers with their units, and where each one comes from.
import type { ReactNode } from "react";
import { CHEMISTRY_LABELS } from "~/domain/sizing/parts";
import type { KitPlan } from "~/domain/sizing/plan-types";
import { MONTH_NAMES, formatNumber, layoutWords, plural } from "~/lib/plan-format";
import { powerBasisWords, type PlanPartFacts } from "./plan-parts";
import { SkyAssumptionNote } from "~/components/sky-assumption-note";
import { skyAssumptionOfMonths } from "~/domain/solar/sky-assumption";

export function PlanKeyFigures({ plan, parts }: { plan: KitPlan; parts?: PlanPartFacts }) {
  const { array, battery, inverter, simulation, load } = plan;
  const { layout } = array;
  const basis = powerBasisWords(array.powerBasisUsed, parts?.module?.verifiedReadingCount);
  // The layout rates the array on the larger of nameplate and verified power (string-layout.ts).
  const ratedPerModuleW = layout.moduleCount > 0 ? layout.arrayStcPowerW / layout.moduleCount : 0;
  const arrayOrigin = Math.abs(ratedPerModuleW - array.modulePmaxUsedW) < 1e-6 ? basis : "nameplate";
  const design = array.designMonth === null ? null : array.months[array.designMonth - 1];
  // Every energy figure here rests on the site's sunshine: an assumed sky is said before them.
  const sky = skyAssumptionOfMonths(plan.moduleYield?.months);
  return (
    <dl className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3" data-testid="plan-key-figures">
      {sky ? (
        <div className="sm:col-span-2 lg:col-span-3">
          <dt className="sr-only">Sunshine</dt>
          <dd>
            <SkyAssumptionNote assumption={sky} />
          </dd>
        </div>
      ) : null}
      <Card label="Modules" value={formatNumber(layout.moduleCount)} unit={plural(layout.moduleCount, "module")} testId="key-modules">
        <Detail>
          {layoutWords(layout.modulesInSeries, layout.stringsInParallel)}
          {array.layoutForced ? " — set by hand" : ""}
        </Detail>
        <Detail>
          Array <Fig value={layout.arrayStcPowerW} unit="W" /> at STC ({arrayOrigin})
        </Detail>
        <Origin>
          Energy worked out on <Fig value={array.modulePmaxUsedW} digits={array.modulePmaxUsedW % 1 === 0 ? 0 : 1} unit="W" /> per module: {basis}.
        </Origin>
      </Card>

      <Card label="Battery bank" value={formatNumber(battery.bankUsableWh / 1000, 1)} unit="kWh usable" testId="key-battery">
        <Detail>
          {layoutWords(battery.batteriesInSeries, battery.stringsInParallel)} = {battery.batteryCount} {plural(battery.batteryCount, "battery", "batteries")}
          {parts?.battery ? `, ${CHEMISTRY_LABELS[parts.battery.chemistry]}` : ""}
        </Detail>
        <Detail>
          <Fig value={battery.bankAh} unit="Ah" /> at <Fig value={plan.systemVoltageV} unit="V" /> ·{" "}
          <Fig value={battery.bankNominalWh / 1000} digits={1} unit="kWh" /> nominal
        </Detail>
        {battery.autonomyDaysAchieved !== null ? (
          <Detail>
            Carries the heaviest month's daily load for <Fig value={battery.autonomyDaysAchieved} digits={1} unit="days" />
          </Detail>
        ) : null}
        <Origin>
          Usable at {formatNumber(battery.effectiveDodPct)} % depth of discharge and {formatNumber(battery.batteryTempC)} °C, where it gives{" "}
          {formatNumber(100 * battery.temperatureFactor)} % of its capacity.
        </Origin>
      </Card>

      {inverter ? (
        <Card label="Inverter" value={formatNumber(inverter.continuousW)} unit="W continuous" testId="key-inverter">
          <Detail>
            <Fig value={inverter.surgeW} unit="W" /> surge
          </Detail>
          <Detail>
            Needs <Fig value={inverter.continuousNeededW} unit="W" /> continuous (<Fig value={inverter.peakAcW} unit="W" /> of AC at once, with margin)
          </Detail>
          {inverter.largestSurgeW > 0 ? (
            <Detail>
              Largest start <Fig value={inverter.startingDemandW} unit="W" /> at once
            </Detail>
          ) : null}
          <Origin>Ratings from the catalogue; loads from the load sheet.</Origin>
        </Card>
      ) : (
        <Card label="Inverter" value="None" unit="" testId="key-inverter">
          <Detail>No inverter: DC only.</Detail>
          {load.hasAcLoad ? (
            <p className="mt-1 text-sm font-medium text-fail">
              <span aria-hidden="true">✕ </span>The load sheet has AC appliances but no inverter is chosen — see the checks.
            </p>
          ) : (
            <Detail>Every appliance on the load sheet runs on DC.</Detail>
          )}
        </Card>
      )}

      <Card label="Load at the battery" value={formatNumber(load.maxDailyWh)} unit="Wh/day" testId="key-load">
        <Detail>
          Heaviest month · <Fig value={load.annualKWh} digits={0} unit="kWh" /> a year
        </Detail>
        <Origin>From the load sheet{inverter ? ", AC through the inverter's efficiency and idle draw" : ""}.</Origin>
      </Card>

      <Card label="Design month" value={array.designMonth === null ? "None" : MONTH_NAMES[array.designMonth - 1]} unit="" testId="key-design-month">
        {design ? (
          <>
            <Detail>
              Needs <Fig value={design.requiredArrayWhPerDay} unit="Wh/day" /> from the array; one module gives{" "}
              <Fig value={design.energyPerModuleWhPerDay} unit="Wh/day" />
            </Detail>
            <Detail>
              <Fig value={array.modulesRequired} digits={2} unit="modules" /> needed → {layout.moduleCount} chosen
            </Detail>
            <Origin>The month needing the most modules sets the count (site's monthly energy estimate).</Origin>
          </>
        ) : (
          <Detail>There is no load to size for.</Detail>
        )}
      </Card>

      <Card
        label="Simulated year"
        value={formatNumber(simulation.unmetDays)}
        unit={`${plural(simulation.unmetDays, "day")} with unmet load`}
        testId="key-unmet-days"
      >
        <Detail>
          Load met <Fig value={simulation.loadMetPct} digits={1} unit="%" /> · lowest charge <Fig value={simulation.minStateOfChargePct} unit="%" />
        </Detail>
        <Detail>
          <Fig value={simulation.dumpedKWh} digits={0} unit="kWh" /> dumped when full, a year
        </Detail>
        <Origin>From a simulated year of daily weather (seed {formatNumber(simulation.seed, 0, false)}), one energy balance a day.</Origin>
      </Card>
    </dl>
  );
}

function Card({ label, value, unit, testId, children }: { label: string; value: string; unit: string; testId?: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-rule bg-sheet p-3 sm:p-4">
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="figures text-figure font-semibold" data-testid={testId}>
        {value}
        {unit ? <span className="text-base font-normal text-ink-soft"> {unit}</span> : null}
      </dd>
      <dd className="mt-1">{children}</dd>
    </div>
  );
}

function Detail({ children }: { children: ReactNode }) {
  return <p className="figures text-sm text-ink">{children}</p>;
}

function Origin({ children }: { children: ReactNode }) {
  return <p className="mt-1 text-xs text-ink-faint">{children}</p>;
}

function Fig({ value, unit, digits = 0 }: { value: number; unit: string; digits?: number }) {
  return (
    <span className="whitespace-nowrap font-medium">
      {formatNumber(value, digits)}
      <span className="font-normal text-ink-soft"> {unit}</span>
    </span>
  );
}
