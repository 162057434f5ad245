import { describe, expect, it } from "vitest";
import { describeInputChanges, describeResultChanges, differs } from "~/domain/sizing/plan-changes";
import { planKit } from "~/domain/sizing/kit-plan";
import { hutPlanInput } from "./plan-fixtures";

const base = () => hutPlanInput();

describe("what changed since a plan was saved", () => {
  it("says nothing when nothing changed", () => {
    const input = base();
    expect(describeInputChanges(input, base())).toEqual([]);
    expect(describeResultChanges(planKit(input), planKit(base()))).toEqual([]);
  });

  it("ignores key order and absent keys, as a snapshot read back from jsonb has them", () => {
    const input = base();
    const reordered = JSON.parse(
      JSON.stringify({ appliances: input.appliances, parts: input.parts, site: input.site, design: input.design, systemVoltageV: input.systemVoltageV }),
    );
    const reversedSite = Object.fromEntries(Object.entries(reordered.site).reverse());
    expect(describeInputChanges(input, { ...reordered, site: reversedSite })).toEqual([]);
  });

  it("names a module's new verified power, a colder site and a changed load", () => {
    const saved = base();
    const current = base();
    current.parts.module = { ...current.parts.module, verifiedPmaxW: 81.5, verifiedReadingCount: 4 };
    current.site = { ...current.site, coldestTempC: current.site.coldestTempC - 10 };
    current.appliances = [...current.appliances, { name: "Radio", powerW: 10, quantity: 1, hoursPerDay: 2, daysPerWeek: 7, circuit: "dc" }];
    const changes = describeInputChanges(saved, current).join(" ");
    expect(changes).toMatch(/verified power: .* → 81\.5 W from 4 readings/);
    expect(changes).toMatch(/Coldest expected temperature/);
    expect(changes).toMatch(/load sheet changed/);
  });

  it("names a hottest expected temperature set since the plan was saved, changed or cleared, and nothing else", () => {
    // A snapshot from before sites had a design high has no hottestTempC; the site's new value is the installer's choice.
    const saved = base();
    const current = base();
    current.site = { ...current.site, hottestTempC: 38 };
    expect(describeInputChanges(saved, current)).toEqual(["Hottest expected temperature: none → 38 °C."]);
    const hotter = base();
    hotter.site = { ...hotter.site, hottestTempC: 41.5 };
    expect(describeInputChanges(current, hotter)).toEqual(["Hottest expected temperature: 38 °C → 41.5 °C."]);
    expect(describeInputChanges(current, saved)).toEqual(["Hottest expected temperature: 38 °C → none."]);
    // Read back from jsonb, the same value is no change.
    expect(describeInputChanges(JSON.parse(JSON.stringify(current)), current)).toEqual([]);
  });

  it("does not call the module's area a change for a plan saved before areas were kept, but sees a changed area", () => {
    const saved = base();
    const { areaM2: _area, ...withoutArea } = saved.parts.module;
    saved.parts.module = withoutArea;
    const current = base();
    current.parts.module = { ...current.parts.module, areaM2: 1.69 };
    expect(describeInputChanges(saved, current)).toEqual([]);
    const resized = base();
    resized.parts.module = { ...resized.parts.module, areaM2: 1.69 };
    const larger = base();
    larger.parts.module = { ...larger.parts.module, areaM2: 1.8 };
    expect(describeInputChanges(resized, larger)).toEqual(["Other module figures in the catalogue changed."]);
  });

  it("still sees a real difference deep inside", () => {
    expect(differs({ a: [1, { b: 2 }] }, { a: [1, { b: 3 }] })).toBe(true);
    expect(differs({ a: 1, b: undefined }, { a: 1 })).toBe(false);
  });
});
