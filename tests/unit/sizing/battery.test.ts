import { describe, expect, it } from "vitest";
import { sizeBatteryBank } from "~/domain/sizing/battery-bank";
import { batteryColdCheck, dischargeRateCheck, parallelStringsCheck } from "~/domain/sizing/battery-checks";
import { capacityTemperatureFactor } from "~/domain/sizing/chemistry";
import type { BatteryPart } from "~/domain/sizing/parts";
import { peukertDeliveredCapacityAh, peukertRuntimeH } from "~/domain/sizing/peukert";

// Invented batteries.
const flooded6V: BatteryPart = {
  chemistry: "lead-acid-flooded",
  nominalVoltageV: 6,
  capacityAh: 225,
  capacityHourRateH: 20,
  usableDodPct: 50,
  cycleLife: 1500,
  roundTripEfficiencyPct: 80,
};
const lfp12V: BatteryPart = {
  chemistry: "lifepo4",
  nominalVoltageV: 12,
  capacityAh: 100,
  capacityHourRateH: 5,
  usableDodPct: 90,
  cycleLife: 4000,
  roundTripEfficiencyPct: 95,
};

describe("battery bank for autonomy, depth of discharge and temperature", () => {
  it("sizes a lead-acid bank — hand calculation", () => {
    // Temperature factor at 0 °C: 1 − 0.009 × 25 = 0.775 (lead-acid, ~0.9 %/°C below 25 °C — from memory).
    expect(capacityTemperatureFactor("lead-acid-flooded", 0)).toBeCloseTo(0.775, 12);
    // 1200 Wh/day × 3 days = 3600 Wh usable; ÷ (0.50 × 0.775) = 9290.32 Wh nominal; ÷ 24 V = 387.10 Ah.
    // 6 V batteries: 24 ÷ 6 = 4 in series; ⌈387.10 ÷ 225⌉ = 2 strings → 8 batteries, 450 Ah.
    // Usable: 450 Ah × 24 V × 0.5 × 0.775 = 4185 Wh → 3.4875 days.
    const bank = sizeBatteryBank({ battery: flooded6V, systemVoltageV: 24, dailyLoadWh: 1200, autonomyDays: 3, batteryTempC: 0 });
    expect(bank.requiredUsableWh).toBeCloseTo(3600, 9);
    expect(bank.requiredNominalWh).toBeCloseTo(9290.3226, 3);
    expect(bank.requiredAh).toBeCloseTo(387.0968, 3);
    expect([bank.batteriesInSeries, bank.stringsInParallel, bank.batteryCount]).toEqual([4, 2, 8]);
    expect(bank.bankAh).toBe(450);
    expect(bank.bankUsableWh).toBeCloseTo(4185, 6);
    expect(bank.autonomyDaysAchieved).toBeCloseTo(3.4875, 9);
    expect(bank.seriesExact).toBe(true);
  });

  it("uses the lower of the design's and the battery's depth of discharge, and no credit above 25 °C", () => {
    // LiFePO4 at 30 °C: factor 1. Depth min(90, 80) = 80 %. 2000 Wh × 2 ÷ 0.8 = 5000 Wh ÷ 12 V = 416.7 Ah → 5 × 100 Ah.
    const bank = sizeBatteryBank({ battery: lfp12V, systemVoltageV: 12, dailyLoadWh: 2000, autonomyDays: 2, maxDepthOfDischargePct: 80, batteryTempC: 30 });
    expect(bank.effectiveDodPct).toBe(80);
    expect(bank.temperatureFactor).toBe(1);
    expect(bank.requiredAh).toBeCloseTo(416.667, 3);
    expect(bank.stringsInParallel).toBe(5);
  });

  it("counts 12.8 / 25.6 / 51.2 V lithium blocks as the 12 / 24 / 48 V classes (common practice, no source)", () => {
    // 8 cells × 3.2 V = 25.6 V: one block is a 24 V bank; two 12.8 V blocks in series make 24 V.
    const one = sizeBatteryBank({ battery: { ...lfp12V, nominalVoltageV: 25.6 }, systemVoltageV: 24, dailyLoadWh: 1000, autonomyDays: 1, batteryTempC: 20 });
    expect([one.seriesExact, one.batteriesInSeries]).toEqual([true, 1]);
    const two = sizeBatteryBank({ battery: { ...lfp12V, nominalVoltageV: 12.8 }, systemVoltageV: 24, dailyLoadWh: 1000, autonomyDays: 1, batteryTempC: 20 });
    expect([two.seriesExact, two.batteriesInSeries]).toEqual([true, 2]);
    const tooHigh = sizeBatteryBank({
      battery: { ...lfp12V, nominalVoltageV: 51.2 },
      systemVoltageV: 24,
      dailyLoadWh: 1000,
      autonomyDays: 1,
      batteryTempC: 20,
    });
    expect(tooHigh.seriesExact).toBe(false);
  });

  it("flags batteries whose voltage does not divide the system voltage", () => {
    const odd = sizeBatteryBank({ battery: { ...lfp12V, nominalVoltageV: 36 }, systemVoltageV: 48, dailyLoadWh: 1000, autonomyDays: 1, batteryTempC: 20 });
    expect(odd.seriesExact).toBe(false);
    const tooHigh = sizeBatteryBank({ battery: { ...lfp12V, nominalVoltageV: 48 }, systemVoltageV: 24, dailyLoadWh: 1000, autonomyDays: 1, batteryTempC: 20 });
    expect(tooHigh.seriesExact).toBe(false);
  });

  it("warns for many parallel lead-acid strings (common practice, no source) and for charging lithium in frost", () => {
    const four = sizeBatteryBank({ battery: flooded6V, systemVoltageV: 24, dailyLoadWh: 1200, autonomyDays: 3, batteryTempC: 0, stringsInParallel: 4 });
    expect(parallelStringsCheck(four, flooded6V).status).toBe("warn");
    const three = { ...four, stringsInParallel: 3 };
    expect(parallelStringsCheck(three, flooded6V).status).toBe("pass");
    const lfpBank = sizeBatteryBank({ battery: lfp12V, systemVoltageV: 12, dailyLoadWh: 500, autonomyDays: 2, batteryTempC: 5 });
    expect(batteryColdCheck(lfp12V, lfpBank, -1).status).toBe("warn");
    expect(batteryColdCheck(lfp12V, lfpBank, -1).kind).toBe("safety");
    expect(batteryColdCheck(lfp12V, lfpBank, 3).status).toBe("pass");
  });
});

