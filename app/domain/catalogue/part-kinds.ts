// The catalogue's part kinds and the closed vocabularies their fields use. Shared by validation,
// forms, CSV import and the list filters, so a value accepted in one place is accepted in all.
export const PART_KINDS = ["modules", "batteries", "controllers", "inverters"] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const PART_KIND_LABELS: Record<PartKind, { plural: string; singular: string }> = {
  modules: { plural: "Modules", singular: "module" },
  batteries: { plural: "Batteries", singular: "battery" },
  controllers: { plural: "Charge controllers", singular: "charge controller" },
  inverters: { plural: "Inverters", singular: "inverter" },
};

export function isPartKind(value: unknown): value is PartKind {
  return typeof value === "string" && (PART_KINDS as readonly string[]).includes(value);
}

export const CELL_TECHNOLOGIES = ["mono-PERC", "mono-TOPCon", "mono-HJT", "poly", "thin-film CdTe", "thin-film CIGS", "thin-film a-Si"] as const;
export type CellTechnology = (typeof CELL_TECHNOLOGIES)[number];

/** Crystalline silicon technologies: one cell gives roughly 0.55–0.80 V open circuit. */
export function isCrystallineSilicon(technology: string) {
  return technology.startsWith("mono-") || technology === "poly";
}

/** NOCT (open circuit, IEC 61215 older editions) or NMOT (at maximum power, IEC 61215:2016). */
export const NOMINAL_TEMP_KINDS = ["noct", "nmot"] as const;
export type NominalTempKind = (typeof NOMINAL_TEMP_KINDS)[number];

export const BATTERY_CHEMISTRIES = ["lead-acid-flooded", "lead-acid-agm", "lead-acid-gel", "lifepo4", "nmc"] as const;
export type BatteryChemistry = (typeof BATTERY_CHEMISTRIES)[number];

export const CHEMISTRY_LABELS: Record<BatteryChemistry, string> = {
  "lead-acid-flooded": "Lead-acid, flooded",
  "lead-acid-agm": "Lead-acid, AGM",
  "lead-acid-gel": "Lead-acid, gel",
  lifepo4: "LiFePO4",
  nmc: "Lithium NMC",
};

export function isLeadAcid(chemistry: string) {
  return chemistry.startsWith("lead-acid");
}

export const CONTROLLER_KINDS = ["pwm", "mppt"] as const;
export type ControllerKind = (typeof CONTROLLER_KINDS)[number];

/** Nominal battery-bank voltages a charge controller can be rated for. */
export const BATTERY_BANK_VOLTAGES = [12, 24, 36, 48] as const;
export type BatteryBankVoltage = (typeof BATTERY_BANK_VOLTAGES)[number];

export const INVERTER_DC_VOLTAGES = [12, 24, 36, 48, 96] as const;
