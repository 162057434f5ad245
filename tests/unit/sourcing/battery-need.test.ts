// Each battery model is counted for the bank a comparison asks for: series for the voltage, strings
// in parallel for the usable energy at its own depth of discharge and cold capacity. Figures worked
// by hand below with the sizing's bank rule (battery-bank.ts: nominal Wh = usable Wh ÷ (DoD × cold
// factor), Ah = nominal Wh ÷ bank V, strings = ⌈Ah ÷ battery Ah⌉); the cold factors are the
// sizing's own (chemistry.ts: lead-acid −0.9 %/°C, lithium −0.5 %/°C below 25 °C, from memory).
import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { planKit } from "~/domain/sizing/kit-plan";
import { bankForModel, type BankNeed } from "~/domain/sourcing/battery-need";
import { DEFAULT_NEED, type ComparisonNeed } from "~/domain/sourcing/comparison-need";
import type { BatteryFigures, OfferFacts } from "~/domain/sourcing/offer-facts";
import { needFromPlan } from "~/domain/sourcing/plan-need";
import { batteryRow } from "~/domain/sourcing/part-rows";
import { hutPlanInput } from "../sizing/plan-fixtures";

function battery(model: string, chemistry: string, nominalVoltageV: number, capacityAh: number, usableDodPct: number): BatteryFigures {
  return {
    id: model,
    maker: "Maker",
    model,
    chemistry,
    nominalVoltageV,
    capacityAh,
    capacityHourRateH: 10,
    usableDodPct,
    cycleLife: 2000,
    roundTripEfficiencyPct: 85,
  };
}

const cell2V = battery("OP-2V-500", "lead-acid-flooded", 2, 500, 50);
const agm12V = battery("AGM-12-200", "lead-acid-agm", 12, 200, 50);
const lfp12V = battery("LFP-12-100", "lifepo4", 12.8, 100, 90);
const lfp24V = battery("LFP-24-100", "lifepo4", 25.6, 100, 90);

// Two days of 2.4 kWh on a 24 V bank at 25 °C.
const warm: BankNeed = { bankVoltageV: 24, usableWh: 4800, batteryTempC: 25, maxDepthOfDischargePct: null };

describe("battery count for a bank", () => {
  it("puts a 2 V cell and a 12 V block in different numbers for the same bank", () => {
    // 2 V cell: 24 ÷ 2 = 12 in series; 4800 ÷ 0.5 = 9600 Wh → 400 Ah ≤ 500 Ah → 1 string: 12 cells, 6 kWh usable.
    expect(bankForModel(cell2V, warm)).toMatchObject({ batteriesInSeries: 12, stringsInParallel: 1, count: 12, seriesExact: true });
    expect(bankForModel(cell2V, warm).bankUsableWh).toBeCloseTo(6000, 9);
    // 12 V AGM: 2 in series; 400 Ah ÷ 200 Ah → 2 strings: 4 blocks, 4.8 kWh usable.
    expect(bankForModel(agm12V, warm)).toMatchObject({ batteriesInSeries: 2, stringsInParallel: 2, count: 4 });
    // 12.8 V LiFePO4 serves 12 V: 2 in series; 4800 ÷ 0.9 = 5333 Wh → 222.2 Ah → 3 strings: 6, 6.912 kWh usable.
    expect(bankForModel(lfp12V, warm)).toMatchObject({ batteriesInSeries: 2, stringsInParallel: 3, count: 6, classV: 12 });
    expect(bankForModel(lfp12V, warm).bankUsableWh).toBeCloseTo(6912, 9);
  });

  it("counts the capacity lost in the cold, by chemistry", () => {
    const cold = { ...warm, batteryTempC: 0 };
    // Lead-acid at 0 °C keeps 1 − 0.009 × 25 = 0.775: 4800 ÷ (0.5 × 0.775) = 12 387 Wh → 516.1 Ah.
    expect(bankForModel(agm12V, cold)).toMatchObject({ stringsInParallel: 3, count: 6 });
    expect(bankForModel(agm12V, cold).temperatureFactor).toBeCloseTo(0.775, 12);
    expect(bankForModel(cell2V, cold)).toMatchObject({ batteriesInSeries: 12, stringsInParallel: 2, count: 24 });
    // LiFePO4 keeps 1 − 0.005 × 25 = 0.875: 4800 ÷ (0.9 × 0.875) = 6095 Wh → 254.0 Ah → still 3 strings.
    expect(bankForModel(lfp12V, cold)).toMatchObject({ stringsInParallel: 3, count: 6 });
  });

  it("applies a design limit on depth of discharge only where it is below the battery's own", () => {
    const limited = { ...warm, maxDepthOfDischargePct: 40 };
    // LiFePO4 at 40 %: 4800 ÷ 0.4 = 12 000 Wh → 500 Ah → 5 strings × 2 = 10.
    expect(bankForModel(lfp12V, limited)).toMatchObject({ effectiveDodPct: 40, stringsInParallel: 5, count: 10 });
    // AGM at 40 % (its own is 50 %): 500 Ah ÷ 200 → 3 strings × 2 = 6.
    expect(bankForModel(agm12V, limited)).toMatchObject({ effectiveDodPct: 40, count: 6 });
    expect(bankForModel(agm12V, { ...warm, maxDepthOfDischargePct: 80 })).toMatchObject({ effectiveDodPct: 50, count: 4 });
  });

  it("says when a block cannot make the bank's voltage", () => {
    expect(bankForModel(lfp24V, { ...warm, bankVoltageV: 12 })).toMatchObject({ seriesExact: false, batteriesInSeries: 1 });
    expect(bankForModel(lfp24V, { ...warm, bankVoltageV: 48 })).toMatchObject({ seriesExact: true, batteriesInSeries: 2 });
  });

  it("gives back a plan's own battery count when the plan's own battery is compared", () => {
    for (const maxDepthOfDischargePct of [undefined, 35]) {
      const input = hutPlanInput(maxDepthOfDischargePct === undefined ? {} : { maxDepthOfDischargePct });
      const plan = planKit(input);
      const need = needFromPlan(plan, input.design);
      const own = { ...battery("own", input.parts.battery.chemistry, 12, 200, 50), ...input.parts.battery };
      const bank = bankForModel(own, {
        bankVoltageV: need.bank,
        usableWh: need.store * 1000,
        batteryTempC: need.batteryTempC,
        maxDepthOfDischargePct: need.dodLimitPct,
      });
      expect(bank.count).toBe(plan.battery.batteryCount);
      expect(need.dodLimitPct).toBe(maxDepthOfDischargePct ?? null);
    }
  });
});

