// The CSV columns a curator imports per part kind: the header in the file, the form field it fills,
// and what it holds. Headers are matched case-insensitively; extra columns are reported, not guessed.
import type { PartKind } from "~/domain/catalogue/part-kinds";

export interface CsvColumn {
  header: string;
  field: string;
  what: string;
  required: boolean;
}

function col(header: string, field: string, what: string, required = true): CsvColumn {
  return { header, field, what, required };
}

const NAMES = [col("maker", "maker", "maker's name"), col("model", "model", "model name")];

export const CSV_COLUMNS: Record<PartKind, CsvColumn[]> = {
  modules: [
    ...NAMES,
    col("cell_technology", "cellTechnology", "mono-PERC, mono-TOPCon, mono-HJT, poly, thin-film CdTe, thin-film CIGS or thin-film a-Si"),
    col("cells_in_series", "cellsInSeries", "cells in one series string"),
    col("pmax_w", "pmaxW", "W at STC"),
    col("vmp_v", "vmpV", "V at STC"),
    col("imp_a", "impA", "A at STC"),
    col("voc_v", "vocV", "V at STC"),
    col("isc_a", "iscA", "A at STC"),
    col("gamma_pmax_pct_per_c", "gammaPmaxPctPerC", "%/°C, negative"),
    col("beta_voc_pct_per_c", "betaVocPctPerC", "%/°C, negative"),
    col("alpha_isc_pct_per_c", "alphaIscPctPerC", "%/°C, positive"),
    col("nominal_temp_kind", "nominalTempKind", "noct or nmot"),
    col("noct_c", "noctC", "°C (NOCT or NMOT)"),
    col("length_mm", "lengthMm", "mm"),
    col("width_mm", "widthMm", "mm"),
    col("mass_kg", "massKg", "kg"),
  ],
  batteries: [
    ...NAMES,
    col("chemistry", "chemistry", "lead-acid-flooded, lead-acid-agm, lead-acid-gel, lifepo4 or nmc"),
    col("nominal_voltage_v", "nominalVoltageV", "V"),
    col("capacity_ah", "capacityAh", "Ah"),
    col("capacity_hour_rate_h", "capacityHourRateH", "hours, e.g. 20 for C20"),
    col("usable_dod_pct", "usableDodPct", "%"),
    col("cycle_life", "cycleLife", "cycles at that depth"),
    col("round_trip_efficiency_pct", "roundTripEfficiencyPct", "%"),
    col("mass_kg", "massKg", "kg (may be blank)", false),
  ],
  controllers: [
    ...NAMES,
    col("kind", "kind", "pwm or mppt"),
    col("max_pv_power_12v_w", "maxPvPower12W", "W at a 12 V bank (blank if not supported)", false),
    col("max_pv_power_24v_w", "maxPvPower24W", "W at a 24 V bank (blank if not supported)", false),
    col("max_pv_power_36v_w", "maxPvPower36W", "W at a 36 V bank (blank if not supported)", false),
    col("max_pv_power_48v_w", "maxPvPower48W", "W at a 48 V bank (blank if not supported)", false),
    col("max_pv_voc_v", "maxPvVocV", "V, the highest PV open-circuit voltage allowed"),
    col("max_charge_current_a", "maxChargeCurrentA", "A"),
    col("efficiency_pct", "efficiencyPct", "%"),
  ],
  inverters: [
    ...NAMES,
    col("continuous_w", "continuousW", "W"),
    col("surge_w", "surgeW", "W"),
    col("dc_input_voltage_v", "dcInputVoltageV", "12, 24, 36, 48 or 96 V"),
    col("efficiency_pct", "efficiencyPct", "%"),
    col("idle_draw_w", "idleDrawW", "W with no load"),
  ],
};

export function csvTemplate(kind: PartKind) {
  return CSV_COLUMNS[kind].map((c) => c.header).join(",") + "\n";
}
