// A load sheet as the editor submits it (JSON in a hidden field) and as the API takes it.
import { z } from "zod";
import { applianceIssues } from "~/domain/load/load-sheet";
import { jsonTextProblem } from "./text-checks";
import { nameField } from "./name-field";

const applianceSchema = z
  .object({
    name: nameField("Give the appliance a name.", { min: 1, max: 80 }),
    powerW: z
      .number({ error: "Power must be a number of watts." })
      .min(0, "Power must be 0 W or more.")
      .max(100_000, "Power above 100 kW is not an off-grid appliance."),
    quantity: z.number({ error: "How many must be a whole number." }).int("How many must be a whole number.").min(1, "At least 1.").max(1000),
    hoursPerDay: z
      .number({ error: "Hours per day must be a number." })
      .min(0, "Hours per day must be between 0 and 24.")
      .max(24, "Hours per day must be between 0 and 24."),
    daysPerWeek: z
      .number({ error: "Days per week must be a number." })
      .min(0, "Days per week must be between 0 and 7.")
      .max(7, "Days per week must be between 0 and 7."),
    circuit: z.enum(["ac", "dc"], 'Choose "AC" or "DC".'),
    surgeW: z.number({ error: "Surge must be a number of watts." }).min(0).max(500_000).optional(),
    months: z.array(z.number().int().min(1).max(12)).min(1, "Tick at least one month.").max(12).optional(),
  })
  .superRefine((appliance, ctx) => {
    for (const [field, message] of Object.entries(applianceIssues(appliance))) ctx.addIssue({ code: "custom", path: [field], message });
  });

export const loadSheetSchema = z.object({
  name: nameField("Name the load sheet."),
  appliances: z.array(applianceSchema).min(1, "Add at least one appliance.").max(200, "At most 200 appliances."),
});

export type LoadSheetInput = z.output<typeof loadSheetSchema>;

/** Parses the editor's hidden JSON field; malformed JSON is a form error, never a crash. */
export function parseLoadSheetForm(formData: FormData) {
  const raw = formData.get("sheet");
  let value: unknown;
  try {
    value = JSON.parse(typeof raw === "string" ? raw : "");
  } catch {
    return { success: false as const, fields: { sheet: "The load sheet could not be read; reload the page and try again." } };
  }
  const unstorable = jsonTextProblem(value, "A name");
  if (unstorable) return { success: false as const, fields: { sheet: unstorable } };
  const parsed = loadSheetSchema.safeParse(value);
  if (parsed.success) return { success: true as const, data: parsed.data };
  const fields: Record<string, string> = {};
  for (const issue of parsed.error.issues) fields[issue.path.join(".") || "sheet"] ??= issue.message;
  return { success: false as const, fields };
}
