// Price per watt, per usable kWh and per cycle-kWh. Every expected value is worked out by hand in the
// comment beside it (plain division); the definitions are common practice, no source.
import { describe, expect, it } from "vitest";
import { money } from "~/domain/money/money";
import { pricePerCycleKWh, pricePerKW, pricePerUsableKWh, pricePerWatt } from "~/domain/sourcing/unit-costs";
import { usableEnergyKWh } from "~/domain/catalogue/derived-figures";

describe("price per watt", () => {
  it("divides the unit price by the module's power, in decimals", () => {
    // 58.50 ÷ 150 W = 0.39 exactly
    expect(pricePerWatt(money("58.50", "EUR"), 150)!.amount.toFixed()).toBe("0.39");
    // 48.00 ÷ 120 W = 0.4
    expect(pricePerWatt(money("48.00", "EUR"), 120)!.amount.toFixed()).toBe("0.4");
    // 58.50 ÷ 126 W = 0.4642857142… (126 W = 84 % of 150 W)
    expect(pricePerWatt(money("58.50", "EUR"), 126)!.amount.toFixed(10)).toBe("0.4642857143");
    // 48.00 ÷ 118.8 W = 0.4040404040… (118.8 W = 99 % of 120 W)
    expect(pricePerWatt(money("48.00", "EUR"), 118.8)!.amount.toFixed(10)).toBe("0.4040404040");
    expect(pricePerWatt(money("48.00", "EUR"), 118.8)!.currency).toBe("EUR");
  });

  it("has no figure without a power", () => {
    expect(pricePerWatt(money("48", "EUR"), null)).toBeNull();
    expect(pricePerWatt(money("48", "EUR"), 0)).toBeNull();
  });
});

describe("battery storage cost", () => {
  // LiFePO4, 12.8 V × 100 Ah × 90 % = 1.152 kWh usable; lead-acid AGM, 12 V × 200 Ah × 50 % = 1.2 kWh.
  const lfpKWh = usableEnergyKWh(12.8, 100, 90);
  const agmKWh = usableEnergyKWh(12, 200, 50);

  it("uses the usable part of the stored energy", () => {
    expect(lfpKWh).toBeCloseTo(1.152, 12);
    expect(agmKWh).toBeCloseTo(1.2, 12);
  });

  it("prices a usable kWh: 410.00 ÷ 1.152 = 355.90…, 260.00 ÷ 1.2 = 216.66…", () => {
    expect(pricePerUsableKWh(money("410.00", "EUR"), lfpKWh)!.amount.toFixed(4)).toBe("355.9028");
    expect(pricePerUsableKWh(money("260.00", "EUR"), agmKWh)!.amount.toFixed(4)).toBe("216.6667");
  });

  it("prices a kWh cycled over the rated life: 410 ÷ (1.152 × 4000) = 0.08898, 260 ÷ (1.2 × 1200) = 0.18056", () => {
    // The dearer battery per kWh is the cheaper one per kWh delivered over its life.
    expect(pricePerCycleKWh(money("410.00", "EUR"), lfpKWh, 4000)!.amount.toFixed(5)).toBe("0.08898");
    expect(pricePerCycleKWh(money("260.00", "EUR"), agmKWh, 1200)!.amount.toFixed(5)).toBe("0.18056");
    expect(pricePerCycleKWh(money("260.00", "EUR"), agmKWh, 0)).toBeNull();
  });
});

describe("inverter", () => {
  it("prices a continuous kW: 389.00 ÷ 1.5 kW = 259.33…", () => {
    expect(pricePerKW(money("389.00", "EUR"), 1500)!.amount.toFixed(2)).toBe("259.33");
  });
});
