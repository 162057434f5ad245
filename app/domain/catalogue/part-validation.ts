// Checks for batteries, charge controllers and inverters before they are saved: each figure in a
// plausible range, then the relations between figures, reported at the field to correct.
import { specificEnergyWhPerKg } from "./derived-figures";
import { fmt, issueCollector, type FieldIssues } from "./field-issues";
import { INVERTER_DC_VOLTAGES, isLeadAcid } from "./part-kinds";
import { controllerRatings, type BatterySpec, type ControllerSpec, type InverterSpec } from "./part-specs";

/** Specific energy by chemistry, Wh/kg (from memory: lead-acid ≈ 25–45, LiFePO4 ≈ 90–160, NMC ≈ 150–250). */
export const SPECIFIC_ENERGY_WH_KG = { leadAcid: [15, 60], lithium: [50, 300] } as const;

/** Lead-acid cycled deeper than 80 % wears out within a few hundred cycles (common practice, no source). */
export const LEAD_ACID_MAX_DOD_PCT = 80;

export function validateBattery(b: BatterySpec): FieldIssues<BatterySpec> {
  const c = issueCollector<BatterySpec>();
  c.range("nominalVoltageV", b.nominalVoltageV, 1.2, 60, "Nominal voltage", "V");
  c.range("capacityAh", b.capacityAh, 1, 5000, "Capacity", "Ah");
  c.range("capacityHourRateH", b.capacityHourRateH, 1, 240, "The capacity's hour rate", "h");
  c.range("usableDodPct", b.usableDodPct, 10, 100, "Usable depth of discharge", "%");
  c.range("cycleLife", b.cycleLife, 50, 20000, "Cycle life", "cycles");
  c.integer("cycleLife", b.cycleLife, "Cycle life");
  c.range("roundTripEfficiencyPct", b.roundTripEfficiencyPct, 50, 100, "Round-trip efficiency", "%");
  c.range("massKg", b.massKg, 0.1, 2000, "Mass", "kg");

  const leadAcid = isLeadAcid(b.chemistry);
  // A lead-acid cell is 2 V nominal, so a block is a whole number of cells.
  if (leadAcid && c.clean("nominalVoltageV") && Math.abs(b.nominalVoltageV / 2 - Math.round(b.nominalVoltageV / 2)) > 1e-6) {
    c.add("nominalVoltageV", `A lead-acid battery is built of 2 V cells, so its nominal voltage is a multiple of 2 V (not ${fmt(b.nominalVoltageV)} V).`);
  }
  if (leadAcid && c.clean("usableDodPct") && b.usableDodPct > LEAD_ACID_MAX_DOD_PCT) {
    c.add("usableDodPct", `Lead-acid cycled deeper than ${LEAD_ACID_MAX_DOD_PCT} % wears out fast; daily cycling is usually planned at about 50 %.`);
  }
  if (c.clean("nominalVoltageV", "capacityAh", "massKg") && b.massKg !== null) {
    const whPerKg = specificEnergyWhPerKg(b.nominalVoltageV, b.capacityAh, b.massKg)!;
    const [min, max] = leadAcid ? SPECIFIC_ENERGY_WH_KG.leadAcid : SPECIFIC_ENERGY_WH_KG.lithium;
    if (whPerKg < min || whPerKg > max) {
      c.add(
        "massKg",
        `${fmt(b.nominalVoltageV)} V × ${fmt(b.capacityAh)} Ah in ${fmt(b.massKg)} kg is ${fmt(whPerKg, 0)} Wh/kg; this chemistry stores ${min}–${max} Wh/kg: check capacity and mass.`,
      );
    }
  }
  return c.issues;
}

/** A 12 V lead-acid bank charges at up to about 14.4–15 V: the PV input limit must sit well above that. */
const CHARGE_VOLTS_PER_NOMINAL = 1.25;

