// The comparison's need read from the page URL: defaults, typed values, and messages for bad ones.
import { describe, expect, it } from "vitest";
import { needFromSearchParams } from "~/lib/sourcing-compare-need";

describe("need from the URL", () => {
  it("starts from the defaults: modules count themselves from the energy target, batteries come in fours", () => {
    const modules = needFromSearchParams("modules", new URLSearchParams());
    expect(modules.need).toMatchObject({ quantity: null, arrayEnergyWhPerDay: 2400, sunHoursPerDay: 3, systemLossesPct: 20, source: { kind: "typed" } });
    expect(needFromSearchParams("batteries", new URLSearchParams()).need.quantity).toBe(4);
    expect(needFromSearchParams("inverters", new URLSearchParams()).need.quantity).toBe(1);
  });

  it("takes typed values (energy in kWh/day)", () => {
    const { need, errors } = needFromSearchParams("modules", new URLSearchParams("energy=1.2&sun=4.5&losses=15&qty=6"));
    expect(errors).toEqual({});
    expect(need).toMatchObject({ arrayEnergyWhPerDay: 1200, sunHoursPerDay: 4.5, systemLossesPct: 15, quantity: 6 });
  });

  it("names a bad value and keeps the default meanwhile", () => {
    const { need, errors, values } = needFromSearchParams("controllers", new URLSearchParams("bank=twelve&array=0&qty=1.5"));
    expect(errors.bank).toMatch(/enter a number/);
    expect(errors.array).toMatch(/from 1 to 100000/);
    expect(errors.qty).toMatch(/whole number/);
    expect(values.bank).toBe("twelve");
    expect(need).toMatchObject({ batteryVoltageV: 24, arrayPowerW: 1000, quantity: 1 });
  });
});
