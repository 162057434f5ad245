// The module part of a yield request: a catalogue moduleId, or the full datasheet figures.
import { z } from "zod";
import { numberIn, objectError, positiveBelow } from "./schema-fields";
import type { ModuleSpec } from "./yield-types";

const SPEC_FIELDS = {
  pmaxW: positiveBelow("Pmax", 2000, " W"),
  vmpV: positiveBelow("Vmp", 200, " V"),
  impA: positiveBelow("Imp", 50, " A"),
  vocV: positiveBelow("Voc", 200, " V"),
  iscA: positiveBelow("Isc", 50, " A"),
  gammaPmaxPctPerC: numberIn("Temperature coefficient of Pmax", -1, 0, " %/°C"),
  betaVocPctPerC: numberIn("Temperature coefficient of Voc", -1, 0, " %/°C"),
  alphaIscPctPerC: numberIn("Temperature coefficient of Isc", 0, 0.2, " %/°C"),
  noctC: numberIn("NOCT", 30, 70, " °C"),
} as const;
type SpecKey = keyof typeof SPEC_FIELDS;
const SPEC_KEYS = Object.keys(SPEC_FIELDS) as SpecKey[];

export const moduleSchema = z
  .object(
    {
      moduleId: z.string({ error: "moduleId must be text." }).trim().min(1, { error: "moduleId must not be empty." }).max(200).optional(),
      ...Object.fromEntries(SPEC_KEYS.map((key) => [key, SPEC_FIELDS[key].optional()])),
    } as { moduleId: z.ZodOptional<z.ZodString> } & { [K in SpecKey]: z.ZodOptional<(typeof SPEC_FIELDS)[K]> },
    objectError("Module"),
  )
  .superRefine((module, ctx) => {
    const given = SPEC_KEYS.filter((key) => module[key] !== undefined);
    if (module.moduleId !== undefined) {
      if (given.length > 0) {
        ctx.addIssue({ code: "custom", path: ["moduleId"], message: "Give either a catalogue moduleId or the datasheet figures, not both." });
      }
      return;
    }
    if (given.length === 0) {
      ctx.addIssue({ code: "custom", path: ["moduleId"], message: "Choose a catalogue module (moduleId) or enter its datasheet figures." });
      return;
    }
    for (const key of SPEC_KEYS) {
      if (module[key] === undefined) ctx.addIssue({ code: "custom", path: [key], message: "Required with the other datasheet figures." });
    }
    // Cross-checks only between figures that passed their own checks (Zod runs this regardless).
    const valid = (value: unknown): value is number => typeof value === "number" && value > 0;
    const { pmaxW, vmpV, impA, vocV, iscA } = module;
    if (valid(vmpV) && valid(vocV) && vmpV >= vocV) {
      ctx.addIssue({ code: "custom", path: ["vmpV"], message: "Vmp must be below Voc." });
    }
    if (valid(impA) && valid(iscA) && impA >= iscA) {
      ctx.addIssue({ code: "custom", path: ["impA"], message: "Imp must be below Isc." });
    }
    if (valid(pmaxW) && valid(vmpV) && valid(impA) && Math.abs(vmpV * impA - pmaxW) > 0.05 * pmaxW) {
      ctx.addIssue({
        code: "custom",
        path: ["pmaxW"],
        message: `Pmax should be close to Vmp × Imp (${(vmpV * impA).toFixed(1)} W); check the datasheet figures.`,
      });
    }
  })
  .transform((module): { moduleId: string } | ModuleSpec => {
    if (module.moduleId !== undefined) return { moduleId: module.moduleId };
    return Object.fromEntries(SPEC_KEYS.map((key) => [key, module[key]])) as unknown as ModuleSpec;
  });