describe("Peukert's law", () => {
  it("100 Ah at the 20 h rate, k = 1.2, 10 A → 8.71 h (REFERENCES)", () => {
    // t = 20 × (100 ÷ (10 × 20))^1.2 = 20 × 0.5^1.2 = 8.706 h.
    expect(peukertRuntimeH(100, 20, 10, 1.2)).toBeCloseTo(8.71, 2);
    expect(peukertDeliveredCapacityAh(100, 20, 10, 1.2)).toBeCloseTo(87.06, 1);
    // At the rated current the rated capacity comes out whatever k is.
    expect(peukertRuntimeH(100, 20, 5, 1.3)).toBeCloseTo(20, 12);
  });

  it("notes heavy discharge of a lead-acid bank", () => {
    const bank = sizeBatteryBank({ battery: flooded6V, systemVoltageV: 24, dailyLoadWh: 1200, autonomyDays: 3, batteryTempC: 20 });
    // 450 Ah at 20 h: rated current 22.5 A. At 150 A with k = 1.25: t = 20 × (450/3000)^1.25 = 1.86 h, 62 % of 450 Ah.
    const heavy = dischargeRateCheck(flooded6V, bank, 150);
    expect(heavy.status).toBe("warn");
    expect(heavy.figures.find((f) => f.label === "Hours to empty at the heaviest draw")?.value).toBeCloseTo(20 * (450 / 3000) ** 1.25, 9);
    expect(dischargeRateCheck(flooded6V, bank, 20).status).toBe("pass");
  });
});
