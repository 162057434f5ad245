// One zod schema per part kind, used by the edit forms (browser and server) and by CSV import (each
// row is parsed as if it were a submitted form). Types and presence are checked here; ranges and
// the relations between figures come from app/domain/catalogue, reported at the field.
import { z } from "zod";
import type { FieldIssues } from "~/domain/catalogue/field-issues";
import { validateModuleNameplate } from "~/domain/catalogue/module-validation";
import { BATTERY_CHEMISTRIES, CELL_TECHNOLOGIES, CONTROLLER_KINDS, NOMINAL_TEMP_KINDS, type PartKind } from "~/domain/catalogue/part-kinds";
import { validateBattery, validateController, validateInverter } from "~/domain/catalogue/part-validation";

function requiredNumber(label: string, unit?: string) {
  return z.number({
    error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be a number${unit ? ` in ${unit}` : ""}.`),
  });
}

function optionalNumber(label: string, unit?: string) {
  return requiredNumber(label, unit)
    .nullish()
    .transform((v) => v ?? null);
}

function name(label: string) {
  return z
    .string({ error: `${label} is required.` })
    .trim()
    .min(1, `${label} is required.`)
    .max(80, `${label} must be at most 80 characters.`);
}

function reportIssues<T>(issues: FieldIssues<T>, ctx: z.RefinementCtx) {
  for (const [path, message] of Object.entries(issues)) ctx.addIssue({ code: "custom", path: [path], message: message as string });
}

export const moduleFormSchema = z
  .object({
    maker: name("Maker"),
    model: name("Model"),
    cellTechnology: z.enum(CELL_TECHNOLOGIES, { error: `Cell technology must be one of: ${CELL_TECHNOLOGIES.join(", ")}.` }),
    cellsInSeries: requiredNumber("Cells in series"),
    pmaxW: requiredNumber("Pmax", "W"),
    vmpV: requiredNumber("Vmp", "V"),
    impA: requiredNumber("Imp", "A"),
    vocV: requiredNumber("Voc", "V"),
    iscA: requiredNumber("Isc", "A"),
    gammaPmaxPctPerC: requiredNumber("The Pmax coefficient", "%/°C"),
    betaVocPctPerC: requiredNumber("The Voc coefficient", "%/°C"),
    alphaIscPctPerC: requiredNumber("The Isc coefficient", "%/°C"),
    nominalTempKind: z.enum(NOMINAL_TEMP_KINDS, { error: 'Say whether the temperature is "noct" or "nmot".' }),
    noctC: requiredNumber("NOCT / NMOT", "°C"),
    lengthMm: requiredNumber("Length", "mm"),
    widthMm: requiredNumber("Width", "mm"),
    massKg: requiredNumber("Mass", "kg"),
  })
  .superRefine((value, ctx) => reportIssues(validateModuleNameplate(value), ctx));

export const batteryFormSchema = z
  .object({
    maker: name("Maker"),
    model: name("Model"),
    chemistry: z.enum(BATTERY_CHEMISTRIES, { error: `Chemistry must be one of: ${BATTERY_CHEMISTRIES.join(", ")}.` }),
    nominalVoltageV: requiredNumber("Nominal voltage", "V"),
    capacityAh: requiredNumber("Capacity", "Ah"),
    capacityHourRateH: requiredNumber("The capacity's hour rate", "h"),
    usableDodPct: requiredNumber("Usable depth of discharge", "%"),
    cycleLife: requiredNumber("Cycle life"),
    roundTripEfficiencyPct: requiredNumber("Round-trip efficiency", "%"),
    massKg: optionalNumber("Mass", "kg"),
  })
  .superRefine((value, ctx) => reportIssues(validateBattery(value), ctx));

export const controllerFormSchema = z
  .object({
    maker: name("Maker"),
    model: name("Model"),
    kind: z.enum(CONTROLLER_KINDS, { error: 'Type must be "pwm" or "mppt".' }),
    maxPvPower12W: optionalNumber("Max PV power at 12 V", "W"),
    maxPvPower24W: optionalNumber("Max PV power at 24 V", "W"),
    maxPvPower36W: optionalNumber("Max PV power at 36 V", "W"),
    maxPvPower48W: optionalNumber("Max PV power at 48 V", "W"),
    maxPvVocV: requiredNumber("Max PV input voltage", "V"),
    maxChargeCurrentA: requiredNumber("Max charge current", "A"),
    efficiencyPct: requiredNumber("Efficiency", "%"),
  })
  .superRefine((value, ctx) => reportIssues(validateController(value), ctx));

export const inverterFormSchema = z
  .object({
    maker: name("Maker"),
    model: name("Model"),
    continuousW: requiredNumber("Continuous power", "W"),
    surgeW: requiredNumber("Surge power", "W"),
    dcInputVoltageV: requiredNumber("DC input voltage", "V"),
    efficiencyPct: requiredNumber("Efficiency", "%"),
    idleDrawW: requiredNumber("Idle draw", "W"),
  })
  .superRefine((value, ctx) => reportIssues(validateInverter(value), ctx));

export const PART_FORM_SCHEMAS = {
  modules: moduleFormSchema,
  batteries: batteryFormSchema,
  controllers: controllerFormSchema,
  inverters: inverterFormSchema,
} satisfies Record<PartKind, z.ZodType>;

export type ModuleForm = z.output<typeof moduleFormSchema>;
export type BatteryForm = z.output<typeof batteryFormSchema>;
export type ControllerForm = z.output<typeof controllerFormSchema>;
export type InverterForm = z.output<typeof inverterFormSchema>;
export type PartForm = ModuleForm | BatteryForm | ControllerForm | InverterForm;

/** Merging a duplicate model into the one that stays. */
export const mergeFormSchema = z.object({
  survivorId: z.uuid("Pick the model that stays."),
  confirm: z.literal("yes", { error: "Tick the box to confirm: the duplicate's readings move and it disappears from the lists." }),
});
