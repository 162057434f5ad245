// What the installer chooses for a kit plan: the site and load sheet, the system voltage, the parts
// and the design choices. One schema for the plan form, the live re-plan and the API.
import { z } from "zod";
import { nameField } from "./name-field";

const uuid = z.uuid("Choose one from the list.");
const num = (label: string, min: number, max: number, unit = "") =>
  z
    .number({ error: (i) => (i.input === undefined ? `Enter the ${label}.` : `The ${label} must be a number.`) })
    .min(min, `The ${label} must be at least ${min}${unit}.`)
    .max(max, `The ${label} must be at most ${max}${unit}.`);

export const designSchema = z.object({
  autonomyDays: num("days of autonomy", 0.5, 10, " days"),
  maxDepthOfDischargePct: num("maximum depth of discharge", 10, 100, " %").optional(),
  designMarginPct: num("design margin", 0, 100, " %"),
  powerBasis: z.enum(["nameplate", "verified"], "Choose nameplate or verified power."),
  voltageDropTargetPct: num("voltage-drop target", 0.5, 10, " %"),
  conductorSystem: z.enum(["awg", "mm2"], "Choose AWG or mm² conductors."),
  arrayToControllerM: num("array-to-controller run", 0.5, 500, " m"),
  controllerToBatteryM: num("controller-to-battery run", 0.2, 100, " m"),
  batteryToInverterM: num("battery-to-inverter run", 0.2, 100, " m"),
  lossesPct: z.object({
    soiling: num("soiling loss", 0, 50, " %"),
    mismatch: num("mismatch loss", 0, 50, " %"),
    wiring: num("wiring loss", 0, 50, " %"),
  }),
  modulesInSeries: num("modules in series", 1, 40).int("Modules in series is a whole number.").optional(),
  stringsInParallel: num("strings in parallel", 1, 100).int("Strings in parallel is a whole number.").optional(),
  batteryStrings: num("battery strings", 1, 20).int("Battery strings is a whole number.").optional(),
  acceptableUnmetDaysPerYear: num("acceptable unmet days", 0, 365).optional(),
  maxArrayAreaM2: num("largest array area", 0.1, 100000, " m²").optional(),
  simulationSeed: num("simulation seed", 0, 2 ** 31 - 1)
    .int()
    .optional(),
});

export const planChoicesSchema = z
  .object({
    name: nameField("Name the plan."),
    siteId: uuid,
    loadSheetId: uuid,
    systemVoltageV: z.union([z.literal(12), z.literal(24), z.literal(48)], { error: "The system voltage is 12, 24 or 48 V." }),
    moduleId: uuid,
    controllerId: uuid,
    batteryId: uuid,
    /** Null: a DC-only kit without an inverter. */
    inverterId: uuid.nullable(),
    design: designSchema,
  })
  .superRefine((c, ctx) => {
    const forcedSeries = c.design.modulesInSeries !== undefined;
    const forcedParallel = c.design.stringsInParallel !== undefined;
    if (forcedSeries !== forcedParallel) {
      ctx.addIssue({
        code: "custom",
        path: ["design", forcedSeries ? "stringsInParallel" : "modulesInSeries"],
        message: "Give both the modules in series and the strings in parallel, or neither.",
      });
    }
  });

export type PlanChoices = z.output<typeof planChoicesSchema>;
export type PlanChoicesJson = PlanChoices;

export const DEFAULT_DESIGN: PlanChoices["design"] = {
  autonomyDays: 3,
  designMarginPct: 20,
  powerBasis: "verified",
  voltageDropTargetPct: 3,
  conductorSystem: "mm2",
  arrayToControllerM: 15,
  controllerToBatteryM: 2,
  batteryToInverterM: 1.5,
  lossesPct: { soiling: 2, mismatch: 2, wiring: 1 },
};

/** The names behind a plan's figures, shown beside them. */
export interface PlanSources {
  siteName: string;
  loadSheetName: string;
  parts: { module: string; controller: string; battery: string; inverter: string | null };
}
