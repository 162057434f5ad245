// The margins that decide whether a controller or inverter fits a kit: rated PV power and charge
// current at the bank voltage for a controller, continuous power and DC voltage for an inverter.
// Headroom = (rating − need) ÷ rating; below zero the part is too small.

export interface ControllerRating {
  batteryVoltagesV: readonly number[];
  /** Rated PV power per nominal battery voltage, e.g. { "12": 520, "24": 1040 }. */
  maxPvPowerW: Readonly<Record<string, number>>;
  maxChargeCurrentA: number;
}

export interface ControllerHeadroom {
  supportsVoltage: boolean;
  ratedPvPowerW: number | null;
  powerHeadroomPct: number | null;
  /** Array power ÷ bank voltage: the charge current if the whole array reached the bank, A. */
  chargeCurrentA: number;
  currentHeadroomPct: number;
}

export function headroomPct(rating: number, need: number): number {
  return (100 * (rating - need)) / rating;
}

/**
 * Charge current ≈ array power ÷ bank voltage (an MPPT controller converts power, losing a few per
 * cent; taking none is the cautious side). Common practice, no source.
 */
export function controllerHeadroom(controller: ControllerRating, arrayPowerW: number, batteryVoltageV: number): ControllerHeadroom {
  const rated = controller.maxPvPowerW[String(batteryVoltageV)];
  const supportsVoltage = controller.batteryVoltagesV.includes(batteryVoltageV) && typeof rated === "number" && rated > 0;
  const chargeCurrentA = arrayPowerW / batteryVoltageV;
  return {
    supportsVoltage,
    ratedPvPowerW: supportsVoltage ? rated : null,
    powerHeadroomPct: supportsVoltage ? headroomPct(rated, arrayPowerW) : null,
    chargeCurrentA,
    currentHeadroomPct: headroomPct(controller.maxChargeCurrentA, chargeCurrentA),
  };
}

export interface InverterHeadroom {
  voltageMatches: boolean;
  continuousHeadroomPct: number;
}

export function inverterHeadroom(inverter: { continuousW: number; dcInputVoltageV: number }, peakAcLoadW: number, batteryVoltageV: number): InverterHeadroom {
  return { voltageMatches: inverter.dcInputVoltageV === batteryVoltageV, continuousHeadroomPct: headroomPct(inverter.continuousW, peakAcLoadW) };
}
