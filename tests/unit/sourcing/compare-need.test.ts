// The comparison's need read from the page URL: defaults, typed values, and messages for bad ones.
import { describe, expect, it } from "vitest";
import { needFromSearchParams } from "~/lib/sourcing-compare-need";

describe("need from the URL", () => {
  it("starts from the defaults: modules count themselves from the energy target, batteries from the bank", () => {
    const modules = needFromSearchParams("modules", new URLSearchParams());
    expect(modules.need).toMatchObject({ quantity: null, arrayEnergyWhPerDay: 2400, sunHoursPerDay: 3, systemLossesPct: 20, source: { kind: "typed" } });
    expect(needFromSearchParams("batteries", new URLSearchParams()).need).toMatchObject({
      quantity: null,
      batteryVoltageV: 24,
      bankUsableWh: 4800,
      batteryTempC: 25,
      maxDepthOfDischargePct: null,
    });
    expect(needFromSearchParams("inverters", new URLSearchParams()).need.quantity).toBe(1);
  });

  it("takes typed values (energy in kWh/day)", () => {
    const { need, errors } = needFromSearchParams("modules", new URLSearchParams("energy=1.2&sun=4.5&losses=15&qty=6"));
    expect(errors).toEqual({});
    expect(need).toMatchObject({ arrayEnergyWhPerDay: 1200, sunHoursPerDay: 4.5, systemLossesPct: 15, quantity: 6 });
  });

  it("reads a battery bank, a temperature below zero (either minus sign) and a depth limit", () => {
    const { need, errors } = needFromSearchParams("batteries", new URLSearchParams("store=7.2&bank=48&btemp=-5&dod=60"));
    expect(errors).toEqual({});
    expect(need).toMatchObject({ quantity: null, bankUsableWh: 7200, batteryVoltageV: 48, batteryTempC: -5, maxDepthOfDischargePct: 60 });
    expect(needFromSearchParams("batteries", new URLSearchParams("btemp=\u22123.5")).need.batteryTempC).toBe(-3.5);
    const bad = needFromSearchParams("batteries", new URLSearchParams("btemp=-50&dod=2&store=-1"));
    expect(bad.errors.btemp).toMatch(/from -40 to 60/);
    expect(bad.errors.dod).toMatch(/from 5 to 100/);
    expect(bad.errors.store).toMatch(/enter a number/);
    expect(bad.need).toMatchObject({ batteryTempC: 25, maxDepthOfDischargePct: null, bankUsableWh: 4800 });
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
