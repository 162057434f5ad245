// Picking a kit alternative: the parts and the layout the search found. One schema for the page's
// "Use this kit" buttons and for the API.
import { z } from "zod";

const id = z.uuid("Choose a kit from the list.");
const whole = (label: string, max: number) =>
  z.coerce.number<string | number>().int(`${label} is a whole number.`).min(1, `${label} is at least 1.`).max(max, `${label} is at most ${max}.`);

export const alternativePickSchema = z.object({
  moduleId: id,
  controllerId: id,
  batteryId: id,
  inverterId: z.preprocess((v) => (v === "" || v === undefined ? null : v), id.nullable()),
  modulesInSeries: whole("Modules in series", 40),
  stringsInParallel: whole("Strings in parallel", 100),
  batteryStrings: whole("Battery strings", 20),
});

export type AlternativePick = z.output<typeof alternativePickSchema>;
