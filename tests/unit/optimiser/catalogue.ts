// An invented small catalogue and offers for the optimiser tests (no real product or supplier). Prices
// are in euro cents; a "shipping" amount is per order. The 160 W module's 8 A maximum series fuse is
// below 1.56 × Isc, so any layout of it with three or more strings (e.g. on the PWM controller, one in
// series) fails the string-fuse check — a check only the full plan makes. Module areas (m²) are
// length × width of invented sizes: 1000 × 670, 1480 × 990 and 1480 × 670 mm.
import type { BatteryPart, ControllerPart, InverterPart, ModulePart } from "~/domain/sizing/parts";
import type { AlternativesInput, CandidatePart, OfferPrice } from "~/domain/sourcing/alternatives/types";
import { hutPlanInput } from "../sizing/plan-fixtures";

export function offer(offerId: string, unitMinor: number, shippingMinor = 0, breaks: [number, number][] = []): OfferPrice {
  return {
    offerId,
    supplierName: `Supplier of ${offerId}`,
    costMinor(quantity) {
      let unit = unitMinor;
      for (const [minQty, price] of breaks) if (quantity >= minQty) unit = price;
      return quantity * unit + shippingMinor;
    },
  };
}

function part<P>(id: string, p: P, offers: OfferPrice[]): CandidatePart<P> {
  return { id, label: `Part ${id}`, part: p, offers };
}

const MODULE_BASE = { vmpV: 18.2, vocV: 22.1, gammaPmaxPctPerC: -0.4, betaVocPctPerC: -0.3, alphaIscPctPerC: 0.05, noctC: 45, cellsInSeries: 36 };

export const MODULES = [
  part<ModulePart>("mod-100", { ...MODULE_BASE, pmaxW: 100, impA: 5.5, iscA: 5.9, areaM2: 0.67 }, [
    offer("o-m100-a", 9000, 2500),
    offer("o-m100-b", 9500, 0, [[6, 8200]]),
  ]),
  part<ModulePart>(
    "mod-160",
    { ...MODULE_BASE, vmpV: 30.5, vocV: 37.2, pmaxW: 160, impA: 5.25, iscA: 5.6, cellsInSeries: 60, maxSeriesFuseA: 8, areaM2: 1.4652 },
    [offer("o-m160", 13000, 3000)],
  ),
  part<ModulePart>("mod-200", { ...MODULE_BASE, pmaxW: 200, impA: 11, iscA: 11.8, areaM2: 0.9916 }, [offer("o-m200", 17500, 4000)]),
];

export const CONTROLLERS = [
  part<ControllerPart>(
    "ctl-mppt-30",
    { kind: "mppt", batteryVoltagesV: [12, 24], maxPvVocV: 100, maxChargeCurrentA: 30, maxPvPowerW: { "12": 400, "24": 800 }, efficiencyPct: 97 },
    [offer("o-c30", 21000)],
  ),
  part<ControllerPart>(
    "ctl-mppt-50",
    {
      kind: "mppt",
      batteryVoltagesV: [12, 24, 48],
      maxPvVocV: 150,
      maxChargeCurrentA: 50,
      maxPvPowerW: { "12": 700, "24": 1400, "48": 2800 },
      efficiencyPct: 98,
    },
    [offer("o-c50-a", 39000), offer("o-c50-b", 36000, 1500)],
  ),
  part<ControllerPart>(
    "ctl-pwm-30",
    { kind: "pwm", batteryVoltagesV: [12, 24], maxPvVocV: 50, maxChargeCurrentA: 30, maxPvPowerW: { "12": 400, "24": 800 }, efficiencyPct: 98 },
    [offer("o-p30", 6000)],
  ),
  part<ControllerPart>(
    "ctl-12v-only",
    { kind: "mppt", batteryVoltagesV: [12], maxPvVocV: 100, maxChargeCurrentA: 20, maxPvPowerW: { "12": 260 }, efficiencyPct: 97 },
    [offer("o-c12", 9000)],
  ),
];

const AGM = { chemistry: "lead-acid-agm" as const, nominalVoltageV: 12, capacityHourRateH: 20, usableDodPct: 50, cycleLife: 1200, roundTripEfficiencyPct: 85 };
export const BATTERIES = [
  part<BatteryPart>("bat-agm-200", { ...AGM, capacityAh: 200 }, [offer("o-b200", 36000, 5000)]),
  part<BatteryPart>("bat-agm-100", { ...AGM, capacityAh: 100 }, [offer("o-b100", 19000, 5000)]),
  part<BatteryPart>(
    "bat-lfp-100",
    { chemistry: "lifepo4", nominalVoltageV: 12.8, capacityAh: 100, capacityHourRateH: 5, usableDodPct: 90, cycleLife: 4000, roundTripEfficiencyPct: 95 },
    [offer("o-l100", 52000)],
  ),
];

export const INVERTERS = [
  part<InverterPart>("inv-1000", { continuousW: 1000, surgeW: 2000, dcInputVoltageV: 24, efficiencyPct: 90, idleDrawW: 8 }, [offer("o-i1000", 32000)]),
  part<InverterPart>("inv-1500", { continuousW: 1500, surgeW: 3000, dcInputVoltageV: 24, efficiencyPct: 92, idleDrawW: 12 }, [offer("o-i1500", 41000)]),
  part<InverterPart>("inv-400", { continuousW: 400, surgeW: 800, dcInputVoltageV: 24, efficiencyPct: 90, idleDrawW: 5 }, [offer("o-i400", 9000)]),
];

export function smallCatalogueInput(overrides: Partial<AlternativesInput> = {}): AlternativesInput {
  return {
    base: hutPlanInput({ acceptableUnmetDaysPerYear: 5 }),
    current: { moduleId: "mod-100", controllerId: "ctl-mppt-30", batteryId: "bat-agm-200", inverterId: "inv-1000" },
    currency: "EUR",
    modules: MODULES,
    controllers: CONTROLLERS,
    batteries: BATTERIES,
    inverters: INVERTERS,
    ...overrides,
  };
}
