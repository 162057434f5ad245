// The parts, the layouts weighed and the monthly table, as a reader meets them.
import { describe, expect, it } from "vitest";
import { LayoutOptions } from "~/components/plans/layout-options";
import { MonthlyArrayTable } from "~/components/plans/monthly-array-table";
import { PartsList } from "~/components/plans/parts-list";
import { planKit } from "~/domain/sizing/kit-plan";
import { hutPlanInput } from "../sizing/plan-fixtures";
import { dcOnlyPlanInput, passingPlanInput, threePlans } from "./plan-render-fixtures";
import { countMatches, markup, textOf } from "./render";

const { passing, failing, dcOnly } = threePlans();
const labels = { module: "Vell Ridge 100", controller: "Tallow Track 100/30", battery: "Cobble AGM 200", inverter: "Hearth 1000" };

function row(html: string, attribute: string): string {
  const start = html.indexOf(attribute);
  if (start < 0) throw new Error(`no ${attribute} in the markup`);
  return textOf(html.slice(html.indexOf(">", start) + 1, html.indexOf("</tr>", start)));
}

describe("PartsList", () => {
  it("lists each part with its quantity, catalogue name and figures", () => {
    const html = markup(PartsList, { plan: passing, labels, parts: passingPlanInput().parts });
    expect(row(html, 'data-testid="part-module"')).toMatch(
      new RegExp(`^${passing.array.layout.moduleCount} PV modules Vell Ridge 100 100 W at STC each \\(nameplate\\)`),
    );
    expect(row(html, 'data-testid="part-battery"')).toContain(
      `${passing.battery.batteryCount} Batteries Cobble AGM 200 AGM lead-acid, 12 V, 200 Ah (20 h rate) each`,
    );
    expect(row(html, 'data-testid="part-controller"')).toContain("MPPT, up to 100 V in, 30 A out");
    expect(row(html, 'data-testid="part-inverter"')).toContain("1 Inverter Hearth 1000 1,000 W continuous, 2,000 W surge");
  });

  it("lists every cable run with its conductor, drop against the target and fuse", () => {
    const html = markup(PartsList, { plan: passing, labels });
    expect(countMatches(html, /data-run="/)).toBe(3);
    for (const run of passing.cables) {
      const text = row(html, `data-run="${run.id}"`);
      expect(text).toContain(run.label);
      expect(text).toContain(run.conductor!.label);
      expect(text).toMatch(/AWG/);
      expect(text).toContain(`${run.dropPct!.toFixed(2)} % / 3.0 % target`);
      expect(text).toContain(run.meetsDropTarget ? "within target" : "over target");
      expect(text).toContain(`${run.protectionA} A`);
    }
    expect(countMatches(html, /data-protection="/)).toBe(passing.protection.length);
  });

  it("writes metric conductors in mm²", () => {
    const plan = planKit(hutPlanInput({ conductorSystem: "mm2" }));
    const text = textOf(markup(PartsList, { plan, labels }));
    expect(text).toMatch(/\d+(\.\d+)? mm²/);
    expect(text).not.toMatch(/AWG/);
  });

  it("says a kit without an inverter is DC only and has no inverter cable", () => {
    const html = markup(PartsList, { plan: dcOnly, labels: { ...labels, inverter: null }, parts: dcOnlyPlanInput().parts });
    expect(row(html, 'data-testid="part-inverter"')).toContain("No inverter: DC only");
    expect(countMatches(html, /data-run="/)).toBe(2);
    expect(html).not.toContain('data-run="battery-to-inverter"');
  });
});

describe("LayoutOptions", () => {
  it("marks the chosen layout with a word, once, and says which layouts are valid", () => {
    const { layouts, layout } = passing.array;
    const html = markup(LayoutOptions, { layouts, chosen: layout });
    expect(countMatches(html, /◆ Chosen/)).toBe(1);
    expect(countMatches(html, /data-chosen="true"/)).toBe(1);
    expect(row(html, 'data-chosen="true"')).toContain(`${layout.modulesInSeries} in series × ${layout.stringsInParallel} strings`);
    expect(row(html, 'data-chosen="true"')).toContain("✓ Valid");
    expect(countMatches(html, /Not valid/)).toBe(layouts.filter((l) => !l.valid).length);
  });

  it("shows a layout set by hand, with the plain reason it is not valid and the controller's limit", () => {
    const html = markup(LayoutOptions, {
      layouts: failing.array.layouts,
      chosen: failing.array.layout,
      forced: true,
      controller: { maxPvVocV: 100, maxChargeCurrentA: 30 },
    });
    const chosen = row(html, 'data-chosen="true"');
    expect(chosen).toContain("◆ Chosen (set by hand)");
    expect(chosen).toContain("101.7 V ≤ 100.0 V ✕ over limit");
    expect(chosen).toContain("Not valid");
    expect(chosen).toContain("cold-morning string voltage 101.7 V is above the controller's 100 V");
  });
});

describe("MonthlyArrayTable", () => {
  it("has twelve months, names the design month, and flags months the array falls short", () => {
    for (const plan of [passing, failing, dcOnly]) {
      const html = markup(MonthlyArrayTable, { plan });
      expect(countMatches(html, /data-month="/)).toBe(12);
      expect(countMatches(html, /design month/)).toBe(1);
      const short = plan.array.months.filter((m) => m.coverage !== null && m.coverage < 1).length;
      expect(countMatches(html, /⚠ short/)).toBe(short);
    }
    expect(failing.array.months.some((m) => m.coverage !== null && m.coverage < 1)).toBe(true);
    const design = failing.array.months[failing.array.designMonth! - 1];
    const text = row(markup(MonthlyArrayTable, { plan: failing }), `data-month="${design.month}"`);
    expect(text).toContain("▼ design month");
    expect(text).toContain(design.modulesNeeded!.toFixed(2));
  });
});
