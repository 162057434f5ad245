// Checks a module's nameplate before it is saved: each figure in a plausible range, then the
// relations that hold for every module (Vmp < Voc, Imp < Isc, Pmax = Vmp · Imp at the maximum
// power point), then physical plausibility (fill factor, volts per cell, efficiency, mass per area)
// to catch unit and typing mistakes. Each problem is reported at the field to correct.
import { fillFactor, moduleAreaM2, moduleEfficiencyPct } from "./derived-figures";
import { fmt, issueCollector, type FieldIssues } from "./field-issues";
import { isCrystallineSilicon } from "./part-kinds";
import type { ModuleNameplate } from "./part-specs";

/**
 * Printed Vmp and Imp are rounded and a datasheet's Pmax is the class's nominal value, so Vmp · Imp
 * differs from Pmax by up to about 1–2 %; 3 % leaves room for that and still catches a wrong
 * figure (common practice, no source).
 */
export const PMAX_PRODUCT_TOLERANCE = 0.03;

/** Fill factors of commercial modules lie well inside 0.45–0.87 (from memory: c-Si ≈ 0.72–0.82, thin film ≈ 0.55–0.75). */
export const FILL_FACTOR_RANGE = [0.45, 0.87] as const;

/** Open-circuit volts per crystalline-silicon cell at STC (from memory: about 0.6–0.75 V). */
export const SILICON_VOC_PER_CELL_V = [0.5, 0.8] as const;

/** Module efficiency at STC: the best commercial modules reach about 24 % (from memory); a-Si is near 6 %. */
export const EFFICIENCY_RANGE_PCT = [3, 26] as const;

/** Mass per area: flexible modules ≈ 2 kg/m², glass–glass ≈ 15 kg/m² (common practice, no source). */
export const MASS_PER_AREA_KG_M2 = [1.5, 25] as const;

