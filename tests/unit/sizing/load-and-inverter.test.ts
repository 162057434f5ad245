import { describe, expect, it } from "vitest";
import { applianceIssues, summarizeLoadSheet } from "~/domain/load/load-sheet";
import type { Appliance } from "~/domain/load/load-sheet-types";
import { inverterChecks } from "~/domain/sizing/inverter-checks";
import type { InverterPart } from "~/domain/sizing/parts";

// Invented load sheet.
const appliances: Appliance[] = [
  { name: "Fridge", powerW: 150, quantity: 1, hoursPerDay: 8, daysPerWeek: 7, circuit: "ac", surgeW: 900 },
  { name: "Pump", powerW: 500, quantity: 1, hoursPerDay: 1, daysPerWeek: 3, circuit: "ac", surgeW: 1500, months: [6, 7, 8] },
  { name: "Lamps", powerW: 25, quantity: 4, hoursPerDay: 5, daysPerWeek: 7, circuit: "ac" },
  { name: "LED strip", powerW: 10, quantity: 2, hoursPerDay: 6, daysPerWeek: 7, circuit: "dc" },
];
const inverter: InverterPart = { continuousW: 1000, surgeW: 2000, dcInputVoltageV: 24, efficiencyPct: 90, idleDrawW: 10 };

describe("load sheet totals — hand calculation", () => {
  const summary = summarizeLoadSheet(appliances, { efficiencyPct: 90, idleDrawW: 10 });

  it("adds energy per month with weekly use spread over the week, AC through the inverter plus idle draw", () => {
    // January: AC 150×8 + 4×25×5 = 1200 + 500 = 1700 Wh; ÷ 0.9 = 1888.89; idle 10 W × 24 h = 240; DC 2×10×6 = 120.
    const jan = summary.months[0];
    expect(jan.acWhPerDay).toBeCloseTo(1700, 9);
    expect(jan.acFromBatteryWhPerDay).toBeCloseTo(1888.889, 3);
    expect(jan.inverterIdleWhPerDay).toBe(240);
    expect(jan.dcWhPerDay).toBe(120);
    expect(jan.totalWhPerDay).toBeCloseTo(2248.889, 3);
    // July adds the pump: 500 W × 1 h × 3/7 = 214.29 Wh/day at the appliance.
    const jul = summary.months[6];
    expect(jul.acWhPerDay).toBeCloseTo(1700 + 1500 / 7, 9);
    expect(summary.maxDailyWh).toBeCloseTo(jul.totalWhPerDay, 9);
  });

  it("gives the peak simultaneous AC power and the largest surge with everything else running", () => {
    // All AC appliances at once in July: 150 + 500 + 100 = 750 W; January 250 W.
    expect(summary.months[0].peakAcW).toBe(250);
    expect(summary.peakAcW).toBe(750);
    expect(summary.peakDcW).toBe(20);
    // The pump's 1500 W surge with fridge and lamps running: 750 − 500 + 1500 = 1750 W.
    expect(summary.largestSurge).toEqual({ appliance: "Pump", surgeW: 1500, startingDemandW: 1750 });
    // Annual: sum of days × daily total.
    const annual = summary.months.reduce((s, m, i) => s + (m.totalWhPerDay * [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][i]) / 1000, 0);
    expect(summary.annualKWh).toBeCloseTo(annual, 9);
  });

  it("counts no idle draw in months without AC load, and names bad fields", () => {
    const dcOnly = summarizeLoadSheet([appliances[3]], { efficiencyPct: 90, idleDrawW: 10 });
    expect(dcOnly.months.every((m) => m.inverterIdleWhPerDay === 0)).toBe(true);
    expect(dcOnly.largestSurge).toBeNull();
    expect(applianceIssues({ ...appliances[0], hoursPerDay: 25, surgeW: 100 })).toEqual({
      hoursPerDay: "Hours per day must be between 0 and 24.",
      surgeW: "Surge power must be at least the running power.",
    });
    expect(() => summarizeLoadSheet([{ ...appliances[0], quantity: 0 }], null)).toThrow(/Fridge/);
  });
});

describe("inverter checks", () => {
  const load = summarizeLoadSheet(appliances, { efficiencyPct: 90, idleDrawW: 10 });
  const byId = (checks: ReturnType<typeof inverterChecks>, id: string) => checks.find((c) => c.id === id);

  it("continuous ≥ peak AC × 1.25 passes, between warns, below fails", () => {
    // Peak 750 W → 937.5 W with the 25 % margin (common practice, no source).
    expect(byId(inverterChecks(inverter, load, 24, 25), "inverter.continuous")?.status).toBe("pass");
    expect(byId(inverterChecks({ ...inverter, continuousW: 800 }, load, 24, 25), "inverter.continuous")?.status).toBe("warn");
    expect(byId(inverterChecks({ ...inverter, continuousW: 700 }, load, 24, 25), "inverter.continuous")?.status).toBe("fail");
  });

  it("surge ≥ the largest surge (1500 W), and a warning below the surge with everything running (1750 W)", () => {
    expect(byId(inverterChecks(inverter, load, 24, 25), "inverter.surge")?.status).toBe("pass");
    expect(byId(inverterChecks({ ...inverter, surgeW: 1600 }, load, 24, 25), "inverter.surge")?.status).toBe("warn");
    const fail = byId(inverterChecks({ ...inverter, surgeW: 1200 }, load, 24, 25), "inverter.surge");
    expect(fail?.status).toBe("fail");
    expect(fail?.sentence).toMatch(/cannot start the Pump/);
  });

  it("a DC input that does not match the bank is a failing safety check; no inverter with AC loads fails", () => {
    const wrong = byId(inverterChecks({ ...inverter, dcInputVoltageV: 12 }, load, 24, 25), "inverter.dc-voltage");
    expect(wrong).toMatchObject({ kind: "safety", status: "fail" });
    expect(inverterChecks(null, load, 24, 25)[0]).toMatchObject({ id: "inverter.present", status: "fail" });
  });
});
