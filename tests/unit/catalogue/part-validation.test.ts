// Battery, charge controller and inverter checks.
import { describe, expect, it } from "vitest";
import { validateBattery, validateController, validateInverter } from "~/domain/catalogue/part-validation";
import type { BatterySpec, ControllerSpec, InverterSpec } from "~/domain/catalogue/part-specs";

// Invented parts (demo-style figures, no real product).
const agm: BatterySpec = {
  maker: "K",
  model: "AGM",
  chemistry: "lead-acid-agm",
  nominalVoltageV: 12,
  capacityAh: 100,
  capacityHourRateH: 20,
  usableDodPct: 50,
  cycleLife: 600,
  roundTripEfficiencyPct: 82,
  massKg: 29,
};
const lfp: BatterySpec = {
  maker: "W",
  model: "LFP",
  chemistry: "lifepo4",
  nominalVoltageV: 12.8,
  capacityAh: 100,
  capacityHourRateH: 5,
  usableDodPct: 90,
  cycleLife: 4000,
  roundTripEfficiencyPct: 95,
  massKg: 12.5,
};
const none = { maxPvPower12W: null, maxPvPower24W: null, maxPvPower36W: null, maxPvPower48W: null };
const mppt: ControllerSpec = {
  maker: "T",
  model: "M40",
  kind: "mppt",
  ...none,
  maxPvPower12W: 520,
  maxPvPower24W: 1040,
  maxPvVocV: 150,
  maxChargeCurrentA: 40,
  efficiencyPct: 97.5,
};
const inverter: InverterSpec = { maker: "A", model: "SW1000", continuousW: 1000, surgeW: 2000, dcInputVoltageV: 12, efficiencyPct: 91, idleDrawW: 8 };

describe("battery validation", () => {
  it("accepts consistent lead-acid and LiFePO4 batteries", () => {
    expect(validateBattery(agm)).toEqual({});
    expect(validateBattery(lfp)).toEqual({});
    expect(validateBattery({ ...lfp, massKg: null })).toEqual({});
  });

  it("holds lead-acid to whole 2 V cells", () => {
    // A lead-acid cell is 2 V nominal (common knowledge of the trade; from memory).
    expect(validateBattery({ ...agm, nominalVoltageV: 12.8 }).nominalVoltageV).toMatch(/multiple of 2 V/);
    expect(validateBattery({ ...agm, nominalVoltageV: 6 }).nominalVoltageV).toBeUndefined();
  });

  it("refuses a lead-acid depth of discharge beyond 80 %", () => {
    // Common practice, no source: lead-acid is planned at about 50 % for daily cycling.
    expect(validateBattery({ ...agm, usableDodPct: 90 }).usableDodPct).toMatch(/wears out fast/);
    expect(validateBattery({ ...lfp, usableDodPct: 95 }).usableDodPct).toBeUndefined();
  });

  it("catches a capacity or mass that gives an impossible specific energy", () => {
    // 12 V × 100 Ah = 1200 Wh in 2.9 kg is 414 Wh/kg: far beyond lead-acid (≈ 25–45 Wh/kg, from memory).
    expect(validateBattery({ ...agm, massKg: 2.9 }).massKg).toMatch(/414 Wh\/kg/);
  });
});

describe("charge controller validation", () => {
  it("accepts a consistent MPPT controller", () => {
    expect(validateController(mppt)).toEqual({});
  });

  it("needs at least one battery voltage", () => {
    expect(validateController({ ...mppt, ...none }).maxPvPower12W).toMatch(/at least one battery voltage/);
  });

  it("needs a PV input limit above the highest bank's charging voltage", () => {
    // A 48 V bank charges at about 60 V (1.25 × nominal; common practice, no source).
    expect(validateController({ ...mppt, maxPvPower48W: 2080, maxPvVocV: 55 }).maxPvVocV).toMatch(/48 V bank charges at about 60 V/);
  });

  it("catches a PV power far beyond what the charge current can deliver", () => {
    // 40 A into a 12 V bank at ≈ 15 V is ≈ 600 W; 5200 W (a slipped digit) is flagged at the 12 V field.
    expect(validateController({ ...mppt, maxPvPower12W: 5200 }).maxPvPower12W).toMatch(/more than twice what 40 A puts into a 12 V bank \(about 600 W\)/);
  });
});

describe("inverter validation", () => {
  it("accepts a consistent inverter", () => {
    expect(validateInverter(inverter)).toEqual({});
  });

  it("needs surge power at least the continuous power", () => {
    expect(validateInverter({ ...inverter, surgeW: 800 }).surgeW).toMatch(/at least the continuous power \(1000 W\)/);
  });

  it("accepts only the usual battery voltages", () => {
    expect(validateInverter({ ...inverter, dcInputVoltageV: 13 }).dcInputVoltageV).toMatch(/one of 12, 24, 36, 48, 96 V/);
  });

  it("flags a battery current no off-grid cabling carries", () => {
    // I = P / (V · η): 6000 W / (12 V × 0.91) = 549 A.
    expect(validateInverter({ ...inverter, continuousW: 6000, surgeW: 12000, idleDrawW: 30 }).dcInputVoltageV).toMatch(/549 A/);
  });
});