export function validateModuleNameplate(m: ModuleNameplate): FieldIssues<ModuleNameplate> {
  const c = issueCollector<ModuleNameplate>();
  c.range("cellsInSeries", m.cellsInSeries, 1, 300, "Cells in series");
  c.integer("cellsInSeries", m.cellsInSeries, "Cells in series");
  c.range("pmaxW", m.pmaxW, 1, 1000, "Pmax", "W");
  c.range("vmpV", m.vmpV, 0.5, 300, "Vmp", "V");
  c.range("vocV", m.vocV, 0.5, 300, "Voc", "V");
  c.range("impA", m.impA, 0.01, 30, "Imp", "A");
  c.range("iscA", m.iscA, 0.01, 30, "Isc", "A");
  temperatureCoefficients(m, c);
  c.range("noctC", m.noctC, 35, 60, m.nominalTempKind === "nmot" ? "NMOT" : "NOCT", "°C");
  c.range("lengthMm", m.lengthMm, 150, 2700, "Length", "mm");
  c.range("widthMm", m.widthMm, 100, 1400, "Width", "mm");
  c.range("massKg", m.massKg, 0.2, 60, "Mass", "kg");

  if (c.clean("vmpV", "vocV") && m.vmpV >= m.vocV) {
    c.add("vmpV", `Vmp must be below Voc (${fmt(m.vocV)} V): at the maximum power point the voltage is lower than at open circuit.`);
  }
  if (c.clean("impA", "iscA") && m.impA >= m.iscA) {
    c.add("impA", `Imp must be below Isc (${fmt(m.iscA)} A): at the maximum power point the current is lower than at short circuit.`);
  }
  if (c.clean("pmaxW", "vmpV", "impA")) {
    const productW = m.vmpV * m.impA;
    const deviation = Math.abs(m.pmaxW - productW) / m.pmaxW;
    if (deviation > PMAX_PRODUCT_TOLERANCE) {
      c.add(
        "pmaxW",
        `Pmax ${fmt(m.pmaxW)} W differs from Vmp × Imp = ${fmt(productW, 1)} W by ${fmt(100 * deviation, 1)} %; datasheet figures agree within ${100 * PMAX_PRODUCT_TOLERANCE} %.`,
      );
    }
  }
  if (c.clean("pmaxW", "vocV", "iscA", "vmpV", "impA")) {
    const ff = fillFactor(m.pmaxW, m.vocV, m.iscA);
    if (ff < FILL_FACTOR_RANGE[0] || ff > FILL_FACTOR_RANGE[1]) {
      c.add(
        "iscA",
        `Fill factor Pmax ÷ (Voc × Isc) comes to ${fmt(ff, 2)}; modules lie between ${FILL_FACTOR_RANGE[0]} and ${FILL_FACTOR_RANGE[1]}: check Voc and Isc.`,
      );
    }
  }
  if (c.clean("vocV", "cellsInSeries") && isCrystallineSilicon(m.cellTechnology)) {
    const perCellV = m.vocV / m.cellsInSeries;
    if (perCellV < SILICON_VOC_PER_CELL_V[0] || perCellV > SILICON_VOC_PER_CELL_V[1]) {
      c.add(
        "cellsInSeries",
        `Voc ${fmt(m.vocV)} V over ${m.cellsInSeries} cells is ${fmt(perCellV, 2)} V per cell; a silicon cell gives ${SILICON_VOC_PER_CELL_V[0]}–${SILICON_VOC_PER_CELL_V[1]} V: check the cells in series (half-cut modules count the cells of one string).`,
      );
    }
  }
  if (c.clean("pmaxW", "lengthMm", "widthMm")) {
    const efficiencyPct = moduleEfficiencyPct(m.pmaxW, m.lengthMm, m.widthMm);
    if (efficiencyPct < EFFICIENCY_RANGE_PCT[0] || efficiencyPct > EFFICIENCY_RANGE_PCT[1]) {
      c.add(
        "lengthMm",
        `${fmt(m.pmaxW)} W on ${fmt(moduleAreaM2(m.lengthMm, m.widthMm), 3)} m² is ${fmt(efficiencyPct, 1)} % efficient; modules lie between ${EFFICIENCY_RANGE_PCT[0]} and ${EFFICIENCY_RANGE_PCT[1]} %: check length and width (in mm).`,
      );
    }
  }
  if (c.clean("massKg", "lengthMm", "widthMm")) {
    const kgPerM2 = m.massKg / moduleAreaM2(m.lengthMm, m.widthMm);
    if (kgPerM2 < MASS_PER_AREA_KG_M2[0] || kgPerM2 > MASS_PER_AREA_KG_M2[1]) {
      c.add(
        "massKg",
        `${fmt(m.massKg)} kg on this area is ${fmt(kgPerM2, 1)} kg/m²; modules weigh ${MASS_PER_AREA_KG_M2[0]}–${MASS_PER_AREA_KG_M2[1]} kg/m²: check the mass (kg) and the dimensions (mm).`,
      );
    }
  }
  return c.issues;
}

/** Output falls as cells warm (γ, β < 0) while current rises slightly (α > 0); a flipped sign is a typing slip. */
function temperatureCoefficients(m: ModuleNameplate, c: ReturnType<typeof issueCollector<ModuleNameplate>>) {
  if (m.gammaPmaxPctPerC > 0) c.add("gammaPmaxPctPerC", "The Pmax coefficient is negative (power falls as the cells warm): enter it with a minus sign.");
  if (m.betaVocPctPerC > 0) c.add("betaVocPctPerC", "The Voc coefficient is negative (voltage falls as the cells warm): enter it with a minus sign.");
  if (m.alphaIscPctPerC < 0) c.add("alphaIscPctPerC", "The Isc coefficient is positive (current rises slightly as the cells warm).");
  // Ranges from memory: γ ≈ −0.25…−0.50 %/°C, β ≈ −0.24…−0.35 %/°C, α ≈ +0.03…+0.07 %/°C.
  c.range("gammaPmaxPctPerC", m.gammaPmaxPctPerC, -0.7, -0.1, "The Pmax coefficient", "%/°C");
  c.range("betaVocPctPerC", m.betaVocPctPerC, -0.6, -0.1, "The Voc coefficient", "%/°C");
  c.range("alphaIscPctPerC", m.alphaIscPctPerC, 0, 0.15, "The Isc coefficient", "%/°C");
}