export function validateController(s: ControllerSpec): FieldIssues<ControllerSpec> {
  const c = issueCollector<ControllerSpec>();
  const ratings = controllerRatings(s);
  for (const r of ratings) c.range(r.field, r.maxPvPowerW, 10, 20000, `Max PV power at ${r.batteryVoltageV} V`, "W");
  if (ratings.length === 0) c.add("maxPvPower12W", "Give the maximum PV power for at least one battery voltage the controller charges.");
  c.range("maxPvVocV", s.maxPvVocV, 15, 1000, "Max PV input voltage", "V");
  c.range("maxChargeCurrentA", s.maxChargeCurrentA, 1, 250, "Max charge current", "A");
  c.range("efficiencyPct", s.efficiencyPct, 80, 100, "Efficiency", "%");

  const highest = ratings.at(-1);
  if (highest && c.clean("maxPvVocV") && s.maxPvVocV < highest.batteryVoltageV * CHARGE_VOLTS_PER_NOMINAL) {
    c.add(
      "maxPvVocV",
      `A ${highest.batteryVoltageV} V bank charges at about ${fmt(highest.batteryVoltageV * CHARGE_VOLTS_PER_NOMINAL)} V: the PV input must allow more than that.`,
    );
  }
  if (c.clean("maxChargeCurrentA")) {
    for (const r of ratings) {
      // Current × charging voltage is what the controller can put into the bank; ratings above
      // twice that would be mostly clipped (common practice, no source).
      const deliverableW = s.maxChargeCurrentA * r.batteryVoltageV * CHARGE_VOLTS_PER_NOMINAL;
      if (c.clean(r.field) && r.maxPvPowerW > 2 * deliverableW) {
        c.add(
          r.field,
          `${fmt(r.maxPvPowerW)} W is more than twice what ${fmt(s.maxChargeCurrentA)} A puts into a ${r.batteryVoltageV} V bank (about ${fmt(deliverableW, 0)} W): check the power and the current.`,
        );
      }
    }
  }
  return c.issues;
}

/** Battery current above this at full inverter load needs cabling no off-grid kit uses (common practice, no source). */
export const MAX_INVERTER_DC_CURRENT_A = 500;

export function validateInverter(s: InverterSpec): FieldIssues<InverterSpec> {
  const c = issueCollector<InverterSpec>();
  c.range("continuousW", s.continuousW, 50, 50000, "Continuous power", "W");
  c.range("surgeW", s.surgeW, 50, 250000, "Surge power", "W");
  c.range("efficiencyPct", s.efficiencyPct, 70, 99.5, "Efficiency", "%");
  c.range("idleDrawW", s.idleDrawW, 0, 200, "Idle draw", "W");
  if (!(INVERTER_DC_VOLTAGES as readonly number[]).includes(s.dcInputVoltageV)) {
    c.add("dcInputVoltageV", `DC input voltage must be one of ${INVERTER_DC_VOLTAGES.join(", ")} V.`);
  }
  if (c.clean("continuousW", "surgeW")) {
    if (s.surgeW < s.continuousW) c.add("surgeW", `Surge power must be at least the continuous power (${fmt(s.continuousW)} W).`);
    else if (s.surgeW > 5 * s.continuousW)
      c.add("surgeW", `Surge power is rated at 1–5 × the continuous power (here ${fmt(s.surgeW / s.continuousW, 1)} ×): check both figures.`);
  }
  if (c.clean("idleDrawW", "continuousW") && s.idleDrawW > 0.1 * s.continuousW) {
    c.add("idleDrawW", `Idle draw of ${fmt(s.idleDrawW)} W is over a tenth of the continuous power: check the figure.`);
  }
  if (c.clean("continuousW", "dcInputVoltageV", "efficiencyPct")) {
    const currentA = s.continuousW / (s.dcInputVoltageV * (s.efficiencyPct / 100));
    if (currentA > MAX_INVERTER_DC_CURRENT_A) {
      c.add(
        "dcInputVoltageV",
        `At ${fmt(s.continuousW)} W it would draw ${fmt(currentA, 0)} A from a ${s.dcInputVoltageV} V battery; inverters this size are built for a higher battery voltage.`,
      );
    }
  }
  return c.issues;
}
