// Controller and inverter headroom; expected values worked by hand.
import { describe, expect, it } from "vitest";
import { controllerHeadroom, inverterHeadroom } from "~/domain/sourcing/part-headroom";

const controller = { batteryVoltagesV: [12, 24], maxPvPowerW: { "12": 520, "24": 1040 }, maxChargeCurrentA: 40 };

describe("controller headroom", () => {
  it("1000 W on a 24 V bank: (1040 − 1000) ÷ 1040 = 3.85 % power headroom; 41.7 A is 4.17 % over 40 A", () => {
    const h = controllerHeadroom(controller, 1000, 24);
    expect(h.supportsVoltage).toBe(true);
    expect(h.ratedPvPowerW).toBe(1040);
    expect(h.powerHeadroomPct).toBeCloseTo(3.846, 3);
    expect(h.chargeCurrentA).toBeCloseTo(41.667, 3); // 1000 ÷ 24
    expect(h.currentHeadroomPct).toBeCloseTo(-4.167, 3); // (40 − 41.667) ÷ 40
  });

  it("400 W on a 12 V bank: (520 − 400) ÷ 520 = 23.1 %; 33.3 A leaves 16.7 % of 40 A", () => {
    const h = controllerHeadroom(controller, 400, 12);
    expect(h.powerHeadroomPct).toBeCloseTo(23.077, 3);
    expect(h.currentHeadroomPct).toBeCloseTo(16.667, 3);
  });

  it("says so when the controller does not charge the bank's voltage", () => {
    const h = controllerHeadroom(controller, 1000, 48);
    expect(h.supportsVoltage).toBe(false);
    expect(h.ratedPvPowerW).toBeNull();
    expect(h.powerHeadroomPct).toBeNull();
  });
});

describe("inverter headroom", () => {
  it("1500 W continuous for an 800 W peak: 46.7 %; a 12 V inverter on a 24 V bank does not match", () => {
    expect(inverterHeadroom({ continuousW: 1500, dcInputVoltageV: 24 }, 800, 24)).toEqual({
      voltageMatches: true,
      continuousHeadroomPct: expect.closeTo(46.667, 3),
    });
    expect(inverterHeadroom({ continuousW: 1500, dcInputVoltageV: 12 }, 800, 24).voltageMatches).toBe(false);
  });
});
