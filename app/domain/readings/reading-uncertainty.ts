// How far a field reading normalised to STC can be trusted, and how much it counts towards a
// module's verified power. Every figure below is common practice, no source: typical accuracies of
// the instruments installers carry, not values from a standard.
//
// The terms are independent, so they combine in quadrature (root sum of squares), the usual rule
// for independent relative errors of a product (P_STC ∝ P · 1000/G · 1/(1 + γΔT)).

export type IrradianceSource = "pyranometer" | "reference-cell" | "clear-sky-estimate";
export type CellTemperatureSource = "back-sheet" | "air-noct";

/** Irradiance error by source, % (common practice, no source). */
export const IRRADIANCE_UNCERTAINTY_PCT: Record<IrradianceSource, number> = {
  // A calibrated thermopile pyranometer held in the module's plane.
  pyranometer: 3,
  // A silicon reference cell: small spectral and angular mismatch to the module under test.
  "reference-cell": 4,
  // Haurwitz clear sky: haze, thin cloud and albedo are unknown.
  "clear-sky-estimate": 12,
};

/** Error of the cell temperature, °C (common practice, no source). */
export const CELL_TEMPERATURE_UNCERTAINTY_C: Record<CellTemperatureSource, number> = {
  // Thermometer on the back sheet plus the cell-to-back difference model.
  "back-sheet": 2,
  // NOCT model from air temperature: wind and mounting are unknown.
  "air-noct": 8,
};

/** Meter error of the power itself, % (common practice, no source). */
export const POWER_UNCERTAINTY_PCT = {
  // Voltage and current read by a load's meters over a whole curve, maximum found from the curve.
  sweep: 1,
  // One operating point: it may not sit exactly at the maximum power point.
  single: 3,
} as const;

/** Below this irradiance the linear scaling to 1000 W/m² adds its own error (common practice, no source). */
export const LOW_IRRADIANCE_WM2 = 600;
export const LOW_IRRADIANCE_UNCERTAINTY_PCT = 3;

/** Weight of a reading in the weighted median: measured irradiance counts fully, an estimate half. */
export const WEIGHT_MEASURED_IRRADIANCE = 1;
export const WEIGHT_ESTIMATED_IRRADIANCE = 0.5;

export interface UncertaintyTerm {
  code: "irradiance" | "cell-temperature" | "power" | "low-irradiance";
  label: string;
  pct: number;
}

export interface UncertaintyInput {
  irradianceSource: IrradianceSource;
  irradianceWm2: number;
  cellTemperatureSource: CellTemperatureSource;
  /** Datasheet coefficient of Pmax, %/°C (negative). */
  gammaPmaxPctPerC: number;
  measurementKind: "single" | "sweep";
}

const IRRADIANCE_LABEL: Record<IrradianceSource, string> = {
  pyranometer: "Irradiance measured with a pyranometer",
  "reference-cell": "Irradiance measured with a reference cell",
  "clear-sky-estimate": "Irradiance estimated from a clear-sky model",
};

export function uncertaintyTerms(input: UncertaintyInput): UncertaintyTerm[] {
  const temperatureErrorC = CELL_TEMPERATURE_UNCERTAINTY_C[input.cellTemperatureSource];
  const terms: UncertaintyTerm[] = [
    { code: "irradiance", label: IRRADIANCE_LABEL[input.irradianceSource], pct: IRRADIANCE_UNCERTAINTY_PCT[input.irradianceSource] },
    {
      code: "cell-temperature",
      label:
        input.cellTemperatureSource === "back-sheet"
          ? `Cell temperature from the back-sheet reading (±${temperatureErrorC} °C)`
          : `Cell temperature estimated from air temperature with the NOCT model (±${temperatureErrorC} °C)`,
      // A temperature error ΔT moves the STC value by |γ|·ΔT percent.
      pct: Math.abs(input.gammaPmaxPctPerC) * temperatureErrorC,
    },
    {
      code: "power",
      label: input.measurementKind === "sweep" ? "Power read from a load sweep" : "One operating point (may miss the maximum)",
      pct: POWER_UNCERTAINTY_PCT[input.measurementKind],
    },
  ];
  if (input.irradianceWm2 < LOW_IRRADIANCE_WM2) {
    terms.push({ code: "low-irradiance", label: `Scaling up from below ${LOW_IRRADIANCE_WM2} W/m²`, pct: LOW_IRRADIANCE_UNCERTAINTY_PCT });
  }
  return terms;
}

/** Root sum of squares of independent relative errors, %. */
export function combinedUncertaintyPct(terms: readonly UncertaintyTerm[]): number {
  return Math.sqrt(terms.reduce((sum, t) => sum + t.pct * t.pct, 0));
}

export function readingWeight(irradianceSource: IrradianceSource): number {
  return irradianceSource === "clear-sky-estimate" ? WEIGHT_ESTIMATED_IRRADIANCE : WEIGHT_MEASURED_IRRADIANCE;
}