describe("battery comparison rows", () => {
  function offer(partId: string, unitPrice: string, shippingPerUnit: string): OfferFacts {
    return {
      id: `o-${partId}`,
      supplierId: "s",
      supplierName: "Supplier",
      partKind: "batteries",
      partId,
      sku: "",
      terms: {
        currency: "EUR",
        unitPrice: new Decimal(unitPrice),
        breaks: [],
        minimumOrder: 1,
        shippingPerUnit: new Decimal(shippingPerUnit),
        shippingPerOrder: new Decimal("40.00"),
      },
      leadTimeDays: 5,
      stock: null,
      validUntil: null,
      notes: "",
    };
  }
  const pricing = { quotingCurrency: "EUR", rates: [], asOf: "2026-12-01" };
  const sized: ComparisonNeed = { ...DEFAULT_NEED, quantity: null, source: { kind: "typed" } };

  it("lands each model for its own count", () => {
    const cellRow = batteryRow(offer("OP-2V-500", "95.00", "2.00"), cell2V, sized, pricing);
    const agmRow = batteryRow(offer("AGM-12-200", "310.00", "0"), agm12V, sized, pricing);
    // The defaults are the 24 V, 4.8 kWh, 25 °C bank above: 12 cells and 4 blocks.
    expect([cellRow.quantityNeeded, cellRow.bank?.count]).toEqual([12, 12]);
    expect([agmRow.quantityNeeded, agmRow.bank?.count]).toEqual([4, 4]);
    // 12 × 95.00 + 12 × 2.00 + 40.00 = 1204.00; 4 × 310.00 + 40.00 = 1280.00.
    expect(cellRow.landed).toEqual({ amount: "1204.00", currency: "EUR" });
    expect(agmRow.landed).toEqual({ amount: "1280.00", currency: "EUR" });
  });

  it("lands a typed quantity as typed, for every model", () => {
    const fixed = { ...sized, quantity: 4 };
    const cellRow = batteryRow(offer("OP-2V-500", "95.00", "2.00"), cell2V, fixed, pricing);
    expect(cellRow.bank).toBeNull();
    expect(cellRow.quantityNeeded).toBe(4);
    // 4 × 95.00 + 4 × 2.00 + 40.00 = 428.00.
    expect(cellRow.landed).toEqual({ amount: "428.00", currency: "EUR" });
  });
});
