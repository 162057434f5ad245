// Figures derived from a part's nameplate and from its approved field readings. PostgreSQL keeps
// the same module figures as generated columns (migration 2026-12-01T0100) so the catalogue can
// sort on them; these functions are what the pages, forms and tests use.

/** Irradiance at standard test conditions (IEC 60904-3): 1000 W/m². */
export const STC_IRRADIANCE_WM2 = 1000;

export function moduleAreaM2(lengthMm: number, widthMm: number) {
  return (lengthMm * widthMm) / 1e6;
}

/** Watts per square metre of module (frame included, as datasheets give the outline). */
export function powerDensityWm2(powerW: number, lengthMm: number, widthMm: number) {
  return powerW / moduleAreaM2(lengthMm, widthMm);
}

/** Module efficiency at STC: η = Pmax / (G_STC · A), the usual definition (Duffie & Beckman, ch. 23; chapter from memory). */
export function moduleEfficiencyPct(pmaxW: number, lengthMm: number, widthMm: number) {
  return (100 * powerDensityWm2(pmaxW, lengthMm, widthMm)) / STC_IRRADIANCE_WM2;
}

/** Fill factor FF = Pmax / (Voc · Isc), the standard definition (e.g. Green, Solar Cells, 1982). */
export function fillFactor(pmaxW: number, vocV: number, iscA: number) {
  return pmaxW / (vocV * iscA);
}

export interface VerifiedSummary {
  verifiedPmaxW: number | null;
  readingCount: number;
  spreadPct: number | null;
}

export interface VerifiedFigures {
  /** Verified Pmax ÷ nameplate Pmax; null without approved readings. */
  ratio: number | null;
  measuredDensityWm2: number | null;
  measuredEfficiencyPct: number | null;
}

export function verifiedFigures(nameplate: { pmaxW: number; lengthMm: number; widthMm: number }, summary: VerifiedSummary): VerifiedFigures {
  if (summary.verifiedPmaxW === null || summary.readingCount === 0) return { ratio: null, measuredDensityWm2: null, measuredEfficiencyPct: null };
  const measuredDensityWm2 = powerDensityWm2(summary.verifiedPmaxW, nameplate.lengthMm, nameplate.widthMm);
  return {
    ratio: summary.verifiedPmaxW / nameplate.pmaxW,
    measuredDensityWm2,
    measuredEfficiencyPct: (100 * measuredDensityWm2) / STC_IRRADIANCE_WM2,
  };
}

/** Where a module's power figure comes from, in the words the pages show. */
export function powerOrigin(readingCount: number) {
  if (readingCount <= 0) return "nameplate only — no readings yet";
  return `verified from ${readingCount} reading${readingCount === 1 ? "" : "s"}`;
}

export type RatioStanding = "below" | "near" | "above";

/**
 * Verified ratio in words: within ±5 % of nameplate is "near" (about the usual datasheet power
 * tolerance; common practice, no source).
 */
export function ratioStanding(ratio: number): RatioStanding {
  if (ratio < 0.95) return "below";
  if (ratio > 1.05) return "above";
  return "near";
}

/** Stored energy of a battery at its rated hour rate, and the part a kit may use. */
export function batteryEnergyKWh(nominalVoltageV: number, capacityAh: number) {
  return (nominalVoltageV * capacityAh) / 1000;
}

export function usableEnergyKWh(nominalVoltageV: number, capacityAh: number, usableDodPct: number) {
  return (batteryEnergyKWh(nominalVoltageV, capacityAh) * usableDodPct) / 100;
}

/** Specific energy in Wh/kg (null without a mass). */
export function specificEnergyWhPerKg(nominalVoltageV: number, capacityAh: number, massKg: number | null) {
  return massKg ? (nominalVoltageV * capacityAh) / massKg : null;
}
