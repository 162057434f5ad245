// The plan's headline, charts' captions, safety panel and notes, rendered as the server sends them.
import { describe, expect, it } from "vitest";
import { EnergyVsLoadChart } from "~/components/plans/energy-vs-load-chart";
import { PlanAssumptions } from "~/components/plans/plan-assumptions";
import { LICENSED_PERSON_RULE, PlanCautions } from "~/components/plans/plan-cautions";
import { PlanKeyFigures } from "~/components/plans/plan-key-figures";
import { StateOfChargeChart } from "~/components/plans/state-of-charge-chart";
import { MONTH_NAMES } from "~/domain/sizing/format";
import { planKit } from "~/domain/sizing/kit-plan";
import { hutPlanInput } from "../sizing/plan-fixtures";
import { passingPlanInput, threePlans } from "./plan-render-fixtures";
import { markup, textOf } from "./render";

const { passing, failing, dcOnly } = threePlans();

describe("PlanKeyFigures", () => {
  it("states the modules, their layout, the bank, the inverter and the design month of a passing plan", () => {
    const text = textOf(markup(PlanKeyFigures, { plan: passing, parts: passingPlanInput().parts }));
    const { layout } = passing.array;
    expect(text).toContain(`Modules ${layout.moduleCount} modules`);
    expect(text).toContain(`${layout.modulesInSeries} in series × ${layout.stringsInParallel} strings`);
    expect(text).toContain("per module: nameplate");
    expect(text).toContain("AGM lead-acid");
    expect(text).toContain("1,000 W continuous"); // the fixture's inverter
    expect(text).toContain("2,000 W surge");
    expect(text).toContain(`Design month ${MONTH_NAMES[passing.array.designMonth! - 1]}`);
    expect(passing.simulation.unmetDays).toBe(0);
    expect(text).toContain("Simulated year 0 days with unmet load");
    expect(text).toContain(`seed ${passing.simulation.seed}`);
  });

  it("shows the unmet days of a kit that runs short", () => {
    expect(failing.simulation.unmetDays).toBeGreaterThan(1);
    const html = markup(PlanKeyFigures, { plan: failing });
    expect(textOf(html)).toContain(`Simulated year ${failing.simulation.unmetDays} days with unmet load`);
    expect(textOf(html)).toContain("set by hand");
  });

  it("says a kit without an inverter is DC only", () => {
    const text = textOf(markup(PlanKeyFigures, { plan: dcOnly }));
    expect(text).toContain("No inverter: DC only.");
    expect(text).toContain("Every appliance on the load sheet runs on DC.");
    expect(text).not.toContain("W continuous");
  });

  it("warns when AC appliances have no inverter", () => {
    const base = hutPlanInput();
    const plan = planKit({ ...base, parts: { ...base.parts, inverter: null } });
    expect(textOf(markup(PlanKeyFigures, { plan }))).toContain("The load sheet has AC appliances but no inverter is chosen");
  });

  it("says the energy rests on verified power, with the number of readings", () => {
    const base = hutPlanInput({ powerBasis: "verified" });
    const input = { ...base, parts: { ...base.parts, module: { ...base.parts.module, verifiedPmaxW: 88.5, verifiedReadingCount: 4 } } };
    const plan = planKit(input);
    expect(plan.array.powerBasisUsed).toBe("verified");
    const text = textOf(markup(PlanKeyFigures, { plan, parts: input.parts }));
    expect(text).toContain("Energy worked out on 88.5 W per module: verified from 4 field readings.");
  });
});

describe("EnergyVsLoadChart", () => {
  it("names the design month in words in its caption and label, on graph paper", () => {
    const html = markup(EnergyVsLoadChart, { plan: passing });
    const month = MONTH_NAMES[passing.array.designMonth! - 1];
    expect(textOf(html)).toContain(`Design month ${month}:`);
    expect(html).toMatch(/role="img" aria-label="Chart of the array&#x27;s energy a day against the load/);
    expect(html).toContain("graph-paper");
  });
});

describe("StateOfChargeChart", () => {
  it("says the load was met every day when it was", () => {
    const text = textOf(markup(StateOfChargeChart, { simulation: passing.simulation }));
    expect(text).toContain("The load was met on every day of the simulated year");
  });

  it("counts the days with unmet load and names the months they fell in", () => {
    const text = textOf(markup(StateOfChargeChart, { simulation: failing.simulation, depthOfDischargePct: failing.battery.effectiveDodPct }));
    expect(text).toContain(`Unmet load on ${failing.simulation.unmetDays} days of the simulated year`);
    const worst = failing.simulation.months.reduce((a, b) => (b.unmetDays > a.unmetDays ? b : a));
    expect(text).toContain(`${worst.unmetDays} in ${MONTH_NAMES[worst.month - 1]}`);
    expect(text).toContain("▲ marks a day with unmet load");
  });
});

describe("PlanCautions", () => {
  it("lists the plan's cautions and always ends with the licensed-person rule", () => {
    for (const plan of [passing, failing, dcOnly]) {
      const text = textOf(markup(PlanCautions, { cautions: plan.cautions }));
      expect(text.startsWith("⚠ Safety")).toBe(true);
      for (const c of plan.cautions) expect(text).toContain(c);
      expect(text.endsWith(LICENSED_PERSON_RULE)).toBe(true);
      expect(text).toContain("licensed person");
    }
  });

  it("still carries the licensed-person rule when a plan has no cautions", () => {
    expect(textOf(markup(PlanCautions, { cautions: [] }))).toContain("licensed person");
  });
});

describe("PlanAssumptions", () => {
  it("lists how the plan was made", () => {
    const text = textOf(markup(PlanAssumptions, { assumptions: passing.assumptions }));
    expect(text.startsWith("How this plan was made")).toBe(true);
    expect(passing.assumptions.length).toBeGreaterThan(3);
    for (const a of passing.assumptions) expect(text).toContain(a);
  });
});
